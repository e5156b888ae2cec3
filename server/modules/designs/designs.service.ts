import type { DocumentHub } from '../../collab/documentHub'
import type { Db } from '../../db/client'
import type { Actor } from '../../http/actor'
import { conflict, invalidRequest, notFound } from '../../http/errors'
import { validateDesign } from './design-document'
import { getProject } from '../projects/projects.service'
import { readStoredDesign, replaceStoredDesign } from './design-state'

/** The stored (Yjs) state of the design, as live editors share it. */
export async function getDesign(db: Db, actor: Actor, projectId: string) {
  await getProject(db, actor, projectId)
  const view = await readStoredDesign(db, projectId)
  if (!view) throw notFound('Design')
  return { design: view.design, revision: view.revision, updatedAt: view.updatedAt.toISOString() }
}

/** Replaces the design as one Yjs update (live editors receive it); 409 if `baseRevision` is stale. */
export async function saveDesign(
  deps: { db: Db; hub: DocumentHub },
  actor: Actor,
  input: { projectId: string; baseRevision: number; document: unknown },
) {
  await getProject(deps.db, actor, input.projectId)
  const checked = validateDesign(input.document)
  if (!checked.ok) {
    const message = checked.fields.length === 1 ? checked.fields[0].message : 'The design has errors'
    throw invalidRequest(message, checked.fields)
  }
  const saved = await replaceStoredDesign(deps.hub, {
    projectId: input.projectId,
    design: checked.design,
    userId: actor.userId,
    check: ({ revision }) => {
      if (revision === input.baseRevision) return
      throw conflict(
        `The design was changed by someone else (now at revision ${revision}, yours is based on ${input.baseRevision}). Reload it and apply your change again.`,
      )
    },
  })
  return { revision: saved.revision, updatedAt: saved.updatedAt.toISOString() }
}
