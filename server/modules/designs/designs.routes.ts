import { Router } from 'express'
import { z } from 'zod'
import { actorOf, idParam } from '../../http/actor'
import { requirePermission } from '../../http/auth'
import type { RouteDeps } from '../../http/route-deps'
import { validate } from '../../http/validate'
import { getDesign, saveDesign } from './designs.service'

const params = z.object({ id: idParam })
const saveBody = z.object({
  design: z.unknown().refine((value) => value !== undefined, 'Send the design'),
  baseRevision: z.number({ error: 'Send the revision your change is based on' }).int().min(0),
})

/** Mounted at /api/projects/:id/design. */
export function designsRoutes(deps: RouteDeps): Router {
  const { db } = deps
  const router = Router({ mergeParams: true })
  router.use(deps.requireSession)

  const readInput = validate({ params })
  router.get('/', requirePermission('project.read'), readInput, async (req, res) => {
    res.json(await getDesign(db, actorOf(req), readInput.data(req).params.id))
  })

  const saveInput = validate({ params, body: saveBody })
  router.put('/', requirePermission('design.write'), saveInput, async (req, res) => {
    const { params: p, body } = saveInput.data(req)
    res.json(await saveDesign(deps, actorOf(req), { projectId: p.id, baseRevision: body.baseRevision, document: body.design }))
  })

  return router
}
