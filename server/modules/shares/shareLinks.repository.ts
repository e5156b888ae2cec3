import { and, desc, eq, sql } from 'drizzle-orm'
import type { DbOrTx } from '../../db/client'
import { approvals, designRevisions, projects, shareLinks, users } from '../../db/schema'

const linkColumns = {
  id: shareLinks.id,
  projectId: shareLinks.projectId,
  label: shareLinks.label,
  expiresAt: shareLinks.expiresAt,
  revokedAt: shareLinks.revokedAt,
  createdAt: shareLinks.createdAt,
  createdById: shareLinks.createdBy,
  createdByName: users.name,
  canEmail: sql<boolean>`(${shareLinks.tokenCiphertext} is not null)`,
}
export type ShareLinkRow = Awaited<ReturnType<typeof listShareLinks>>[number]

export async function insertShareLink(db: DbOrTx, values: typeof shareLinks.$inferInsert): Promise<string> {
  const [row] = await db.insert(shareLinks).values(values).returning({ id: shareLinks.id })
  return row.id
}

export async function listShareLinks(db: DbOrTx, projectId: string) {
  return db
    .select(linkColumns)
    .from(shareLinks)
    .leftJoin(users, eq(users.id, shareLinks.createdBy))
    .where(eq(shareLinks.projectId, projectId))
    .orderBy(desc(shareLinks.createdAt), desc(shareLinks.id))
}

export async function findShareLink(db: DbOrTx, projectId: string, linkId: string) {
  const [row] = await db
    .select(linkColumns)
    .from(shareLinks)
    .leftJoin(users, eq(users.id, shareLinks.createdBy))
    .where(and(eq(shareLinks.projectId, projectId), eq(shareLinks.id, linkId)))
  return row
}

/** The stored token (hash and ciphertext) of one link, for e-mailing it again. */
export async function findShareLinkToken(db: DbOrTx, projectId: string, linkId: string) {
  const [row] = await db
    .select({ tokenHash: shareLinks.tokenHash, tokenCiphertext: shareLinks.tokenCiphertext })
    .from(shareLinks)
    .where(and(eq(shareLinks.projectId, projectId), eq(shareLinks.id, linkId)))
  return row
}

export async function revokeShareLink(db: DbOrTx, projectId: string, linkId: string): Promise<boolean> {
  const rows = await db
    .update(shareLinks)
    .set({ revokedAt: new Date() })
    .where(and(eq(shareLinks.projectId, projectId), eq(shareLinks.id, linkId)))
    .returning({ id: shareLinks.id })
  return rows.length > 0
}

/** The link by token hash, with its project (for the public view). */
export async function findLinkByTokenHash(db: DbOrTx, tokenHash: string) {
  const [row] = await db
    .select({
      id: shareLinks.id,
      projectId: shareLinks.projectId,
      label: shareLinks.label,
      expiresAt: shareLinks.expiresAt,
      revokedAt: shareLinks.revokedAt,
      createdById: shareLinks.createdBy,
      projectName: projects.name,
      clientName: projects.clientName,
      organizationId: projects.organizationId,
      projectCreatedBy: projects.createdBy,
    })
    .from(shareLinks)
    .innerJoin(projects, eq(projects.id, shareLinks.projectId))
    .where(eq(shareLinks.tokenHash, tokenHash))
  return row
}

export async function insertApproval(db: DbOrTx, values: typeof approvals.$inferInsert) {
  const [row] = await db.insert(approvals).values(values).returning()
  return row
}

export async function listApprovals(db: DbOrTx, projectId: string) {
  return db.select().from(approvals).where(eq(approvals.projectId, projectId)).orderBy(desc(approvals.createdAt), desc(approvals.id))
}

export async function listNamedRevisions(db: DbOrTx, projectId: string) {
  return db
    .select({ id: designRevisions.id, name: designRevisions.name, createdAt: designRevisions.createdAt })
    .from(designRevisions)
    .where(eq(designRevisions.projectId, projectId))
    .orderBy(desc(designRevisions.createdAt))
}

export async function usersByIds(db: DbOrTx, ids: string[]) {
  const out: { id: string; name: string; email: string }[] = []
  for (const id of new Set(ids)) {
    const [u] = await db.select({ id: users.id, name: users.name, email: users.email }).from(users).where(eq(users.id, id))
    if (u) out.push(u)
  }
  return out
}
