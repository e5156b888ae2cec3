import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { DEVICE_FAMILY_IDS, standardRatingsA } from '@shared/protection/ratings'
import { deviceBand, TIME_CURRENT_FAMILY_IDS } from '@shared/protection/timeCurrent'
import { damageCurve, withstandTimeS } from '@shared/protection/withstand'

// Property tests (fast-check): physical sense of every band at any rating and current.

const family = fc.constantFrom(...TIME_CURRENT_FAMILY_IDS)
const rating = fc.double({ min: 0.1, max: 2000, noNaN: true })
/** Current as a multiple of the rating, spread evenly on a log axis from 0.5 to 10 000. */
const multiple = fc.double({ min: Math.log(0.5), max: Math.log(10_000), noNaN: true }).map(Math.exp)

describe('time-current bands', () => {
  it('more current never takes longer (both curves monotonic)', () => {
    fc.assert(
      fc.property(family, rating, multiple, multiple, (id, ratingA, m1, m2) => {
        const [lo, hi] = m1 <= m2 ? [m1, m2] : [m2, m1]
        const band = deviceBand(id, ratingA)
        expect(band.minMeltS(hi * ratingA)).toBeLessThanOrEqual(band.minMeltS(lo * ratingA))
        expect(band.maxClearS(hi * ratingA)).toBeLessThanOrEqual(band.maxClearS(lo * ratingA))
      }),
      { numRuns: 2000 },
    )
  })

  it('minimum melting ≤ maximum clearing everywhere', () => {
    fc.assert(
      fc.property(family, rating, multiple, (id, ratingA, m) => {
        const band = deviceBand(id, ratingA)
        expect(band.minMeltS(m * ratingA)).toBeLessThanOrEqual(band.maxClearS(m * ratingA))
      }),
      { numRuns: 3000 },
    )
  })

  it('times are positive, never NaN (Infinity only where the device carries or is not sure to open)', () => {
    fc.assert(
      fc.property(family, rating, multiple, (id, ratingA, m) => {
        const band = deviceBand(id, ratingA)
        for (const t of [band.minMeltS(m * ratingA), band.maxClearS(m * ratingA)]) {
          expect(Number.isNaN(t)).toBe(false)
          expect(t).toBeGreaterThan(0)
        }
        if (m >= 3) expect(Number.isFinite(band.maxClearS(m * ratingA))).toBe(true) // every device opens at 3 In
      }),
    )
  })

  it('chart points are finite, ordered by current, and decreasing in time', () => {
    for (const id of TIME_CURRENT_FAMILY_IDS) {
      const { points } = deviceBand(id, 20)
      for (const curve of [points.minMelt, points.maxClear]) {
        expect(curve.length).toBeGreaterThan(10)
        for (let i = 1; i < curve.length; i++) {
          expect(curve[i].currentA).toBeGreaterThanOrEqual(curve[i - 1].currentA)
          expect(curve[i].timeS).toBeLessThanOrEqual(curve[i - 1].timeS)
          expect(Number.isFinite(curve[i].timeS)).toBe(true)
        }
      }
      for (const a of points.anchors) expect(a.source.length).toBeGreaterThan(10)
    }
  })
})

describe('the catalogue and the time-current models agree', () => {
  it('every device family in ratings.ts has a band, at every rating it lists', () => {
    for (const id of DEVICE_FAMILY_IDS) {
      expect(TIME_CURRENT_FAMILY_IDS).toContain(id)
      for (const ratingA of standardRatingsA(id)) {
        const band = deviceBand(id, ratingA)
        expect(band.minMeltS(1.5 * ratingA)).toBeLessThanOrEqual(band.maxClearS(1.5 * ratingA))
      }
    }
  })
})

describe('conductor withstand (ICEA adiabatic)', () => {
  const size = fc.constantFrom('awg-18', 'awg-14', 'awg-10', 'awg-4', 'awg-4/0', 'mm2-1.5', 'mm2-16', 'mm2-95')
  const current = fc.double({ min: 10, max: 100_000, noNaN: true })
  it('doubling the current quarters the time; more current never lasts longer', () => {
    fc.assert(
      fc.property(size, current, fc.constantFrom('copper', 'aluminium') as fc.Arbitrary<'copper' | 'aluminium'>, (sizeId, currentA, material) => {
        const t1 = withstandTimeS({ sizeId, material, currentA, initialC: 90, finalC: 250 })
        const t2 = withstandTimeS({ sizeId, material, currentA: 2 * currentA, initialC: 90, finalC: 250 })
        expect(Math.abs(t1 / t2 - 4)).toBeLessThan(1e-9)
        expect(t2).toBeLessThan(t1)
      }),
    )
  })
  it('a hotter limit or a cooler start lasts longer; aluminium lasts less than copper of the same area', () => {
    fc.assert(
      fc.property(size, current, (sizeId, currentA) => {
        const base = { sizeId, currentA, material: 'copper' as const }
        const t = withstandTimeS({ ...base, initialC: 90, finalC: 250 })
        expect(withstandTimeS({ ...base, initialC: 90, finalC: 150 })).toBeLessThan(t)
        expect(withstandTimeS({ ...base, initialC: 60, finalC: 250 })).toBeGreaterThan(t)
        expect(withstandTimeS({ ...base, material: 'aluminium', initialC: 90, finalC: 250 })).toBeLessThan(t)
      }),
    )
  })
  it('damage curve points are ordered and carry the source', () => {
    const c = damageCurve({ sizeId: 'awg-10', material: 'copper', initialC: 105, finalC: 150 })
    expect(c.source).toMatch(/ICEA P-32-382/)
    for (let i = 1; i < c.points.length; i++) expect(c.points[i].currentA).toBeLessThan(c.points[i - 1].currentA)
  })
})
