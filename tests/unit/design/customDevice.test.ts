import { describe, expect, it } from 'vitest'
import { breakerParamsSchema, fuseParamsSchema } from '@shared/design/params'
import { customDeviceSchema } from '@shared/design/customDevice'

// The embedded library device of a fuse or breaker (docs/design-format.md): a well-formed copy parses,
// points that cannot describe a device are rejected at the very point, and the part must agree with it.

const device = {
  libraryId: 'lib-1',
  name: 'Invented slow fuse 10 A',
  kind: 'fuse',
  ratingA: 10,
  timeDelay: true,
  source: 'invented test datasheet, fig. 1',
  minMeltPoints: [{ currentA: 15, timeS: 3600 }, { currentA: 40, timeS: 2 }, { currentA: 100, timeS: 0.05 }],
  maxClearPoints: [{ currentA: 20, timeS: 3600 }, { currentA: 40, timeS: 20 }, { currentA: 100, timeS: 0.5 }],
}
const fuse = { family: 'blade-regular', ratingA: 10, dcVoltageRatingV: 32, interruptingRatingA: 1000, ignitionProtected: false, customDevice: device }
const pathsOf = (r: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) =>
  (r.error?.issues ?? []).map((i) => `${i.path.join('.')}: ${i.message}`)

describe('customDevice in fuse and breaker params', () => {
  it('parses a well-formed copy', () => {
    const r = fuseParamsSchema.safeParse(fuse)
    expect(pathsOf(r)).toEqual([])
  })
  it('is optional: a generic fuse parses without it', () => {
    const { customDevice: _c, ...generic } = fuse
    expect(fuseParamsSchema.safeParse(generic).success).toBe(true)
  })
  it('marks the point where the time rises as the current rises', () => {
    const bad = { ...device, maxClearPoints: [{ currentA: 20, timeS: 3600 }, { currentA: 40, timeS: 5000 }] }
    expect(pathsOf(customDeviceSchema.safeParse(bad))).toEqual(['maxClearPoints.1.timeS: Time must not rise as the current rises'])
  })
  it('rejects minimum melting after maximum clearing', () => {
    const bad = { ...device, minMeltPoints: [{ currentA: 15, timeS: 3600 }, { currentA: 40, timeS: 30 }] }
    expect(pathsOf(customDeviceSchema.safeParse(bad))).toEqual(['minMeltPoints: Minimum melting time is after maximum clearing time at 40 A'])
  })
  it('asks for two points per curve and a source', () => {
    const bad = { ...device, minMeltPoints: [{ currentA: 15, timeS: 3600 }], source: ' ' }
    const paths = pathsOf(customDeviceSchema.safeParse(bad))
    expect(paths).toContain('minMeltPoints: Give at least two minimum melting points')
    expect(paths).toContain('source: Name where the points come from')
  })
  it('needs the part rating to be the device rating, and the kind to be the part type', () => {
    expect(pathsOf(fuseParamsSchema.safeParse({ ...fuse, ratingA: 15 }))).toEqual([
      "ratingA: The rating must be the library device's own (10 A); choose another device or go back to a generic family to change it",
    ])
    expect(pathsOf(breakerParamsSchema.safeParse({ ...fuse, family: 'breaker-thermal-3' }))).toEqual([
      'customDevice.kind: A breaker part needs a breaker from the library, not a fuse',
    ])
  })
})
