// Storage of a design's Yjs state: the compacted state (design_states), the durable log of later
// updates (design_updates) and the designs row whose revision counter every stored change advances.
import { and, asc, eq, gt, lte, sql } from 'drizzle-orm'
import type { Db, DbOrTx } from '../db/client'
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

/**
 * Reads state and log in one snapshot (repeatable read): a compaction committing between the two
 * queries would otherwise hide the updates it folded.
 */
export function readStoredState(db: DbOrTx, projectId: string): Promise<StoredDesignState | undefined> {
  // Inside a caller's transaction: read there (its snapshot is the caller's business).
  if ('rollback' in db) return readStoredStateIn(db, projectId)
  return (db as Db).transaction((tx) => readStoredStateIn(tx, projectId), { isolationLevel: 'repeatable read', accessMode: 'read only' })
}

async function readStoredStateIn(db: DbOrTx, projectId: string): Promise<StoredDesignState | undefined> {
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

export interface LoggedUpdate {
  update: Uint8Array
  userId: string | null
}

export interface AppendedDesign {
  /** Id of the design's newest logged row. */
  lastId: number
  revision: number
  updatedAt: Date
}

const asBuffer = (bytes: Uint8Array) => Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength)

/**
 * Commits the updates of several designs in one statement — one transaction, one WAL flush — and
 * advances each design's revision by its number of updates (its last author becomes updated_by).
 * Each design appears at most once in `batch`. Designs missing from the answer are gone.
 */
export async function appendUpdates(
  db: DbOrTx,
  batch: readonly { projectId: string; updates: readonly LoggedUpdate[] }[],
): Promise<Map<string, AppendedDesign>> {
  const rows = batch.flatMap((entry) => entry.updates.map((u) => ({ projectId: entry.projectId, u })))
  const result = await db.execute<{ project_id: string; last_id: string; revision: number; updated_at: string | Date }>(sql`
    with logged as (
      insert into ${designUpdates} (project_id, update, user_id)
      select * from unnest(
        ${sql.param(rows.map((r) => r.projectId))}::uuid[],
        ${sql.param(rows.map((r) => asBuffer(r.u.update)))}::bytea[],
        ${sql.param(rows.map((r) => r.u.userId))}::uuid[])
      returning id, project_id
    ), per_design as (
      select project_id, max(id) as last_id, count(*)::int as n from logged group by project_id
    )
    update ${designs} as d
    set revision = d.revision + p.n, updated_at = now(), updated_by = a.user_id
    from per_design p
    join unnest(
      ${sql.param(batch.map((entry) => entry.projectId))}::uuid[],
      ${sql.param(batch.map((entry) => entry.updates.at(-1)?.userId ?? null))}::uuid[]) as a(project_id, user_id)
      on a.project_id = p.project_id
    where d.project_id = p.project_id
    returning d.project_id, p.last_id, d.revision, d.updated_at`)
  return new Map(
    result.rows.map((row) => [row.project_id, { lastId: Number(row.last_id), revision: row.revision, updatedAt: new Date(row.updated_at) }]),
  )
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
