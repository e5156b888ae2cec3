import { describe, expect, it } from 'vitest'
import { deviceBand, doesNotOpen, opensWithin, TIME_CURRENT_FAMILY_IDS } from '@shared/protection/timeCurrent'
import { logLogTimeS } from '@shared/protection/timeCurrent/_lib/logLog'
import { withstandTimeS } from '@shared/protection/withstand'

describe('deviceBand: concrete cases', () => {
  it('log–log interpolation between two anchors: halfway in log current is the geometric mean in time', () => {
    // Points (2, 5 s) and (8, 0.3125 s): at 4 (the log midpoint) the time is √(5 × 0.3125) = 1.25 s.
    const pts = [
      { multiple: 2, timeS: 5, source: 'test', status: 'computed' as const },
      { multiple: 8, timeS: 0.3125, source: 'test', status: 'computed' as const },
    ]
    expect(logLogTimeS(pts, 4)).toBeCloseTo(1.25, 12)
    expect(logLogTimeS(pts, 1.99)).toBe(Infinity)
    // Above the last point: constant I²t, so 16 (2 × 8) gives a quarter of 0.3125 s.
    expect(logLogTimeS(pts, 16)).toBeCloseTo(0.078125, 12)
  })
  it('scales with the rating: a 20 A band at 40 A equals a 10 A band at 20 A', () => {
    for (const id of TIME_CURRENT_FAMILY_IDS) {
      if (id.startsWith('cartridge-5x20-delay') || id === 'class-t') continue // these change limits with the rating
      expect(deviceBand(id, 20).maxClearS(40)).toBeCloseTo(deviceBand(id, 10).maxClearS(20), 9)
    }
  })
  it('names its source, per band and per anchor, with a status', () => {
    const band = deviceBand('cartridge-5x20-delay', 5)
    expect(band.source).toMatch(/IEC 60127-2 standard sheet 5/)
    expect(band.points.anchors.every((a) => a.status === 'two-sources')).toBe(true)
    expect(deviceBand('blade-regular', 10).points.anchors.some((a) => a.status === 'common-practice')).toBe(true)
  })
  it('opensWithin / doesNotOpen take a band or a family and rating', () => {
    const band = deviceBand('blade-regular', 10)
    expect(opensWithin({ band, currentA: 60, withinS: 0.1 })).toBe(true) // 600 % ≤ 0.1 s
    expect(opensWithin({ familyId: 'blade-regular', ratingA: 10, currentA: 60, withinS: 0.09 })).toBe(false)
    expect(doesNotOpen({ band, currentA: 60, forS: 0.039 })).toBe(true) // 600 % ≥ 0.04 s
    expect(doesNotOpen({ band, currentA: 60, forS: 0.04 })).toBe(false)
  })
})

describe('edge cases', () => {
  it('unknown family or unusable rating: a RangeError that names the problem', () => {
    expect(() => deviceBand('fuse-of-mystery', 10)).toThrow(/fuse-of-mystery/)
    for (const bad of [0, -5, Number.NaN, Infinity]) expect(() => deviceBand('blade-regular', bad)).toThrow(RangeError)
  })
  it('zero, negative or NaN current: the device carries it (Infinity), never NaN', () => {
    const band = deviceBand('class-t', 100)
    for (const a of [0, -10, Number.NaN]) {
      expect(band.minMeltS(a)).toBe(Infinity)
      expect(band.maxClearS(a)).toBe(Infinity)
    }
  })
  it('withstand: bad inputs are RangeErrors naming the field', () => {
    const base = { sizeId: 'awg-10', material: 'copper' as const, initialC: 90, finalC: 250 }
    expect(() => withstandTimeS({ ...base, currentA: 0 })).toThrow(/current/i)
    expect(() => withstandTimeS({ ...base, currentA: 100, finalC: 80 })).toThrow(/Final temperature/)
    expect(() => withstandTimeS({ ...base, sizeId: 'awg-99', currentA: 100 })).toThrow(/awg-99/)
    expect(() => withstandTimeS({ material: 'copper', initialC: 90, finalC: 250, currentA: 100 })).toThrow(/area/)
    expect(() => withstandTimeS({ ...base, material: 'gold' as never, currentA: 100 })).toThrow(/gold/)
  })
})
