import { desc, eq, sql } from 'drizzle-orm'
import type { Db } from '../../db/client'
import { invitations, memberships, outboxMessages, users } from '../../db/schema'

const OUTBOX_LIMIT = 200

/** Captured messages with at least one recipient who is a member or invitee of the organisation. */
export async function listOutboxFor(db: Db, organizationId: string) {
  const memberEmails = db
    .select({ email: users.email })
    .from(users)
    .innerJoin(memberships, eq(memberships.userId, users.id))
    .where(eq(memberships.organizationId, organizationId))
  const invitedEmails = db
    .select({ email: invitations.email })
    .from(invitations)
    .where(eq(invitations.organizationId, organizationId))
  return db
    .select()
    .from(outboxMessages)
    .where(sql`${outboxMessages.recipients} && array(${memberEmails} union ${invitedEmails})`)
    .orderBy(desc(outboxMessages.receivedAt), desc(outboxMessages.id))
    .limit(OUTBOX_LIMIT)
}
