import { Router, type Response } from 'express'
import { z } from 'zod'
import { compileCircuit } from '../../../shared/analysis'
import { buildBillOfMaterials, buildDiagramModel, buildReportModel, buildSpares, diagramModelToSvg, sparesEditSchema, sparesFromEdit } from '../../../shared/export'
import { toSpiceNetlist } from '../../../shared/spice/toSpiceNetlist'
import { actorOf, idParam } from '../../http/actor'
import { requirePermission } from '../../http/auth'
import { invalidRequest } from '../../http/errors'
import type { RouteDeps } from '../../http/route-deps'
import { validate } from '../../http/validate'
import { bomCsv } from './bomCsv'
import { exportContextFor, fileSlug, type ExportContext } from './exportContext'
import { diagramPdf } from './pdf/diagramPdf'
import { reportPdf } from './pdf/reportPdf'

// The deliverables of one project for anyone who may read it. The same handlers serve share links
// (shares module) with a context loaded from the token instead of the session.

const netlistQuery = z.object({ scenario: z.string().max(64).optional() })
const downloadQuery = z.object({ download: z.enum(['0', '1']).optional() })

function send(res: Response, body: string | Buffer, type: string, filename: string, download: boolean): void {
  res.type(type)
  res.set('Content-Disposition', `${download ? 'attachment' : 'inline'}; filename="${filename}"`)
  res.send(body)
}

export interface ExportHandlers {
  diagramSvg(ctx: ExportContext, res: Response, download: boolean): void
  diagramPdf(ctx: ExportContext, res: Response): Promise<void>
  reportPdf(ctx: ExportContext, res: Response): Promise<void>
}

const diagramOf = (ctx: ExportContext) => buildDiagramModel(ctx.design, ctx.analysis, { titleBlock: ctx.info })

export const exportHandlers: ExportHandlers = {
  diagramSvg(ctx, res, download) {
    const svg = diagramModelToSvg(diagramOf(ctx), `${ctx.info.project} — DC wiring diagram`)
    send(res, svg, 'image/svg+xml; charset=utf-8', `${fileSlug(ctx.project.name)}-diagram.svg`, download)
  },
  async diagramPdf(ctx, res) {
    send(res, await diagramPdf(diagramOf(ctx), `${ctx.info.project} — DC wiring diagram`), 'application/pdf', `${fileSlug(ctx.project.name)}-diagram.pdf`, true)
  },
  async reportPdf(ctx, res) {
    const report = buildReportModel(ctx.design, ctx.analysis, ctx.info)
    send(res, await reportPdf(report, diagramOf(ctx)), 'application/pdf', `${fileSlug(ctx.project.name)}-report.pdf`, true)
  },
}

/** Mounted at /api/projects/:id/exports. */
export function exportsRoutes(deps: RouteDeps): Router {
  const { db } = deps
  const router = Router({ mergeParams: true })
  router.use(deps.requireSession, requirePermission('project.read'))
  const params = z.object({ id: idParam })
  const load = async (req: Parameters<Parameters<typeof router.get>[1]>[0]) => exportContextFor(db, actorOf(req), params.parse(req.params).id)

  const svgInput = validate({ params, query: downloadQuery })
  router.get('/diagram.svg', svgInput, async (req, res) => {
    exportHandlers.diagramSvg(await load(req), res, svgInput.data(req).query.download === '1')
  })
  router.get('/diagram.pdf', async (req, res) => exportHandlers.diagramPdf(await load(req), res))
  router.get('/report.pdf', async (req, res) => exportHandlers.reportPdf(await load(req), res))

  router.get('/bom.json', async (req, res) => {
    const ctx = await load(req)
    const bom = buildBillOfMaterials(ctx.design)
    res.json({ bom, spares: buildSpares(bom) })
  })
  router.get('/bom.csv', async (req, res) => {
    const ctx = await load(req)
    const bom = buildBillOfMaterials(ctx.design)
    send(res, bomCsv(bom, buildSpares(bom)), 'text/csv; charset=utf-8', `${fileSlug(ctx.project.name)}-bom.csv`, true)
  })
  // The same CSV with the spares list as edited on screen (and optionally another waste allowance).
  const editedBom = validate({ params, body: sparesEditSchema })
  router.post('/bom.csv', editedBom, async (req, res) => {
    const ctx = await load(req)
    const { body } = editedBom.data(req)
    const bom = buildBillOfMaterials(ctx.design, { wasteAllowancePct: body.wasteAllowancePct })
    send(res, bomCsv(bom, sparesFromEdit(body.spares, bom)), 'text/csv; charset=utf-8', `${fileSlug(ctx.project.name)}-bom.csv`, true)
  })

  router.get('/design.json', async (req, res) => {
    const ctx = await load(req)
    send(res, JSON.stringify(ctx.design, null, 2), 'application/json; charset=utf-8', `${fileSlug(ctx.project.name)}.ampwright.json`, true)
  })

  const netlistInput = validate({ params, query: netlistQuery })
  router.get('/netlist.cir', netlistInput, async (req, res) => {
    const ctx = await load(req)
    const wanted = netlistInput.data(req).query.scenario
    const scenario = wanted === undefined ? ctx.design.scenarios[0] : ctx.design.scenarios.find((s) => s.id === wanted)
    if (!scenario) {
      const message = `No scenario has the id "${wanted}" (scenarios: ${ctx.design.scenarios.map((s) => s.id).join(', ')})`
      throw invalidRequest(message, [{ path: 'scenario', message }])
    }
    const deck = toSpiceNetlist(compileCircuit(ctx.design, scenario).circuit, { title: `${ctx.design.name}: ${scenario.name}` })
    send(res, deck, 'text/plain; charset=utf-8', `${fileSlug(ctx.project.name)}-${fileSlug(scenario.id)}.cir`, true)
  })
  return router
}
