import { z } from 'zod'
import { datasheetBand, type DatasheetInput, type DatasheetResult } from '../protection/timeCurrent'
import type { ChartPoint, DeviceKind } from '../protection/timeCurrent/types'

// An organisation's own protective devices: the form fields, their limits and the band check, shared
// by the device-library page and the API. The points go through datasheetBand (the same checks as the
// catalogue bands); its issues come back with paths into `points` so a form can mark the very cell.

export const CUSTOM_DEVICE_KINDS = ['fuse', 'breaker'] as const
export const DEVICE_POINTS_MIN = 2
export const DEVICE_POINTS_MAX = 60
export const DEVICE_NAME_MAX = 120
export const DEVICE_SOURCE_MAX = 300
/** Largest time-current CSV accepted, bytes, and the columns it carries. */
export const DEVICE_CSV_MAX_BYTES = 64 * 1024
export const DEVICE_CSV_COLUMNS = ['currentA', 'minMeltS', 'maxClearS'] as const

const positive = (what: string, max: number) =>
  z.number({ error: `${what} must be a number` }).finite(`${what} must be a finite number`).positive(`${what} must be above zero`).max(max, `${what} must be at most ${max}`)

/** One datasheet point: a current (A, or a multiple of the rating) and one or both times. */
export const devicePointSchema = z
  .object({
    currentA: positive('Current', 1_000_000).optional(),
    multiple: positive('Multiple of the rating', 10_000).optional(),
    minMeltS: positive('Minimum melting time', 100_000).optional(),
    maxClearS: positive('Maximum clearing time', 100_000).optional(),
  })
  .superRefine((p, ctx) => {
    if ((p.currentA === undefined) === (p.multiple === undefined))
      ctx.addIssue({ code: 'custom', path: ['currentA'], message: 'Give the current in A or as a multiple of the rating (one of the two)' })
    if (p.minMeltS === undefined && p.maxClearS === undefined)
      ctx.addIssue({ code: 'custom', path: ['minMeltS'], message: 'Give a minimum melting time, a maximum clearing time, or both' })
  })
export type DevicePoint = z.infer<typeof devicePointSchema>

const baseFields = {
  name: z.string().trim().min(1, 'Enter a name').max(DEVICE_NAME_MAX, `Keep the name under ${DEVICE_NAME_MAX} characters`),
  kind: z.enum(CUSTOM_DEVICE_KINDS, { error: 'Choose fuse or breaker' }),
  ratingA: positive('Rating', 10_000),
  dcVoltageRatingV: positive('DC voltage rating', 2_000).nullable(),
  interruptingRatingA: positive('Interrupting rating', 1_000_000).nullable(),
  ignitionProtected: z.boolean(),
  timeDelay: z.boolean(),
  source: z.string().trim().min(1, 'Name where the points come from (datasheet, figure, revision)').max(DEVICE_SOURCE_MAX),
}
/** On create, the optional facts default to "not stated" (null) and false. */
const deviceFields = {
  ...baseFields,
  dcVoltageRatingV: baseFields.dcVoltageRatingV.default(null),
  interruptingRatingA: baseFields.interruptingRatingA.default(null),
  ignitionProtected: baseFields.ignitionProtected.default(false),
  timeDelay: baseFields.timeDelay.default(false),
}
const pointsField = z
  .array(devicePointSchema)
  .min(DEVICE_POINTS_MIN, `Give at least ${DEVICE_POINTS_MIN} points`)
  .max(DEVICE_POINTS_MAX, `At most ${DEVICE_POINTS_MAX} points`)

/** Fields of a device without its band check (PATCH bodies; the merged device is checked whole). */
export const customDeviceFieldsSchema = z.object({ ...deviceFields, points: pointsField })

/** A complete device: fields, then the band built from its points (issues at `points.N.field`). */
export const customDeviceInputSchema = customDeviceFieldsSchema.superRefine((device, ctx) => {
  // Zod runs this refinement even after failed checks of the fields: only a well-formed device has a band.
  if (!wellFormed(device)) return
  const result = customDeviceBand(device)
  if (result.ok) return
  const seen = new Set<string>()
  for (const issue of result.issues) {
    // A point shared by both curves can raise the same issue twice.
    if (seen.has(issue.path + issue.message)) continue
    seen.add(issue.path + issue.message)
    ctx.addIssue({ code: 'custom', path: issue.path.split('.').map((s) => (/^\d+$/.test(s) ? Number(s) : s)), message: issue.message })
  }
})
function wellFormed(d: z.output<typeof customDeviceFieldsSchema>): boolean {
  const pointOk = (p: DevicePoint) => (p.currentA === undefined) !== (p.multiple === undefined) && (p.minMeltS !== undefined || p.maxClearS !== undefined)
  return customDeviceFieldsSchema.shape.ratingA.safeParse(d.ratingA).success && d.source.trim() !== '' &&
    d.points.length >= DEVICE_POINTS_MIN && d.points.length <= DEVICE_POINTS_MAX && d.points.every(pointOk)
}
export type CustomDeviceInput = z.input<typeof customDeviceInputSchema>
export type CustomDeviceData = z.output<typeof customDeviceInputSchema>

export const customDeviceUpdateSchema = z
  .object({ ...baseFields, points: pointsField })
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Change at least one field')

/** CSV import: the device's other fields, and its points as CSV text; `preview` parses without saving. */
export const customDeviceCsvImportSchema = z.object({
  ...deviceFields,
  csv: z.string().min(1, 'Choose a CSV file of current/time points').max(DEVICE_CSV_MAX_BYTES, 'The CSV file is too large (64 KB at most)'),
  preview: z.boolean().default(false),
})
/** CSV preview: only the CSV is needed (the rating turns multiples into amperes when given). */
export const customDeviceCsvPreviewSchema = z.object({
  csv: customDeviceCsvImportSchema.shape.csv,
  preview: z.literal(true),
})

export interface CustomDevice extends CustomDeviceData {
  id: string
  createdBy: string | null
  createdAt: string
  updatedAt: string
}

type BandFields = Pick<CustomDeviceData, 'name' | 'kind' | 'ratingA' | 'timeDelay' | 'source' | 'points'>

/** The datasheet band of a device (never throws); issue paths point into `points`, `ratingA` or `source`. */
export function customDeviceBand(device: BandFields & { id?: string }): DatasheetResult {
  const minMelt: ChartPoint[] = []
  const maxClear: ChartPoint[] = []
  const indexOf = { minMelt: [] as number[], maxClear: [] as number[] }
  device.points.forEach((p, i) => {
    const currentA = p.currentA ?? (p.multiple ?? NaN) * device.ratingA
    if (p.minMeltS !== undefined) (minMelt.push({ currentA, timeS: p.minMeltS }), indexOf.minMelt.push(i))
    if (p.maxClearS !== undefined) (maxClear.push({ currentA, timeS: p.maxClearS }), indexOf.maxClear.push(i))
  })
  // A user's breaker has no opening floor or magnetic step of its own: its points are the whole model.
  const kind: DeviceKind = device.kind === 'fuse' ? 'fuse' : 'thermal-breaker'
  const input: DatasheetInput = { id: device.id ?? device.name, ratingA: device.ratingA, kind, timeDelay: device.timeDelay, minMelt, maxClear, source: device.source }
  const result = datasheetBand(input)
  if (result.ok) return result
  const timeField = { minMelt: 'minMeltS', maxClear: 'maxClearS' } as const
  return {
    ok: false,
    issues: result.issues.map((issue) => {
      const [curve, index, key] = issue.path.split('.')
      if (curve !== 'minMelt' && curve !== 'maxClear') return issue
      const what = curve === 'minMelt' ? 'minimum melting' : 'maximum clearing'
      if (index === undefined) return { path: 'points', message: issue.message.replace('current/time points', `points with a ${what} time`) }
      const i = indexOf[curve][Number(index)]
      const field = key === 'timeS' ? timeField[curve] : device.points[i]?.currentA !== undefined ? 'currentA' : 'multiple'
      return { path: `points.${i}.${field}`, message: key === 'timeS' ? `${issue.message} (${what})` : issue.message }
    }),
  }
}
