import type { Db } from '../../db/client'
import type { Actor } from '../../http/actor'
import { conflict, invalidRequest, notFound } from '../../http/errors'
import { validateDesign } from './design-document'
import { getProject } from '../projects/projects.service'
import { findDesign, saveDesignIfCurrent } from './designs.repository'

export async function getDesign(db: Db, actor: Actor, projectId: string) {
  await getProject(db, actor, projectId)
  const row = await findDesign(db, projectId)
  if (!row) throw notFound('Design')
  return { design: row.document, revision: row.revision, updatedAt: row.updatedAt.toISOString() }
}

export async function saveDesign(
  db: Db,
  actor: Actor,
  input: { projectId: string; baseRevision: number; document: unknown },
) {
  await getProject(db, actor, input.projectId)
  const checked = validateDesign(input.document)
  if (!checked.ok) {
    const message = checked.fields.length === 1 ? checked.fields[0].message : 'The design has errors'
    throw invalidRequest(message, checked.fields)
  }
  const saved = await saveDesignIfCurrent(db, { ...input, document: checked.design, userId: actor.userId })
  if (saved) return { revision: saved.revision, updatedAt: saved.updatedAt.toISOString() }
  const current = await findDesign(db, input.projectId)
  if (!current) throw notFound('Design')
  throw conflict(
    `The design was changed by someone else (now at revision ${current.revision}, yours is based on ${input.baseRevision}). Reload it and apply your change again.`,
  )
}
