// Brings a database to the current schema:  npx tsx server/db/prepare.ts [--fresh]
// With PG_ADMIN_URL it first creates the DATABASE_URL database when missing (--fresh: drops it first,
// ending open connections); then applies the Drizzle migrations in drizzle/ and seeds the demo data once.
import path from 'node:path'
import { pathToFileURL } from 'node:url'
import pg from 'pg'
import { migrate } from 'drizzle-orm/node-postgres/migrator'
import { loadConfig, REPO_ROOT } from '../config'
import { connectDatabase, type Db } from './client'
import { seedDemoData } from './seed'

export const MIGRATIONS_FOLDER = path.join(REPO_ROOT, 'drizzle')

function databaseNameOf(databaseUrl: string): string {
  const name = decodeURIComponent(new URL(databaseUrl).pathname.replace(/^\//, ''))
  // Only plain identifiers: the name is interpolated into CREATE/DROP DATABASE.
  if (!/^[A-Za-z_][A-Za-z0-9_]{0,62}$/.test(name)) throw new Error(`unsupported database name "${name}"`)
  return name
}

/** Creates the database named in databaseUrl if it does not exist; `fresh` drops it first. */
export async function ensureDatabase(adminUrl: string, databaseUrl: string, options: { fresh?: boolean } = {}) {
  const name = databaseNameOf(databaseUrl)
  const admin = new pg.Client({ connectionString: adminUrl })
  await admin.connect()
  try {
    if (options.fresh) await admin.query(`drop database if exists "${name}" with (force)`)
    const { rowCount } = await admin.query('select 1 from pg_database where datname = $1', [name])
    if (!rowCount) {
      try {
        await admin.query(`create database "${name}"`)
      } catch (error) {
        // 42P04 duplicate_database: a concurrent prepare created it first.
        if ((error as { code?: string }).code !== '42P04') throw error
      }
    }
  } finally {
    await admin.end()
  }
}

export async function migrateDatabase(db: Db): Promise<void> {
  await migrate(db, { migrationsFolder: MIGRATIONS_FOLDER })
}

export interface PrepareOptions {
  databaseUrl: string
  adminDatabaseUrl?: string
  fresh?: boolean
  seed?: boolean
  bcryptCost: number
}

/** Create (if possible), migrate and seed. Returns whether the demo data was inserted this time. */
export async function prepareDatabase(options: PrepareOptions): Promise<{ seeded: boolean }> {
  if (options.adminDatabaseUrl) {
    await ensureDatabase(options.adminDatabaseUrl, options.databaseUrl, { fresh: options.fresh })
  } else if (options.fresh) {
    throw new Error('--fresh needs PG_ADMIN_URL (source .data/env)')
  }
  const database = connectDatabase(options.databaseUrl, { max: 2 })
  try {
    await migrateDatabase(database.db)
    const seeded = options.seed === false ? false : await seedDemoData(database.db, { bcryptCost: options.bcryptCost })
    return { seeded }
  } finally {
    await database.close()
  }
}

async function runFromCommandLine(): Promise<void> {
  const fresh = process.argv.includes('--fresh')
  const config = loadConfig()
  const { seeded } = await prepareDatabase({
    databaseUrl: config.databaseUrl,
    adminDatabaseUrl: config.adminDatabaseUrl,
    fresh,
    bcryptCost: config.bcryptCost,
  })
  const name = new URL(config.databaseUrl).pathname.slice(1)
  console.log(`[db] ${name}: ${fresh ? 'recreated, ' : ''}migrated${seeded ? ', demo data seeded' : ''}`)
}

if (process.argv[1] && import.meta.url === pathToFileURL(path.resolve(process.argv[1])).href) {
  runFromCommandLine().catch((error: unknown) => {
    console.error('[db] prepare failed:', error instanceof Error ? error.message : error)
    process.exit(1)
  })
}
