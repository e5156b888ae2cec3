// The owner's view of what the local fake SMTP server captured. Only mail addressed to people of the
// owner's organisation (members and invitees) is shown; with a real SMTP relay the outbox stays empty.
import { Router } from 'express'
import type { OutboxMessage } from '../../../shared/api/members.schemas'
import { actorOf } from '../../http/actor'
import { requirePermission } from '../../http/auth'
import type { RouteDeps } from '../../http/route-deps'
import { listOutboxFor } from './outbox.repository'

export function outboxRoutes(deps: RouteDeps): Router {
  const router = Router()
  router.get('/', deps.requireSession, requirePermission('outbox.read'), async (req, res) => {
    const rows = await listOutboxFor(deps.db, actorOf(req).organizationId)
    const messages: OutboxMessage[] = rows.map((row) => ({
      id: row.id,
      from: row.from,
      to: row.to,
      subject: row.subject,
      text: row.text,
      receivedAt: row.receivedAt.toISOString(),
    }))
    res.json(messages)
  })
  return router
}
