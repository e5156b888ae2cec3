import {
  PROJECT_NAME_MAX,
  type Page,
  type Project,
  type projectInputSchema,
  type projectListQuerySchema,
  type projectUpdateSchema,
} from '../../../shared/api/projects.schemas'
import type { z } from 'zod'
import type { DbOrTx, Db } from '../../db/client'
import type { Actor } from '../../http/actor'
import { invalidRequest, notFound } from '../../http/errors'
import { emptyDesignFor } from '../designs/design-document'
import { readStoredDesign } from '../designs/design-state'
import {
  deleteProject,
  findVisibleProject,
  insertProjectWithDesign,
  listVisibleProjects,
  updateProject,
  type ProjectRow,
} from './projects.repository'
import { findMemberInOrganization } from '../members/members.repository'
import { deleteShare, insertShare, listShares } from './project-shares.repository'
import { createDemoDesign } from '../../../shared/design/demo'

export function toProject(row: ProjectRow): Project {
  return {
    id: row.id,
    name: row.name,
    clientName: row.clientName,
    installationKind: row.installationKind,
    nominalVoltageV: row.nominalVoltageV as Project['nominalVoltageV'],
    notes: row.notes,
    archived: row.archived,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    createdBy: row.createdById && row.createdByName ? { id: row.createdById, name: row.createdByName } : null,
  }
}

/** The project if the actor may see it; another organisation's (or an unshared one for a client) is 404. */
export async function getProject(db: DbOrTx, actor: Actor, projectId: string): Promise<Project> {
  const row = await findVisibleProject(db, actor, projectId)
  if (!row) throw notFound('Project')
  return toProject(row)
}

export async function listProjects(
  db: Db,
  actor: Actor,
  query: z.output<typeof projectListQuerySchema>,
): Promise<Page<Project>> {
  const { items, total } = await listVisibleProjects(db, actor, query)
  return { items: items.map(toProject), total, page: query.page, pageSize: query.pageSize }
}

export async function createProject(db: Db, actor: Actor, input: z.output<typeof projectInputSchema>) {
  const id = await db.transaction((tx) =>
    insertProjectWithDesign(tx, {
      organizationId: actor.organizationId,
      createdBy: actor.userId,
      values: input,
      document: emptyDesignFor(input),
    }),
  )
  return getProject(db, actor, id)
}

/** The invented demo system as a new project of the actor's organisation: what new users open first. */
export async function createDemoProject(db: Db, actor: Actor) {
  const design = createDemoDesign()
  const id = await db.transaction((tx) =>
    insertProjectWithDesign(tx, {
      organizationId: actor.organizationId,
      createdBy: actor.userId,
      values: {
        name: design.name,
        clientName: 'Demo (invented)',
        installationKind: 'vehicle',
        nominalVoltageV: design.settings.nominalVoltageV,
        notes: 'An invented 24 V expedition-truck system to explore: open its design to see live findings.',
      },
      document: design,
    }),
  )
  return getProject(db, actor, id)
}

export async function editProject(
  db: Db,
  actor: Actor,
  projectId: string,
  changes: z.output<typeof projectUpdateSchema>,
) {
  await getProject(db, actor, projectId)
  if (Object.keys(changes).length === 0) throw invalidRequest('Nothing to change')
  if (!(await updateProject(db, actor, projectId, changes))) throw notFound('Project')
  return getProject(db, actor, projectId)
}

/** "<name> (copy)", shortened so it still fits the name limit. */
export function copyName(name: string): string {
  const suffix = ' (copy)'
  return name.slice(0, PROJECT_NAME_MAX - suffix.length).trimEnd() + suffix
}

export async function duplicateProject(db: Db, actor: Actor, projectId: string) {
  const source = await getProject(db, actor, projectId)
  const id = await db.transaction(async (tx) => {
    const values = {
      name: copyName(source.name),
      clientName: source.clientName,
      installationKind: source.installationKind,
      nominalVoltageV: source.nominalVoltageV,
      notes: source.notes,
    }
    // The stored Yjs state (what live editors see), not the JSON copy refreshed only at compaction.
    const document = (await readStoredDesign(tx, projectId))?.design ?? emptyDesignFor(values)
    return insertProjectWithDesign(tx, { organizationId: actor.organizationId, createdBy: actor.userId, values, document })
  })
  return getProject(db, actor, id)
}

export async function removeProject(db: Db, actor: Actor, projectId: string): Promise<void> {
  if (!(await deleteProject(db, actor, projectId))) throw notFound('Project')
}

export async function projectShares(db: Db, actor: Actor, projectId: string) {
  await getProject(db, actor, projectId)
  return listShares(db, projectId)
}

export const SHARE_CLIENT_ONLY = 'Only client members can be given a share: other roles already see every project'

export async function shareProject(db: Db, actor: Actor, projectId: string, userId: string) {
  await getProject(db, actor, projectId)
  const member = await findMemberInOrganization(db, actor.organizationId, userId)
  if (!member) throw notFound('Member')
  if (member.role !== 'client') throw invalidRequest(SHARE_CLIENT_ONLY, [{ path: 'userId', message: SHARE_CLIENT_ONLY }])
  await insertShare(db, projectId, userId)
  return { userId: member.userId, name: member.name, email: member.email }
}

export async function unshareProject(db: Db, actor: Actor, projectId: string, userId: string): Promise<void> {
  await getProject(db, actor, projectId)
  if (!(await deleteShare(db, projectId, userId))) throw notFound('Share')
}
