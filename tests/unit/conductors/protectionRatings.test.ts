import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import {
  DEVICE_FAMILIES, DEVICE_FAMILY_IDS, deviceFamilySchema, getDeviceFamily, nearestStandardRatingAtMost, NEC_STANDARD_RATINGS_A,
  nextRatingAboveA, nextStandardRatingA, standardRatingsA,
} from '@shared/protection/ratings'
import { dcInterruptingRatingA } from '@shared/protection/families'

describe('standard ratings look-ups', () => {
  it.each([
    [27, undefined, 30],
    [30, undefined, 30],
    [0.5, undefined, 1], // fuse-only 1 A
    [7, undefined, 10],
    [601, undefined, 700],
    [8, 'blade-regular', 10],
    [7.2, 'blade-mini', 7.5],
    [41, 'blade-regular', null], // regular blades stop at 40 A
    [350, 'class-t', 350],
    [1300, 'class-t', null],
  ] as const)('nextStandardRatingA(%f, %s) = %s', (a, family, expected) => expect(nextStandardRatingA(a, family)).toBe(expected))

  it.each([
    [32, undefined, 30],
    [7, undefined, 6],
    [0.5, undefined, null],
    [39, 'blade-large', 30],
    [20, 'cartridge-5x20-fast', 10],
  ] as const)('nearestStandardRatingAtMost(%f, %s) = %s', (a, family, expected) =>
    expect(nearestStandardRatingAtMost(a, family)).toBe(expected))

  it('nextRatingAboveA steps strictly above', () => {
    expect(nextRatingAboveA(30)).toBe(35)
    expect(nextRatingAboveA(6000)).toBeNull()
  })

  it('property: next ≥ current ≥ nearest-at-most, both from the list, nothing in between', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 7000, noNaN: true }), fc.option(fc.constantFrom(...DEVICE_FAMILY_IDS), { nil: undefined }), (a, family) => {
        const list = standardRatingsA(family)
        const up = nextStandardRatingA(a, family)
        const down = nearestStandardRatingAtMost(a, family)
        if (up !== null && (up < a - 1e-9 || !list.includes(up))) return false
        if (down !== null && (down > a + 1e-9 || !list.includes(down))) return false
        return list.every((r) => !(down !== null && r > down + 1e-9 && r < a - 1e-9) && !(up !== null && r < up - 1e-9 && r > a + 1e-9))
      }),
    )
  })
})

describe('device families', () => {
  it('has the 15 generic families, each complete, sorted and sourced', () => {
    expect(Object.keys(DEVICE_FAMILIES).sort()).toEqual([...DEVICE_FAMILY_IDS].sort())
    for (const id of DEVICE_FAMILY_IDS) {
      const f = getDeviceFamily(id)
      expect(f.id).toBe(id)
      expect(['fuse', 'breaker']).toContain(f.kind)
      expect(f.label.length).toBeGreaterThan(5)
      expect(f.source.length).toBeGreaterThan(5)
      expect(f.ratingsSource).toMatch(/recalled|common practice|IEC|NEC/)
      expect([...f.ratingsA].sort((a, b) => a - b)).toEqual(f.ratingsA)
      expect(new Set(f.ratingsA).size).toBe(f.ratingsA.length)
      expect(f.ignitionProtectedDefault).toBe(false)
      if (f.interruptingRating) expect(f.interruptingRating.source).toMatch(f.interruptingRating.status === 'recalled' ? /recalled/ : /ISO|UL|IEC/)
    }
  })
  it('family labels use generic names only (no trademarks)', () => {
    const labels = Object.values(DEVICE_FAMILIES).map((f) => `${f.label} ${f.source}`).join(' ')
    expect(labels).not.toMatch(/[™®]/)
  })
  it.each([
    ['blade-regular', 12, 1000], // ISO 8820-3: 1 000 A at 32 V
    ['blade-regular', 48, null], // above the 32 V rating
    ['class-t', 48, 20000],
    ['cartridge-5x20-fast', 12, null], // AC-only figure: no DC rating assumed
    ['breaker-thermal-3', 12, null], // no family figure on file
  ] as const)('dcInterruptingRatingA(%s, %f V) = %s', (id, v, expected) => expect(dcInterruptingRatingA(id, v)).toBe(expected))

  describe('edge cases', () => {
    it('rejects unknown families and bad currents', () => {
      expect(deviceFamilySchema.safeParse('mega-fuse').success).toBe(false)
      expect(() => standardRatingsA('nope' as never)).toThrow(/Unknown device family "nope"/)
      expect(() => nextStandardRatingA(NaN)).toThrow(/currentA/)
      expect(() => nearestStandardRatingAtMost(-1)).toThrow(/limitA/)
    })
    it('the merged NEC list is ascending and contains the fuse-only ratings', () => {
      expect([...NEC_STANDARD_RATINGS_A].sort((a, b) => a - b)).toEqual(NEC_STANDARD_RATINGS_A)
      for (const r of [1, 3, 6, 10]) expect(NEC_STANDARD_RATINGS_A).toContain(r)
      expect(NEC_STANDARD_RATINGS_A).not.toContain(601)
    })
  })
})
