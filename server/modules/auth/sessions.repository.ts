import { and, eq, lte } from 'drizzle-orm'
import type { DbOrTx } from '../../db/client'
import { sessions } from '../../db/schema'

export async function insertSession(db: DbOrTx, input: { userId: string; expiresAt: Date }): Promise<string> {
  const [row] = await db.insert(sessions).values(input).returning({ id: sessions.id })
  return row.id
}

export async function deleteSession(db: DbOrTx, sessionId: string): Promise<void> {
  await db.delete(sessions).where(eq(sessions.id, sessionId))
}

export async function deleteSessionsOfUser(db: DbOrTx, userId: string): Promise<void> {
  await db.delete(sessions).where(eq(sessions.userId, userId))
}

/** Housekeeping at each sign-in, so the table holds only live sessions plus those of idle users. */
export async function deleteExpiredSessionsOfUser(db: DbOrTx, userId: string): Promise<void> {
  await db.delete(sessions).where(and(eq(sessions.userId, userId), lte(sessions.expiresAt, new Date())))
}
