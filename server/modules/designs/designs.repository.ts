import { and, eq, sql } from 'drizzle-orm'
import type { DbOrTx } from '../../db/client'
import { designs } from '../../db/schema'

export async function findDesign(db: DbOrTx, projectId: string) {
  const [row] = await db
    .select({ document: designs.document, revision: designs.revision, updatedAt: designs.updatedAt })
    .from(designs)
    .where(eq(designs.projectId, projectId))
  return row
}

/** Writes the document only if nobody saved since `baseRevision`; undefined means the base is stale. */
export async function saveDesignIfCurrent(
  db: DbOrTx,
  input: { projectId: string; baseRevision: number; document: unknown; userId: string },
) {
  const [row] = await db
    .update(designs)
    .set({
      document: input.document,
      revision: sql`${designs.revision} + 1`,
      updatedAt: new Date(),
      updatedBy: input.userId,
    })
    .where(and(eq(designs.projectId, input.projectId), eq(designs.revision, input.baseRevision)))
    .returning({ revision: designs.revision, updatedAt: designs.updatedAt })
  return row
}
