import { describe, expect, it } from 'vitest'
import { deviceBand } from '@shared/protection/timeCurrent'

// Every family's band against its standard's test points, written out here from the team's reference
// notes (standards.md §5), not read from the module. Tags: [V] verified, [V2] two sources agree,
// [M] recalled (unverified), [CP] common practice. Multiples of the rating In; times in seconds.

const REL = 1e-6 // the bands are anchored on these points: they must pass through them
const H = 3600

function at(familyId: string, ratingA: number, multiple: number) {
  const band = deviceBand(familyId, ratingA)
  return { min: band.minMeltS(multiple * ratingA), max: band.maxClearS(multiple * ratingA) }
}

describe('ISO 8820-3 blade fuse-links, opening-time table [M] (loose bounds, standards.md §5)', () => {
  // % of rating → minimum time, maximum time
  const table = [
    { multiple: 1.1, minS: 100 * H },
    { multiple: 1.35, minS: 0.75, maxS: 600 },
    { multiple: 2, minS: 0.15, maxS: 5 },
    { multiple: 3.5, minS: 0.08, maxRangeS: [0.25, 0.5] },
    { multiple: 6, minS: 0.04, maxS: 0.1 },
  ]
  for (const familyId of ['blade-mini', 'blade-regular', 'blade-large']) {
    for (const ratingA of [5, 15, 30]) {
      it(`${familyId} ${ratingA} A passes through every point`, () => {
        for (const row of table) {
          const { min, max } = at(familyId, ratingA, row.multiple)
          expect(Math.abs(min / row.minS - 1)).toBeLessThan(REL)
          if (row.maxS !== undefined) expect(Math.abs(max / row.maxS - 1)).toBeLessThan(REL)
          if (row.maxRangeS) {
            expect(max).toBeGreaterThanOrEqual(row.maxRangeS[0] * (1 - REL))
            expect(max).toBeLessThanOrEqual(row.maxRangeS[1] * (1 + REL))
          }
        }
        // Below 110 % nothing opens; below 135 % nothing is sure to open.
        expect(at(familyId, ratingA, 1.09).min).toBe(Infinity)
        expect(at(familyId, ratingA, 1.3).max).toBe(Infinity)
      })
    }
  }
})

describe('IEC 60127-2 standard sheet 5, time-lag high breaking [V2] (two datasheets, standards.md §5)', () => {
  // Where datasheets A and B differ the band must lie within the two.
  const cases = [
    { ratingA: 1, carryS: 1 * H, min4S: 0.095, min10S: 0.01 },
    { ratingA: 3.15, carryS: 1 * H, min4S: 0.095, min10S: 0.01 },
    { ratingA: 5, carryS: 1 * H, min4S: 0.15, min10S: 0.02 },
    { ratingA: 10, carryS: 30 * 60, min4S: 0.15, min10S: 0.02 }, // B: ≥ 30 min at 8–10 A
    { ratingA: 16, carryS: 15 * 60, min4S: 0.15, min10S: 0.02 }, // B: ≥ 15 min at 12.5–16 A
  ]
  for (const c of cases) {
    it(`${c.ratingA} A`, () => {
      const f = (m: number) => at('cartridge-5x20-delay', c.ratingA, m)
      expect(f(1.5).min).toBeGreaterThanOrEqual(c.carryS * (1 - REL)) // 1.5 In ≥ 1 h (30 / 15 min, B)
      expect(f(1.5).min).toBeLessThanOrEqual(1 * H * (1 + REL))
      expect(Math.abs(f(2.1).max / (30 * 60) - 1)).toBeLessThan(REL) // 2.1 In ≤ 30 min
      expect(f(2.75).min).toBeGreaterThanOrEqual(0.75 * (1 - REL)) // 2.75 In ≥ 1 s (A) / 0.75 s (B)
      expect(f(2.75).min).toBeLessThanOrEqual(1)
      expect(Math.abs(f(2.75).max / 80 - 1)).toBeLessThan(REL) // ≤ 80 s
      expect(Math.abs(f(4).min / c.min4S - 1)).toBeLessThan(REL) // 95 ms (≤ 3.15 A) / 150 ms (≥ 4 A)
      expect(Math.abs(f(4).max / 5 - 1)).toBeLessThan(REL) // ≤ 5 s
      expect(Math.abs(f(10).min / c.min10S - 1)).toBeLessThan(REL) // 10 ms / 20 ms
      expect(f(10).max).toBeGreaterThanOrEqual(0.1) // ≤ 100 ms (A) / 150 ms (B)
      expect(f(10).max).toBeLessThanOrEqual(0.15 * (1 + REL))
    })
  }
})

describe('IEC 60127-2 fast-acting F sheets [M] (standards.md §5)', () => {
  it.each([0.5, 2, 10])('%s A lies within the recalled limits', (ratingA) => {
    const f = (m: number) => at('cartridge-5x20-fast', ratingA, m)
    expect(f(2.1).max).toBeLessThanOrEqual(30 * 60 * (1 + REL)) // 2.1 In ≤ 30 min
    expect(f(2.75).min).toBeGreaterThanOrEqual(0.01 * (1 - REL)) // 2.75 In: ~10 ms – 2 s
    expect(f(2.75).max).toBeLessThanOrEqual(2 * (1 + REL))
    expect(f(4).min).toBeGreaterThanOrEqual(0.003 * (1 - REL)) // 4 In: ~3 ms – 300 ms
    expect(f(4).max).toBeLessThanOrEqual(0.3 * (1 + REL))
    expect(f(10).max).toBeLessThanOrEqual(0.02 * (1 + REL)) // 10 In ≤ 20 ms
    // Speed letter F [M]: 1–10 ms pre-arcing at 10 In.
    expect(f(10).min).toBeGreaterThanOrEqual(0.001 * (1 - REL))
    expect(f(10).min).toBeLessThanOrEqual(0.01)
  })
})

describe("UL 248-14 supplemental fuses [V] (a fuse maker's guide to the standard, standards.md §5)", () => {
  for (const familyId of ['cartridge-6x32-fast', 'cartridge-6x32-delay']) {
    it.each([1, 10, 30, 35, 60])(`${familyId} %s A: carries 100 %, opens at 135 % within 1 h and 200 % within 2 / 4 min`, (ratingA) => {
      const f = (m: number) => at(familyId, ratingA, m)
      expect(f(1).min).toBeGreaterThan(1 * H) // carries 100 % (datasheet duration 4 h [M])
      expect(Math.abs(f(1.35).max / H - 1)).toBeLessThan(REL)
      const at200S = ratingA <= 30 ? 2 * 60 : 4 * 60 // 0–30 A: 2 min; 35–60 A: 4 min
      expect(Math.abs(f(2).max / at200S - 1)).toBeLessThan(REL)
    })
  }
})

describe('IEC 60269-6 gPV conventional currents [M] (Table 101 exists; values recalled, standards.md §5)', () => {
  it.each([1, 10, 15, 30])('%s A: does not open at 1.13 In within 1 h; opens at 1.45 In within 1 h', (ratingA) => {
    const f = (m: number) => at('pv-10x38', ratingA, m)
    expect(f(1.13).min).toBeGreaterThanOrEqual(H * (1 - REL))
    expect(f(1.45).max).toBeLessThanOrEqual(H * (1 + REL))
    // Between the two conventional currents the band promises neither carrying nor opening.
    expect(f(1.3).min).toBeLessThan(H)
    expect(f(1.3).max).toBe(Infinity)
  })
})

describe('UL 248-15 Class T [M] (recalled overload limits) and high-current fuses [M]', () => {
  it.each([30, 60, 100, 400])('Class T %s A opens at 135 % within 1 h (≤ 60 A) / 2 h and is very fast at 10 In', (ratingA) => {
    const f = (m: number) => at('class-t', ratingA, m)
    expect(f(1.35).max).toBeLessThanOrEqual((ratingA <= 60 ? 1 : 2) * H * (1 + REL))
    expect(f(1.1).min).toBeGreaterThanOrEqual(100 * H * (1 - REL)) // carries 110 %
    expect(f(10).max).toBeLessThanOrEqual(0.02 * (1 + REL))
  })
  it.each(['strip-bolt-down', 'battery-terminal'])('%s carries 110 % and opens at 135 % within 1 h', (familyId) => {
    const f = (m: number) => at(familyId, 100, m)
    expect(f(1.1).min).toBeGreaterThanOrEqual(100 * H * (1 - REL))
    expect(f(1.35).max).toBeLessThanOrEqual(H * (1 + REL))
  })
})

describe('Breakers: SAE J553 thermal [M] with a 0.2 s floor [CP]; magnetic-hydraulic [M]', () => {
  it.each(['breaker-thermal-1', 'breaker-thermal-2', 'breaker-thermal-3'])('%s carries 100 %, opens at 135 % within 1 h, never below 0.2 s', (familyId) => {
    const f = (m: number) => at(familyId, 20, m)
    expect(f(1).min).toBeGreaterThanOrEqual(100 * H * (1 - REL))
    expect(f(1.35).max).toBeLessThanOrEqual(H * (1 + REL))
    for (const m of [10, 50, 200, 1000]) {
      expect(f(m).min).toBeGreaterThanOrEqual(0.2)
      expect(f(m).max).toBeGreaterThanOrEqual(0.2)
    }
    expect(f(1000).max).toBeCloseTo(0.2, 9) // the curve stops at the floor: no instantaneous region
  })
  it('magnetic-hydraulic: instantaneous trip from 10 In within 20 ms, not before 6 In', () => {
    const f = (m: number) => at('breaker-magnetic-hydraulic', 20, m)
    expect(f(10).max).toBeLessThanOrEqual(0.02)
    expect(f(100).max).toBeLessThanOrEqual(0.02)
    expect(f(5.9).min).toBeGreaterThan(0.1) // still on the hydraulic delay
    expect(f(6).min).toBeCloseTo(0.004, 9)
  })
})
