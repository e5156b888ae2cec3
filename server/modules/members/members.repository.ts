import { and, asc, count, eq } from 'drizzle-orm'
import type { Role } from '../../../shared/api/roles'
import type { DbOrTx } from '../../db/client'
import { memberships, organizations, users } from '../../db/schema'

const memberColumns = {
  userId: users.id,
  name: users.name,
  email: users.email,
  role: memberships.role,
  joinedAt: memberships.createdAt,
}

export type MemberRow = { userId: string; name: string; email: string; role: Role; joinedAt: Date }

export async function listMembers(db: DbOrTx, organizationId: string): Promise<MemberRow[]> {
  return db
    .select(memberColumns)
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.organizationId, organizationId))
    .orderBy(asc(users.name), asc(users.id))
}

/** A member of the organisation with their role, or undefined when the user is not in it. */
export async function findMemberInOrganization(
  db: DbOrTx,
  organizationId: string,
  userId: string,
): Promise<MemberRow | undefined> {
  const [row] = await db
    .select(memberColumns)
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.organizationId, organizationId), eq(memberships.userId, userId)))
    .limit(1)
  return row
}

/** Serialises role changes and removals within one organisation (the last-owner rule needs it). */
export async function lockOrganization(db: DbOrTx, organizationId: string): Promise<void> {
  await db.select({ id: organizations.id }).from(organizations).where(eq(organizations.id, organizationId)).for('update')
}

export async function countOwners(db: DbOrTx, organizationId: string): Promise<number> {
  const [{ owners }] = await db
    .select({ owners: count() })
    .from(memberships)
    .where(and(eq(memberships.organizationId, organizationId), eq(memberships.role, 'owner')))
  return owners
}

export async function setMemberRole(db: DbOrTx, organizationId: string, userId: string, role: Role): Promise<void> {
  await db
    .update(memberships)
    .set({ role })
    .where(and(eq(memberships.organizationId, organizationId), eq(memberships.userId, userId)))
}

/** A user belongs to one organisation, so removing the member removes the account (and its shares). */
export async function deleteMemberAccount(db: DbOrTx, userId: string): Promise<void> {
  await db.delete(users).where(eq(users.id, userId))
}
