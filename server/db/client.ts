import pg from 'pg'
import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres'
import * as schema from './schema'

export type Db = NodePgDatabase<typeof schema>
/** A transaction handle; repositories accept either so use cases can compose them. */
export type DbOrTx = Db | Parameters<Parameters<Db['transaction']>[0]>[0]

export interface Database {
  db: Db
  pool: pg.Pool
  close(): Promise<void>
}

export function connectDatabase(databaseUrl: string, options: { max?: number } = {}): Database {
  const pool = new pg.Pool({ connectionString: databaseUrl, max: options.max ?? 10 })
  // An idle client losing its connection (database restart) must not crash the process.
  pool.on('error', (error) => console.error('[db] idle connection error:', error.message))
  const db = drizzle(pool, { schema })
  return { db, pool, close: () => pool.end() }
}
