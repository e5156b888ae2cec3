import { ZodError } from 'zod'
import {
  customDeviceInputSchema,
  type CustomDevice,
  type CustomDeviceData,
  type DevicePoint,
} from '../../../shared/api/devices.schemas'
import type { FieldError } from '../../../shared/errors'
import type { Db } from '../../db/client'
import type { Actor } from '../../http/actor'
import { fieldErrorsOf, invalidRequest, notFound } from '../../http/errors'
import { deleteDevice, findDevice, insertDevice, listDevices, updateDevice } from './devices.repository'
import { issueAtLine, parseDeviceCsv } from './parseDeviceCsv'

// The organisation's device library. Every device is checked whole (fields and band) before it is
// stored, so a saved device always draws a band.

export const devicesOf = (db: Db, actor: Actor) => listDevices(db, actor.organizationId)

export async function getDevice(db: Db, actor: Actor, id: string): Promise<CustomDevice> {
  const device = await findDevice(db, actor.organizationId, id)
  if (!device) throw notFound('Device')
  return device
}

export const createDevice = (db: Db, actor: Actor, data: CustomDeviceData) => insertDevice(db, actor.organizationId, actor.userId, data)

/** Applies a partial change, then checks the merged device as a whole (400 with field paths). */
export async function changeDevice(db: Db, actor: Actor, id: string, patch: Partial<CustomDeviceData>): Promise<CustomDevice> {
  const current = await getDevice(db, actor, id)
  const { id: _id, createdBy: _by, createdAt: _at, updatedAt: _up, ...fields } = current
  const data = customDeviceInputSchema.parse({ ...fields, ...patch })
  const updated = await updateDevice(db, actor.organizationId, id, data)
  if (!updated) throw notFound('Device')
  return updated
}

export async function removeDevice(db: Db, actor: Actor, id: string): Promise<void> {
  if (!(await deleteDevice(db, actor.organizationId, id))) throw notFound('Device')
}

const csvProblem = (errors: FieldError[]) =>
  invalidRequest(errors.length === 1 ? errors[0].message : `The CSV has ${errors.length} problems; nothing was saved`, errors)

/** Points of a CSV, or a 400 naming each bad line and column. */
export function pointsFromCsv(csv: string): { points: DevicePoint[]; lines: number[] } {
  const parsed = parseDeviceCsv(csv)
  if (!parsed.ok) throw csvProblem(parsed.errors)
  return parsed
}

/** A new device whose points come from a CSV; band issues are reported at their CSV lines. */
export async function importDeviceCsv(db: Db, actor: Actor, input: Omit<CustomDeviceData, 'points'> & { csv: string }): Promise<CustomDevice> {
  const { csv, ...fields } = input
  const { points, lines } = pointsFromCsv(csv)
  const result = customDeviceInputSchema.safeParse({ ...fields, points })
  if (!result.success) throw csvProblem(fieldErrorsOf(result.error as ZodError).map((issue) => issueAtLine(issue, lines)))
  return createDevice(db, actor, result.data)
}
