import { Router } from 'express'
import { z } from 'zod'
import { analyzeDesign, compileCircuit } from '../../../shared/analysis'
import type { AnalysisResult } from '../../../shared/analysis/types'
import { parseDesign } from '../../../shared/design/schema'
import { toSpiceNetlist } from '../../../shared/spice/toSpiceNetlist'
import { invalidRequest } from '../../http/errors'
import { validate } from '../../http/validate'

const body = z.object({
  design: z.unknown().refine((value) => value !== undefined, 'Send the design'),
  scenarioIds: z.array(z.string({ error: 'Scenario ids are strings' }), { error: 'scenarioIds is a list of scenario ids' }).max(50).optional(),
  /** Also run the time-current checks (motor starts, fault clearing, selectivity). */
  coordination: z.boolean({ error: 'coordination is true or false' }).optional(),
})
const query = z.object({ spice: z.string().min(1, 'Name the scenario to export').max(64).optional() })

export type AnalyzeResponse = AnalysisResult & { spiceNetlist?: string }

/**
 * POST /analyze: `{ design, scenarioIds? }` → the analysis (every scenario, conductors, devices,
 * findings); `?spice=<scenarioId>` adds that scenario's SPICE netlist. Invalid designs give 400 with
 * the field paths of parseDesign under `design.`. The lead mounts this at /api behind the session.
 */
export function createAnalyzeRouter(): Router {
  const router = Router()
  const input = validate({ body, query })
  router.post('/analyze', input, (req, res) => {
    const { body: b, query: q } = input.data(req)
    const parsed = parseDesign(b.design)
    if (!parsed.ok) {
      const fields = parsed.errors.map((e) => ({ path: e.path ? `design.${e.path}` : 'design', message: e.message }))
      throw invalidRequest(fields.length === 1 ? fields[0].message : 'The design is not valid', fields)
    }
    const design = parsed.design
    let spiceNetlist: string | undefined
    if (q.spice !== undefined) {
      const scenario = design.scenarios.find((s) => s.id === q.spice)
      if (!scenario) throw invalidRequest(`No scenario has the id "${q.spice}"`, [{ path: 'spice', message: `No scenario has the id "${q.spice}"` }])
      spiceNetlist = toSpiceNetlist(compileCircuit(design, scenario).circuit, { title: `${design.name}: ${scenario.name}` })
    }
    const result: AnalyzeResponse = analyzeDesign(design, { scenarioIds: b.scenarioIds, coordination: b.coordination })
    if (spiceNetlist !== undefined) result.spiceNetlist = spiceNetlist
    res.json(result)
  })
  return router
}
