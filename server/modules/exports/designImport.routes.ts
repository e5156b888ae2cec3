import { Router } from 'express'
import { z } from 'zod'
import { parseDesign } from '../../../shared/design/schema'
import { actorOf, idParam } from '../../http/actor'
import { requirePermission } from '../../http/auth'
import { invalidRequest, notFound } from '../../http/errors'
import type { RouteDeps } from '../../http/route-deps'
import { readStoredDesign } from '../designs/design-state'
import { saveDesign } from '../designs/designs.service'
import { getProject } from '../projects/projects.service'

/**
 * POST /api/projects/:id/design/import: the body is a design file (JSON). A bad file gives 400 with every
 * field path and changes nothing; a good one replaces the design through the designs module's save.
 */
export function designImportRoutes(deps: RouteDeps): Router {
  const router = Router({ mergeParams: true })
  router.post('/', deps.requireSession, requirePermission('design.write'), async (req, res) => {
    const actor = actorOf(req)
    const projectId = z.object({ id: idParam }).parse(req.params).id
    await getProject(deps.db, actor, projectId)
    const parsed = parseDesign(req.body)
    if (!parsed.ok) {
      throw invalidRequest(
        parsed.errors.length === 1 ? `The design file is not valid: ${parsed.errors[0].message}` : `The design file has ${parsed.errors.length} errors`,
        parsed.errors.map((e) => ({ path: e.path, message: e.message })),
      )
    }
    const current = await readStoredDesign(deps.db, projectId)
    if (!current) throw notFound('Design')
    const saved = await saveDesign(deps, actor, { projectId, baseRevision: current.revision, document: parsed.design })
    res.json({ ...saved, migratedFrom: parsed.migratedFrom ?? null })
  })
  return router
}
