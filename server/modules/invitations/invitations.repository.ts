import { and, desc, eq, gt, isNull } from 'drizzle-orm'
import type { Role } from '../../../shared/api/roles'
import type { DbOrTx } from '../../db/client'
import { invitations, organizations, users } from '../../db/schema'

const pending = () => and(isNull(invitations.acceptedAt), gt(invitations.expiresAt, new Date()))

const invitationColumns = {
  id: invitations.id,
  email: invitations.email,
  role: invitations.role,
  expiresAt: invitations.expiresAt,
  createdAt: invitations.createdAt,
  invitedByName: users.name,
}

export type InvitationRow = { id: string; email: string; role: Role; expiresAt: Date; createdAt: Date; invitedByName: string | null }

export async function listPendingInvitations(db: DbOrTx, organizationId: string): Promise<InvitationRow[]> {
  return db
    .select(invitationColumns)
    .from(invitations)
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(and(eq(invitations.organizationId, organizationId), pending()))
    .orderBy(desc(invitations.createdAt), desc(invitations.id))
}

export async function findInvitation(db: DbOrTx, organizationId: string, id: string): Promise<InvitationRow | undefined> {
  const [row] = await db
    .select(invitationColumns)
    .from(invitations)
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(and(eq(invitations.organizationId, organizationId), eq(invitations.id, id)))
  return row
}

/** Replaces any earlier open invitation for the same address in the organisation (a re-send). */
export async function deleteOpenInvitationsFor(db: DbOrTx, organizationId: string, email: string): Promise<void> {
  await db
    .delete(invitations)
    .where(and(eq(invitations.organizationId, organizationId), eq(invitations.email, email), isNull(invitations.acceptedAt)))
}

export async function insertInvitation(
  db: DbOrTx,
  input: { organizationId: string; email: string; role: Role; tokenHash: string; invitedBy: string; expiresAt: Date },
): Promise<string> {
  const [row] = await db.insert(invitations).values(input).returning({ id: invitations.id })
  return row.id
}

export async function deleteOpenInvitation(db: DbOrTx, organizationId: string, id: string): Promise<boolean> {
  const deleted = await db
    .delete(invitations)
    .where(and(eq(invitations.organizationId, organizationId), eq(invitations.id, id), isNull(invitations.acceptedAt)))
    .returning({ id: invitations.id })
  return deleted.length > 0
}

/** A pending invitation by token hash, with its organisation's name; `lock` holds it until commit. */
export async function findPendingByTokenHash(db: DbOrTx, tokenHash: string, options: { lock?: boolean } = {}) {
  const query = db
    .select({
      id: invitations.id,
      email: invitations.email,
      role: invitations.role,
      organizationId: invitations.organizationId,
      organizationName: organizations.name,
    })
    .from(invitations)
    .innerJoin(organizations, eq(organizations.id, invitations.organizationId))
    .where(and(eq(invitations.tokenHash, tokenHash), pending()))
    .limit(1)
  const [row] = options.lock ? await query.for('update', { of: invitations }) : await query
  return row
}

export async function markInvitationAccepted(db: DbOrTx, id: string): Promise<void> {
  await db.update(invitations).set({ acceptedAt: new Date() }).where(eq(invitations.id, id))
}
