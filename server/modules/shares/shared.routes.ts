import { Router } from 'express'
import { z } from 'zod'
import { approvalInputSchema } from '../../../shared/api/shares.schemas'
import { forbidden } from '../../http/errors'
import type { RouteDeps } from '../../http/route-deps'
import { validate } from '../../http/validate'
import { exportHandlers } from '../exports/exports.routes'
import { approveShared, resolveShareToken, sharedExportContext, sharedView } from './shares.service'

export const SHARE_READ_ONLY = 'A share link is read-only: it cannot change the design'

/**
 * Mounted at /api/shared (no session): the token in the path is checked on every request. A link can
 * read the project, its findings and exports, and record an approval — nothing else.
 */
export function sharedRoutes(deps: RouteDeps): Router {
  const { db } = deps
  const router = Router()
  const params = z.object({ token: z.string().min(1).max(100) })
  const tokenOf = (req: { params: unknown }) => params.parse(req.params).token

  router.get('/:token', async (req, res) => {
    res.json(await sharedView(db, await resolveShareToken(db, tokenOf(req))))
  })
  router.get('/:token/exports/diagram.svg', async (req, res) => {
    const link = await resolveShareToken(db, tokenOf(req))
    exportHandlers.diagramSvg(await sharedExportContext(db, link), res, req.query.download === '1')
  })
  router.get('/:token/exports/diagram.pdf', async (req, res) => {
    exportHandlers.diagramPdf(await sharedExportContext(db, await resolveShareToken(db, tokenOf(req))), res)
  })
  router.get('/:token/exports/report.pdf', async (req, res) => {
    await exportHandlers.reportPdf(await sharedExportContext(db, await resolveShareToken(db, tokenOf(req))), res)
  })

  const approvalInput = validate({ body: approvalInputSchema })
  router.post('/:token/approvals', async (req, res, next) => {
    const link = await resolveShareToken(db, tokenOf(req))
    approvalInput(req, res, (error?: unknown) => {
      if (error) return next(error)
      approveShared(deps, link, approvalInput.data(req).body).then((approval) => res.status(201).json(approval), next)
    })
  })

  // Every other write through a token (the design, revisions, anything) is refused outright.
  router.all('/:token/{*rest}', async (req, _res, next) => {
    if (req.method === 'GET' || req.method === 'HEAD') return next()
    await resolveShareToken(db, tokenOf(req))
    throw forbidden(SHARE_READ_ONLY)
  })
  return router
}
