import { Router } from 'express'
import { z } from 'zod'
import {
  customDeviceCsvImportSchema,
  customDeviceCsvPreviewSchema,
  customDeviceInputSchema,
  customDeviceUpdateSchema,
} from '../../../shared/api/devices.schemas'
import { actorOf, idParam } from '../../http/actor'
import { requirePermission } from '../../http/auth'
import type { RouteDeps } from '../../http/route-deps'
import { validate } from '../../http/validate'
import { changeDevice, createDevice, devicesOf, getDevice, importDeviceCsv, pointsFromCsv, removeDevice } from './devices.service'

// /api/devices: the organisation's own protective devices. Every non-client role reads them (they
// appear in designs' charts); owners and designers, who edit designs, maintain them.
const READ = requirePermission('project.readAll', 'see the device library')
const WRITE = requirePermission('design.write', 'edit the device library')
const params = z.object({ id: idParam })

export function devicesRoutes(deps: RouteDeps): Router {
  const { db } = deps
  const router = Router()
  router.use(deps.requireSession)

  router.get('/', READ, async (req, res) => {
    res.json(await devicesOf(db, actorOf(req)))
  })

  const createInput = validate({ body: customDeviceInputSchema })
  router.post('/', WRITE, createInput, async (req, res) => {
    res.status(201).json(await createDevice(db, actorOf(req), createInput.data(req).body))
  })

  // Preview (`preview: true`) only parses the points back for the form; otherwise the device is created.
  const previewInput = validate({ body: customDeviceCsvPreviewSchema })
  const importInput = validate({ body: customDeviceCsvImportSchema })
  router.post('/import-csv', WRITE, (req, res, next) => ((req.body as { preview?: unknown } | undefined)?.preview === true ? previewInput : importInput)(req, res, next), async (req, res) => {
    const body = req.body as { preview?: unknown }
    if (body.preview === true) {
      res.json({ points: pointsFromCsv(previewInput.data(req).body.csv).points })
      return
    }
    const { preview: _preview, ...input } = importInput.data(req).body
    res.status(201).json(await importDeviceCsv(db, actorOf(req), input))
  })

  const idInput = validate({ params })
  router.get('/:id', READ, idInput, async (req, res) => {
    res.json(await getDevice(db, actorOf(req), idInput.data(req).params.id))
  })

  const updateInput = validate({ params, body: customDeviceUpdateSchema })
  router.patch('/:id', WRITE, updateInput, async (req, res) => {
    const { params: p, body } = updateInput.data(req)
    res.json(await changeDevice(db, actorOf(req), p.id, body))
  })

  router.delete('/:id', WRITE, idInput, async (req, res) => {
    await removeDevice(db, actorOf(req), idInput.data(req).params.id)
    res.status(204).end()
  })

  return router
}
