import { and, asc, count, desc, eq, ilike, or, sql, type SQL } from 'drizzle-orm'
import type { z } from 'zod'
import type { projectListQuerySchema } from '../../../shared/api/projects.schemas'
import { can } from '../../../shared/api/roles'
import type { Actor } from '../../http/actor'
import type { DbOrTx } from '../../db/client'
import { designs, projects, projectShares, users } from '../../db/schema'


export type ProjectRow = NonNullable<Awaited<ReturnType<typeof findVisibleProject>>>
export type ProjectValues = Pick<
  typeof projects.$inferInsert,
  'name' | 'clientName' | 'installationKind' | 'nominalVoltageV' | 'notes'
>

const projectColumns = {
  id: projects.id,
  name: projects.name,
  clientName: projects.clientName,
  installationKind: projects.installationKind,
  nominalVoltageV: projects.nominalVoltageV,
  notes: projects.notes,
  archived: projects.archived,
  createdAt: projects.createdAt,
  updatedAt: projects.updatedAt,
  createdById: projects.createdBy,
  createdByName: users.name,
}

function visibleTo(actor: Actor): SQL {
  const inOrganization = eq(projects.organizationId, actor.organizationId)
  if (can(actor.role, 'project.readAll')) return inOrganization
  const shared = sql`exists (select 1 from ${projectShares} where ${projectShares.projectId} = ${projects.id} and ${projectShares.userId} = ${actor.userId})`
  return and(inOrganization, shared)!
}

const SORT_COLUMNS = {
  name: sql`lower(${projects.name})`,
  clientName: sql`lower(${projects.clientName})`,
  installationKind: projects.installationKind,
  nominalVoltageV: projects.nominalVoltageV,
  updatedAt: projects.updatedAt,
  createdAt: projects.createdAt,
} as const

/** `%text%` for ILIKE with the pattern characters escaped (backslash is PostgreSQL's default escape). */
function containsPattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`
}

type ListQuery = z.output<typeof projectListQuerySchema>

export async function listVisibleProjects(db: DbOrTx, actor: Actor, query: ListQuery) {
  const filters: (SQL | undefined)[] = [visibleTo(actor)]
  if (query.archived === 'exclude') filters.push(eq(projects.archived, false))
  if (query.archived === 'only') filters.push(eq(projects.archived, true))
  if (query.q) {
    const pattern = containsPattern(query.q)
    filters.push(or(ilike(projects.name, pattern), ilike(projects.clientName, pattern), ilike(projects.notes, pattern)))
  }
  const where = and(...filters)
  const direction = query.order === 'asc' ? asc : desc
  const items = await db
    .select(projectColumns)
    .from(projects)
    .leftJoin(users, eq(users.id, projects.createdBy))
    .where(where)
    .orderBy(direction(SORT_COLUMNS[query.sort]), asc(projects.id))
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize)
  const [{ total }] = await db.select({ total: count() }).from(projects).where(where)
  return { items, total }
}

export async function findVisibleProject(db: DbOrTx, actor: Actor, projectId: string) {
  const [row] = await db
    .select(projectColumns)
    .from(projects)
    .leftJoin(users, eq(users.id, projects.createdBy))
    .where(and(eq(projects.id, projectId), visibleTo(actor)))
    .limit(1)
  return row
}

export async function insertProjectWithDesign(
  db: DbOrTx,
  input: { organizationId: string; createdBy: string; values: ProjectValues; document: unknown },
): Promise<string> {
  const [project] = await db
    .insert(projects)
    .values({ ...input.values, organizationId: input.organizationId, createdBy: input.createdBy })
    .returning({ id: projects.id })
  await db.insert(designs).values({ projectId: project.id, document: input.document, updatedBy: input.createdBy })
  return project.id
}

export async function updateProject(
  db: DbOrTx,
  actor: Actor,
  projectId: string,
  changes: Partial<ProjectValues> & { archived?: boolean },
): Promise<boolean> {
  const updated = await db
    .update(projects)
    .set({ ...changes, updatedAt: new Date() })
    .where(and(eq(projects.id, projectId), eq(projects.organizationId, actor.organizationId)))
    .returning({ id: projects.id })
  return updated.length > 0
}

export async function deleteProject(db: DbOrTx, actor: Actor, projectId: string): Promise<boolean> {
  const deleted = await db
    .delete(projects)
    .where(and(eq(projects.id, projectId), eq(projects.organizationId, actor.organizationId)))
    .returning({ id: projects.id })
  return deleted.length > 0
}

export async function findDesignDocument(db: DbOrTx, projectId: string): Promise<unknown> {
  const [row] = await db.select({ document: designs.document }).from(designs).where(eq(designs.projectId, projectId))
  return row?.document
}
