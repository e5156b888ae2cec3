import { and, eq, gt } from 'drizzle-orm'
import type { Role } from '../../../shared/api/roles'
import type { DbOrTx } from '../../db/client'
import { memberships, organizations, sessions, users } from '../../db/schema'

export type UserRow = typeof users.$inferSelect

export async function findUserByEmail(db: DbOrTx, email: string): Promise<UserRow | undefined> {
  const [row] = await db.select().from(users).where(eq(users.email, email)).limit(1)
  return row
}

const contextColumns = {
  user: { id: users.id, name: users.name, email: users.email },
  organization: { id: organizations.id, name: organizations.name },
  role: memberships.role,
}

/** The user, organisation and role right after sign-in (no session check yet). */
export async function findMemberContext(db: DbOrTx, userId: string, organizationId: string) {
  const [row] = await db
    .select(contextColumns)
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .innerJoin(organizations, eq(organizations.id, memberships.organizationId))
    .where(and(eq(memberships.userId, userId), eq(memberships.organizationId, organizationId)))
    .limit(1)
  return row
}

/** The same, only while the session row is live; undefined if the session, user or membership is gone. */
export async function findSessionContext(
  db: DbOrTx,
  ids: { userId: string; organizationId: string; sessionId: string },
) {
  const [row] = await db
    .select(contextColumns)
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .innerJoin(organizations, eq(organizations.id, memberships.organizationId))
    .innerJoin(sessions, eq(sessions.userId, users.id))
    .where(
      and(
        eq(memberships.userId, ids.userId),
        eq(memberships.organizationId, ids.organizationId),
        eq(sessions.id, ids.sessionId),
        gt(sessions.expiresAt, new Date()),
      ),
    )
    .limit(1)
  return row
}

export async function findMembershipOfUser(db: DbOrTx, userId: string) {
  const [row] = await db.select().from(memberships).where(eq(memberships.userId, userId)).limit(1)
  return row
}

export async function insertOrganization(db: DbOrTx, name: string) {
  const [row] = await db.insert(organizations).values({ name }).returning()
  return row
}

/** Creates a user and their membership in one organisation. */
export async function insertMember(
  db: DbOrTx,
  input: { organizationId: string; name: string; email: string; passwordHash: string; role: Role },
): Promise<UserRow> {
  const [user] = await db
    .insert(users)
    .values({ name: input.name, email: input.email, passwordHash: input.passwordHash })
    .returning()
  await db.insert(memberships).values({ organizationId: input.organizationId, userId: user.id, role: input.role })
  return user
}

export async function updatePasswordHash(db: DbOrTx, userId: string, passwordHash: string): Promise<void> {
  await db.update(users).set({ passwordHash, updatedAt: new Date() }).where(eq(users.id, userId))
}

/** PostgreSQL unique_violation: a concurrent request registered the same e-mail first. */
export function isUniqueViolation(error: unknown): boolean {
  const code = (error as { code?: unknown; cause?: { code?: unknown } } | null)
  return code?.code === '23505' || code?.cause?.code === '23505'
}

