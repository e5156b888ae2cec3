import express, { Router } from 'express'
import { z } from 'zod'
import { LOAD_CSV_MAX_BYTES } from '../../../shared/api/uploads.schemas'
import { makePart } from '../../../shared/design/builder'
import { partBox } from '../../../shared/export/partGeometry'
import { newUniqueId } from '../../../shared/design/ids'
import type { Design, Part } from '../../../shared/design/schema'
import { actorOf, idParam } from '../../http/actor'
import { requirePermission } from '../../http/auth'
import { invalidRequest, notFound } from '../../http/errors'
import type { RouteDeps } from '../../http/route-deps'
import { readStoredDesign } from '../designs/design-state'
import { saveDesign } from '../designs/designs.service'
import { getProject } from '../projects/projects.service'
import { parseLoadCsv, type LoadRow } from './parseLoadCsv'

const COLUMN_GAP = 200
const ROW_PITCH = 112

/** New load parts in a column to the right of the drawing; they run in every scenario (as the editor's new loads do). */
export function addLoads(design: Design, rows: LoadRow[]): Design {
  const right = design.parts.reduce((max, p) => Math.max(max, p.position.x + partBox(p).width), 0)
  const top = design.parts.length ? Math.min(...design.parts.map((p) => p.position.y)) : 0
  const x = design.parts.length ? Math.round((right + COLUMN_GAP) / 16) * 16 : 0
  const taken = new Set(design.parts.map((p) => p.id))
  const parts: Part[] = rows.map((row, i) => {
    const id = newUniqueId('load', taken)
    taken.add(id)
    const params = row.watts !== undefined
      ? { model: 'power' as const, powerW: row.watts, currentA: undefined }
      : { model: 'current' as const, currentA: row.amps, powerW: undefined }
    return makePart(design.settings, 'load', id, row.name, { x, y: top + i * ROW_PITCH }, { ...params, critical: row.critical, hoursPerDay: row.hoursPerDay, duty: 'continuous' })
  })
  const clean = (p: Part): Part => ({ ...p, params: Object.fromEntries(Object.entries(p.params).filter(([, v]) => v !== undefined)) } as Part)
  return {
    ...design,
    parts: [...design.parts, ...parts.map(clean)],
    scenarios: design.scenarios.map((s) => ({ ...s, loads: { ...s.loads, ...Object.fromEntries(parts.map((p) => [p.id, { on: true, level: 1 }])) } })),
  }
}

/** POST /api/projects/:id/design/import-loads: a CSV body (text/csv) or `{ csv }`; all rows good or nothing changes. */
export function loadImportRoutes(deps: RouteDeps): Router {
  const router = Router({ mergeParams: true })
  const textBody = express.text({ type: ['text/csv', 'text/plain'], limit: LOAD_CSV_MAX_BYTES })
  router.post('/', deps.requireSession, requirePermission('design.write'), textBody, async (req, res) => {
    const actor = actorOf(req)
    const projectId = z.object({ id: idParam }).parse(req.params).id
    await getProject(deps.db, actor, projectId)
    const csv = typeof req.body === 'string' ? req.body : (req.body as { csv?: unknown } | undefined)?.csv
    if (typeof csv !== 'string' || csv.trim() === '') throw invalidRequest('Send the load list as CSV', [{ path: 'csv', message: 'Send the load list as CSV' }])
    const parsed = parseLoadCsv(csv)
    if (!parsed.ok) {
      throw invalidRequest(parsed.errors.length === 1 ? parsed.errors[0].message : `The load list has ${parsed.errors.length} problems; nothing was imported`, parsed.errors)
    }
    const current = await readStoredDesign(deps.db, projectId)
    if (!current) throw notFound('Design')
    const design = addLoads(current.design, parsed.rows)
    const saved = await saveDesign(deps, actor, { projectId, baseRevision: current.revision, document: design })
    res.json({ ...saved, added: design.parts.slice(-parsed.rows.length).map((p) => ({ id: p.id, label: p.label })) })
  })
  return router
}
