// The owner's view of what the local fake SMTP server captured. Only mail addressed to people of the
// owner's organisation (members and invitees) is shown; with a real SMTP relay the outbox stays empty.
import { Router } from 'express'
import { and, desc, eq, sql } from 'drizzle-orm'
import type { OutboxMessage } from '../../../shared/api/members.schemas'
import type { Db } from '../../db/client'
import { invitations, memberships, outboxMessages, users } from '../../db/schema'
import { actorOf } from '../../http/actor'
import { requirePermission } from '../../http/auth'
import type { RouteDeps } from '../../http/route-deps'

const OUTBOX_LIMIT = 200

export async function outboxFor(db: Db, organizationId: string): Promise<OutboxMessage[]> {
  const memberEmails = db
    .select({ email: users.email })
    .from(users)
    .innerJoin(memberships, eq(memberships.userId, users.id))
    .where(eq(memberships.organizationId, organizationId))
  const invitedEmails = db
    .select({ email: invitations.email })
    .from(invitations)
    .where(eq(invitations.organizationId, organizationId))
  const rows = await db
    .select()
    .from(outboxMessages)
    .where(
      and(
        sql`${outboxMessages.recipients} && array(${memberEmails} union ${invitedEmails})`,
      ),
    )
    .orderBy(desc(outboxMessages.receivedAt), desc(outboxMessages.id))
    .limit(OUTBOX_LIMIT)
  return rows.map((row) => ({
    id: row.id,
    from: row.from,
    to: row.to,
    subject: row.subject,
    text: row.text,
    receivedAt: row.receivedAt.toISOString(),
  }))
}

export function outboxRoutes(deps: RouteDeps): Router {
  const router = Router()
  router.get('/', deps.requireSession, requirePermission('outbox.read'), async (req, res) => {
    res.json(await outboxFor(deps.db, actorOf(req).organizationId))
  })
  return router
}
