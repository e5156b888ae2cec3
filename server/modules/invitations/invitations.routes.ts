import { Router } from 'express'
import { z } from 'zod'
import { acceptInvitationSchema } from '../../../shared/api/auth.schemas'
import { invitationInputSchema } from '../../../shared/api/members.schemas'
import { actorOf, idParam } from '../../http/actor'
import { authOf, requirePermission } from '../../http/auth'
import type { RouteDeps } from '../../http/route-deps'
import { validate } from '../../http/validate'
import { loadSessionContext } from '../auth/auth.service'
import { issueSessionCookie, toSession } from '../auth/session-cookie'
import { acceptInvitation, invite, lookupInvitation, pendingInvitations, revokeInvitation } from './invitations.service'

export function invitationsRoutes(deps: RouteDeps): Router {
  const { db } = deps
  const router = Router()
  const owner = [deps.requireSession, requirePermission('member.manage')]

  // Public: the invited person has no account yet.
  const lookupInput = validate({ params: z.object({ token: z.string().min(20).max(200) }) })
  router.get('/lookup/:token', lookupInput, async (req, res) => {
    res.json(await lookupInvitation(db, lookupInput.data(req).params.token))
  })

  const acceptInput = validate({ body: acceptInvitationSchema })
  router.post('/accept', acceptInput, async (req, res) => {
    const ids = await acceptInvitation(deps, acceptInput.data(req).body)
    const expiresAt = await issueSessionCookie(res, deps, ids)
    res.status(201).json(toSession(await loadSessionContext(deps, ids), expiresAt))
  })

  router.get('/', ...owner, async (req, res) => {
    res.json(await pendingInvitations(db, actorOf(req)))
  })

  const inviteInput = validate({ body: invitationInputSchema })
  router.post('/', ...owner, inviteInput, async (req, res) => {
    const auth = authOf(req)
    const actor = { ...actorOf(req), name: auth.user.name, organizationName: auth.organization.name }
    res.status(201).json(await invite(deps, actor, inviteInput.data(req).body))
  })

  const revokeInput = validate({ params: z.object({ id: idParam }) })
  router.delete('/:id', ...owner, revokeInput, async (req, res) => {
    await revokeInvitation(db, actorOf(req), revokeInput.data(req).params.id)
    res.status(204).end()
  })

  return router
}
