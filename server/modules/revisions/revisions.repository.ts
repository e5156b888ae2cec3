import { and, desc, eq } from 'drizzle-orm'
import type { DbOrTx } from '../../db/client'
import { designRevisions, users } from '../../db/schema'

const listColumns = {
  id: designRevisions.id,
  name: designRevisions.name,
  createdAt: designRevisions.createdAt,
  restoredFrom: designRevisions.restoredFrom,
  authorId: designRevisions.createdBy,
  authorName: users.name,
}

export type RevisionRow = Awaited<ReturnType<typeof listRevisions>>[number]

export async function listRevisions(db: DbOrTx, projectId: string) {
  return db
    .select(listColumns)
    .from(designRevisions)
    .leftJoin(users, eq(users.id, designRevisions.createdBy))
    .where(eq(designRevisions.projectId, projectId))
    .orderBy(desc(designRevisions.createdAt), desc(designRevisions.id))
}

export async function findRevision(db: DbOrTx, projectId: string, revisionId: string) {
  const [row] = await db
    .select({ ...listColumns, design: designRevisions.design })
    .from(designRevisions)
    .leftJoin(users, eq(users.id, designRevisions.createdBy))
    .where(and(eq(designRevisions.projectId, projectId), eq(designRevisions.id, revisionId)))
  return row
}

export async function insertRevision(
  db: DbOrTx,
  input: { projectId: string; name: string; snapshot: Uint8Array; design: unknown; createdBy: string; restoredFrom?: string },
): Promise<string> {
  const [row] = await db.insert(designRevisions).values(input).returning({ id: designRevisions.id })
  return row.id
}
