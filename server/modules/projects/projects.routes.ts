import { Router } from 'express'
import { z } from 'zod'
import {
  projectInputSchema,
  projectListQuerySchema,
  projectShareSchema,
  projectUpdateSchema,
} from '../../../shared/api/projects.schemas'
import { actorOf, idParam } from '../../http/actor'
import { requirePermission } from '../../http/auth'
import type { RouteDeps } from '../../http/route-deps'
import { validate } from '../../http/validate'
import {
  createDemoProject,
  createProject,
  duplicateProject,
  editProject,
  getProject,
  listProjects,
  projectShares,
  removeProject,
  shareProject,
  unshareProject,
} from './projects.service'

export const projectParams = z.object({ id: idParam })

/**
 * projectUpdateSchema is projectInputSchema.partial(), and zod 4 still applies the input schema's
 * defaults to absent keys (clientName, notes → ''): keep only the fields the client actually sent,
 * so a PATCH of `{ archived: true }` does not wipe the notes.
 */
function onlySentFields<T extends object>(parsed: T, raw: unknown): Partial<T> {
  const sent = raw && typeof raw === 'object' ? raw : {}
  return Object.fromEntries(Object.entries(parsed).filter(([key]) => Object.hasOwn(sent, key))) as Partial<T>
}

export function projectsRoutes(deps: RouteDeps): Router {
  const { db } = deps
  const router = Router()
  router.use(deps.requireSession)

  const listInput = validate({ query: projectListQuerySchema })
  router.get('/', requirePermission('project.read'), listInput, async (req, res) => {
    res.json(await listProjects(db, actorOf(req), listInput.data(req).query))
  })

  const createInput = validate({ body: projectInputSchema })
  router.post('/', requirePermission('project.write'), createInput, async (req, res) => {
    res.status(201).json(await createProject(db, actorOf(req), createInput.data(req).body))
  })

  router.post('/demo', requirePermission('project.write'), async (req, res) => {
    res.status(201).json(await createDemoProject(db, actorOf(req)))
  })

  const byId = validate({ params: projectParams })
  router.get('/:id', requirePermission('project.read'), byId, async (req, res) => {
    res.json(await getProject(db, actorOf(req), byId.data(req).params.id))
  })

  const patchInput = validate({ params: projectParams, body: projectUpdateSchema })
  router.patch('/:id', requirePermission('project.write'), patchInput, async (req, res) => {
    const { params, body } = patchInput.data(req)
    res.json(await editProject(db, actorOf(req), params.id, onlySentFields(body, req.body)))
  })

  router.post('/:id/duplicate', requirePermission('project.write'), byId, async (req, res) => {
    res.status(201).json(await duplicateProject(db, actorOf(req), byId.data(req).params.id))
  })

  router.delete('/:id', requirePermission('project.delete'), byId, async (req, res) => {
    await removeProject(db, actorOf(req), byId.data(req).params.id)
    res.status(204).end()
  })

  router.get('/:id/shares', requirePermission('project.readAll', 'see who a project is shared with'), byId, async (req, res) => {
    res.json(await projectShares(db, actorOf(req), byId.data(req).params.id))
  })

  const shareInput = validate({ params: projectParams, body: projectShareSchema })
  router.post('/:id/shares', requirePermission('project.share'), shareInput, async (req, res) => {
    const { params, body } = shareInput.data(req)
    res.status(201).json(await shareProject(db, actorOf(req), params.id, body.userId))
  })

  const unshareInput = validate({ params: projectParams.extend({ userId: idParam }) })
  router.delete('/:id/shares/:userId', requirePermission('project.share'), unshareInput, async (req, res) => {
    const { params } = unshareInput.data(req)
    await unshareProject(db, actorOf(req), params.id, params.userId)
    deps.hub.access.emit({ kind: 'projectShareRemoved', projectId: params.id, userId: params.userId })
    res.status(204).end()
  })

  return router
}
