import { Router } from 'express'
import { z } from 'zod'
import { shareLinkEmailInputSchema, shareLinkInputSchema } from '../../../shared/api/shares.schemas'
import { actorOf, idParam } from '../../http/actor'
import { authOf, requirePermission } from '../../http/auth'
import type { RouteDeps } from '../../http/route-deps'
import { validate } from '../../http/validate'
import { shareLinkEmailRateLimit } from './shareLinkEmail.rateLimit'
import { emailShareLink } from './shareLinkEmail.service'
import { createShareLink, projectApprovals, projectShareLinks, revokeLink } from './shares.service'

/** Mounted at /api/projects/:id: share links (owner, designer) and approvals (readers of the project). */
export function shareLinksRoutes(deps: RouteDeps): Router {
  const { db } = deps
  const router = Router({ mergeParams: true })
  const params = z.object({ id: idParam })

  const listInput = validate({ params })
  router.get('/share-links', deps.requireSession, requirePermission('project.share', 'manage share links'), listInput, async (req, res) => {
    res.json(await projectShareLinks(db, actorOf(req), listInput.data(req).params.id))
  })

  const createInput = validate({ params, body: shareLinkInputSchema })
  router.post('/share-links', deps.requireSession, requirePermission('project.share', 'make share links'), createInput, async (req, res) => {
    const { params: p, body } = createInput.data(req)
    res.status(201).json(await createShareLink(deps, { ...actorOf(req), name: authOf(req).user.name }, p.id, body))
  })

  const revokeInput = validate({ params: params.extend({ linkId: idParam }) })
  router.delete('/share-links/:linkId', deps.requireSession, requirePermission('project.share', 'revoke share links'), revokeInput, async (req, res) => {
    const { params: p } = revokeInput.data(req)
    await revokeLink(db, actorOf(req), p.id, p.linkId)
    res.status(204).end()
  })

  const emailInput = validate({ params: params.extend({ linkId: idParam }), body: shareLinkEmailInputSchema })
  router.post('/share-links/:linkId/email', deps.requireSession, requirePermission('project.share', 'send share links'), emailInput,
    shareLinkEmailRateLimit(), async (req, res) => {
      const { params: p, body } = emailInput.data(req)
      res.json(await emailShareLink(deps, { ...actorOf(req), name: authOf(req).user.name }, p.id, p.linkId, body))
    })

  router.get('/approvals', deps.requireSession, requirePermission('project.read'), listInput, async (req, res) => {
    res.json(await projectApprovals(db, actorOf(req), listInput.data(req).params.id))
  })
  return router
}
