import { Router } from 'express'
import { z } from 'zod'
import { revisionCompareQuerySchema, revisionInputSchema } from '../../../shared/api/revisions.schemas'
import { actorOf, idParam } from '../../http/actor'
import { requirePermission } from '../../http/auth'
import type { RouteDeps } from '../../http/route-deps'
import { validate } from '../../http/validate'
import { compareRevisions, createRevision, getRevision, getRevisions, restoreRevision } from './revisions.service'

const projectParams = z.object({ id: idParam })
const revisionParams = z.object({ id: idParam, revisionId: idParam })
const RECORD_PHRASE = 'record or restore revisions'

/** Mounted at /api/projects/:id/revisions. */
export function revisionsRoutes(deps: RouteDeps): Router {
  const router = Router({ mergeParams: true })
  router.use(deps.requireSession)

  const listInput = validate({ params: projectParams })
  router.get('/', requirePermission('project.read'), listInput, async (req, res) => {
    res.json(await getRevisions(deps, actorOf(req), listInput.data(req).params.id))
  })

  const createInput = validate({ params: projectParams, body: revisionInputSchema })
  router.post('/', requirePermission('design.write', RECORD_PHRASE), createInput, async (req, res) => {
    const { params, body } = createInput.data(req)
    res.status(201).json(await createRevision(deps, actorOf(req), params.id, body.name))
  })

  const compareInput = validate({ params: projectParams, query: revisionCompareQuerySchema })
  router.get('/compare', requirePermission('project.read'), compareInput, async (req, res) => {
    const { params, query } = compareInput.data(req)
    res.json(await compareRevisions(deps, actorOf(req), params.id, query.from, query.to))
  })

  const oneInput = validate({ params: revisionParams })
  router.get('/:revisionId', requirePermission('project.read'), oneInput, async (req, res) => {
    const { params } = oneInput.data(req)
    res.json(await getRevision(deps, actorOf(req), params.id, params.revisionId))
  })

  router.post('/:revisionId/restore', requirePermission('design.write', RECORD_PHRASE), oneInput, async (req, res) => {
    const { params } = oneInput.data(req)
    res.status(201).json(await restoreRevision(deps, actorOf(req), params.id, params.revisionId))
  })

  return router
}
