// Storage of a design's Yjs state: the compacted state (design_states), the durable log of later
// updates (design_updates) and the designs row whose revision counter every stored change advances.
import { and, asc, eq, gt, lte, sql } from 'drizzle-orm'
import type { DbOrTx } from '../db/client'
import { designs, designStates, designUpdates } from '../db/schema'

export interface StoredDesignState {
  /** The JSON document (the only content of a design that was never opened for co-editing). */
  document: unknown
  revision: number
  updatedAt: Date
  /** Compacted Yjs state, or undefined when the design has not been converted yet. */
  state: Uint8Array | undefined
  compactedThrough: number
  /** Updates logged after the compaction point, oldest first. */
  updates: { id: number; update: Uint8Array }[]
}

export async function readStoredState(db: DbOrTx, projectId: string): Promise<StoredDesignState | undefined> {
  const [design] = await db
    .select({
      document: designs.document,
      revision: designs.revision,
      updatedAt: designs.updatedAt,
      state: designStates.state,
      compactedThrough: designStates.compactedThrough,
    })
    .from(designs)
    .leftJoin(designStates, eq(designStates.projectId, designs.projectId))
    .where(eq(designs.projectId, projectId))
  if (!design) return undefined
  const compactedThrough = design.compactedThrough ?? 0
  const updates = await db
    .select({ id: designUpdates.id, update: designUpdates.update })
    .from(designUpdates)
    .where(and(eq(designUpdates.projectId, projectId), gt(designUpdates.id, compactedThrough)))
    .orderBy(asc(designUpdates.id))
  return { ...design, state: design.state ?? undefined, compactedThrough, updates }
}

/** Stores the first Yjs state of a JSON-only design; false when another writer converted it first. */
export async function insertInitialState(db: DbOrTx, projectId: string, state: Uint8Array): Promise<boolean> {
  const inserted = await db
    .insert(designStates)
    .values({ projectId, state, compactedThrough: 0 })
    .onConflictDoNothing()
    .returning({ projectId: designStates.projectId })
  return inserted.length === 1
}

/** Commits one update to the log and advances the design's revision, in one transaction. */
export async function appendUpdate(db: DbOrTx, input: { projectId: string; update: Uint8Array; userId: string | null }) {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(designUpdates)
      .values({ projectId: input.projectId, update: input.update, userId: input.userId })
      .returning({ id: designUpdates.id })
    const [design] = await tx
      .update(designs)
      .set({ revision: sql`${designs.revision} + 1`, updatedAt: new Date(), updatedBy: input.userId })
      .where(eq(designs.projectId, input.projectId))
      .returning({ revision: designs.revision, updatedAt: designs.updatedAt })
    if (!design) throw new Error(`design of project ${input.projectId} is gone`)
    return { id: row.id, revision: design.revision, updatedAt: design.updatedAt }
  })
}

/**
 * Folds the log up to `throughId` into the stored state (which must already contain those updates),
 * deletes the folded rows and refreshes the JSON copy in designs.document.
 */
export async function compactState(
  db: DbOrTx,
  input: { projectId: string; state: Uint8Array; throughId: number; document: unknown },
): Promise<void> {
  await db.transaction(async (tx) => {
    await tx
      .insert(designStates)
      .values({ projectId: input.projectId, state: input.state, compactedThrough: input.throughId })
      .onConflictDoUpdate({
        target: designStates.projectId,
        set: { state: input.state, compactedThrough: input.throughId, updatedAt: new Date() },
      })
    await tx
      .delete(designUpdates)
      .where(and(eq(designUpdates.projectId, input.projectId), lte(designUpdates.id, input.throughId)))
    await tx.update(designs).set({ document: input.document }).where(eq(designs.projectId, input.projectId))
  })
}
