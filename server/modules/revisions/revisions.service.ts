// Named revisions of a design: a snapshot of the stored Yjs state taken in the room's queue (so it is
// exactly the state at that point), the design JSON read from it, compare (with the analysis run on
// both sides) and restore (the current document becomes the revision's content as a new Yjs update).
import * as Y from 'yjs'
import type { Revision } from '../../../shared/api/revisions.schemas'
import { analyzeDesign } from '../../../shared/analysis'
import { diffDesigns } from '../../../shared/collab/diffDesigns'
import type { Design } from '../../../shared/design/schema'
import type { DocumentHub } from '../../collab/documentHub'
import type { DesignRoom } from '../../collab/designRoom'
import type { Db } from '../../db/client'
import type { Actor } from '../../http/actor'
import { notFound } from '../../http/errors'
import { replacementUpdate } from '../designs/design-state'
import { getProject } from '../projects/projects.service'
import { findRevision, insertRevision, listRevisions, type RevisionRow } from './revisions.repository'

interface Deps {
  db: Db
  hub: DocumentHub
}

function toRevision(row: RevisionRow): Revision {
  return {
    id: row.id,
    name: row.name,
    createdAt: row.createdAt.toISOString(),
    author: row.authorId && row.authorName ? { id: row.authorId, name: row.authorName } : null,
    restoredFrom: row.restoredFrom,
  }
}

async function revisionOrThrow(db: Db, projectId: string, revisionId: string) {
  const row = await findRevision(db, projectId, revisionId)
  if (!row) throw notFound('Revision')
  return row
}

/** Records the room's current state under `name` (in the room's queue: nothing slips in between). */
async function recordRevision(db: Db, room: DesignRoom, input: { name: string; userId: string; restoredFrom?: string }) {
  const { snapshot, design } = await room.exclusive(async () => ({ snapshot: Y.encodeStateAsUpdate(room.doc), design: room.design() }))
  return insertRevision(db, { projectId: room.projectId, name: input.name, snapshot, design, createdBy: input.userId, restoredFrom: input.restoredFrom })
}

async function revisionById(db: Db, projectId: string, id: string): Promise<Revision> {
  return toRevision(await revisionOrThrow(db, projectId, id))
}

export async function getRevisions(deps: Deps, actor: Actor, projectId: string): Promise<Revision[]> {
  await getProject(deps.db, actor, projectId)
  return (await listRevisions(deps.db, projectId)).map(toRevision)
}

export async function createRevision(deps: Deps, actor: Actor, projectId: string, name: string): Promise<Revision> {
  await getProject(deps.db, actor, projectId)
  const id = await deps.hub.withRoom(projectId, (room) => recordRevision(deps.db, room, { name, userId: actor.userId }))
  if (!id) throw notFound('Design')
  return revisionById(deps.db, projectId, id)
}

export async function getRevision(deps: Deps, actor: Actor, projectId: string, revisionId: string) {
  await getProject(deps.db, actor, projectId)
  const row = await revisionOrThrow(deps.db, projectId, revisionId)
  return { revision: toRevision(row), design: row.design as Design }
}

export async function compareRevisions(deps: Deps, actor: Actor, projectId: string, fromId: string, toId: string) {
  await getProject(deps.db, actor, projectId)
  const [from, to] = [await revisionOrThrow(deps.db, projectId, fromId), await revisionOrThrow(deps.db, projectId, toId)]
  const fromDesign = from.design as Design
  const toDesign = to.design as Design
  return {
    from: toRevision(from),
    to: toRevision(to),
    ...diffDesigns(fromDesign, toDesign, analyzeDesign(fromDesign).findings, analyzeDesign(toDesign).findings),
  }
}

/** The current document becomes the revision's content (one Yjs update, live editors see it); a new
 * revision "Restored from …" records the result. Earlier revisions and the update log are kept. */
export async function restoreRevision(deps: Deps, actor: Actor, projectId: string, revisionId: string): Promise<Revision> {
  await getProject(deps.db, actor, projectId)
  const source = await revisionOrThrow(deps.db, projectId, revisionId)
  const id = await deps.hub.withRoom(projectId, async (room) => {
    await room.commitServerChange((doc) => replacementUpdate(doc, source.design as Design), actor.userId)
    return recordRevision(deps.db, room, { name: `Restored from “${source.name}”`, userId: actor.userId, restoredFrom: source.id })
  })
  if (!id) throw notFound('Design')
  return revisionById(deps.db, projectId, id)
}
