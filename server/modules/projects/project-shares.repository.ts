import { and, asc, eq } from 'drizzle-orm'
import type { DbOrTx } from '../../db/client'
import { projectShares, users } from '../../db/schema'

export async function listShares(db: DbOrTx, projectId: string) {
  return db
    .select({ userId: users.id, name: users.name, email: users.email })
    .from(projectShares)
    .innerJoin(users, eq(users.id, projectShares.userId))
    .where(eq(projectShares.projectId, projectId))
    .orderBy(asc(users.name), asc(users.id))
}

export async function insertShare(db: DbOrTx, projectId: string, userId: string): Promise<void> {
  await db.insert(projectShares).values({ projectId, userId }).onConflictDoNothing()
}

export async function deleteShare(db: DbOrTx, projectId: string, userId: string): Promise<boolean> {
  const deleted = await db
    .delete(projectShares)
    .where(and(eq(projectShares.projectId, projectId), eq(projectShares.userId, userId)))
    .returning({ userId: projectShares.userId })
  return deleted.length > 0
}
