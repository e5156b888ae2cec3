import { z } from 'zod'
import { embeddedDeviceBand } from '../protection/timeCurrent/libraryDevice'
import { choice, flag, labelText, quantity } from './fields'

// A device from an organisation's library, embedded in a fuse or breaker so the design file carries
// everything its analysis needs. Its points go through the same band checks as the device library
// (shared/protection/timeCurrent/datasheetBand.ts); issues come back at the very point.

/** As many points per curve as the device library accepts. */
export const CUSTOM_DEVICE_POINTS_MAX = 60

const pointSchema = z.object({
  currentA: quantity('current', 'A', { min: 0, minExclusive: true, max: 1_000_000 }),
  timeS: quantity('time', 's', { min: 0, minExclusive: true, max: 1_000_000 }),
})

const curve = (what: string) =>
  z
    .array(pointSchema, { error: `Give the ${what} points as a list of { currentA, timeS }` })
    .min(2, `Give at least two ${what} points`)
    .max(CUSTOM_DEVICE_POINTS_MAX, `At most ${CUSTOM_DEVICE_POINTS_MAX} ${what} points`)

const CURVE_FIELD = { minMelt: 'minMeltPoints', maxClear: 'maxClearPoints' } as const

export const customDeviceSchema = z
  .object({
    libraryId: z.string().trim().min(1, 'A library id is not empty').max(64, 'A library id is at most 64 characters').optional(),
    name: labelText('device name', 120).min(1, 'Enter the device name'),
    kind: choice('device kind', ['fuse', 'breaker'] as const),
    ratingA: quantity('device rating', 'A', { min: 0.5, max: 1000 }),
    timeDelay: flag('Time-delay', 'the device is time-delay').default(false),
    source: z.string({ error: 'Name where the points come from' }).trim().min(1, 'Name where the points come from').max(300, 'Keep the source under 300 characters'),
    minMeltPoints: curve('minimum melting'),
    maxClearPoints: curve('maximum clearing'),
  })
  .superRefine((device, ctx) => {
    const result = embeddedDeviceBand(device)
    if (result.ok) return
    for (const issue of result.issues) {
      // datasheetBand paths: "minMelt.3.timeS", "maxClear", "ratingA", "source".
      const [head, ...rest] = issue.path.split('.')
      const field = CURVE_FIELD[head as keyof typeof CURVE_FIELD] ?? head
      ctx.addIssue({ code: 'custom', path: [field, ...rest.map((s) => (/^\d+$/.test(s) ? Number(s) : s))], message: issue.message })
    }
  })
  .meta({ label: 'Library device', kind: 'group' })
export type CustomDeviceParams = z.output<typeof customDeviceSchema>

/**
 * Part-level agreement of an embedded device: its kind is the part's type, and the part's rating is the
 * device's (the band's points are in amperes of that one device). Used by the fuse and breaker schemas.
 */
export function checkCustomDeviceFits(kind: 'fuse' | 'breaker', params: { ratingA: number; customDevice?: CustomDeviceParams }, ctx: z.RefinementCtx) {
  const device = params.customDevice
  if (!device) return
  if (device.kind !== kind) {
    ctx.addIssue({ code: 'custom', path: ['customDevice', 'kind'], message: `A ${kind} part needs a ${kind} from the library, not a ${device.kind}` })
  }
  if (device.ratingA !== params.ratingA) {
    ctx.addIssue({
      code: 'custom',
      path: ['ratingA'],
      message: `The rating must be the library device's own (${device.ratingA} A); choose another device or go back to a generic family to change it`,
    })
  }
}
