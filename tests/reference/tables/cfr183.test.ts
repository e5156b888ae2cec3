// Boat conductor ampacity against 33 CFR 183.425 Table 5 (federal.elaws.us; GPO 2001 edition —
// standards.md §4 [V2]), the engine-space correction of Note 1 and the USCG bundling factors.
import { describe, expect, it } from 'vitest'
import { conductorAmpacityA, type AmpacityInput } from '@shared/conductors/ampacity'
import { engineSpaceFactor } from '@shared/conductors/cfr183'

const marine = (patch: Partial<AmpacityInput>) =>
  conductorAmpacityA({
    sizeId: 'awg-10', material: 'copper', insulationRatingC: 105, ambientC: 30, installation: 'free-air', bundledCount: 1,
    profile: 'marine', ...patch,
  })

const COLUMNS = [60, 75, 80, 90, 105, 125, 200] as const
// 33 CFR 183.425 Table 5, A, columns 60 / 75 / 80 / 90 / 105 / 125 / 200 °C
const TABLE_5: [string, ...number[]][] = [
  ['awg-18', 10, 10, 15, 20, 20, 25, 25],
  ['awg-16', 15, 15, 20, 25, 25, 30, 35],
  ['awg-14', 20, 20, 25, 30, 35, 40, 45],
  ['awg-12', 25, 25, 35, 40, 45, 50, 55],
  ['awg-10', 40, 40, 50, 55, 60, 70, 70],
  ['awg-8', 55, 65, 70, 70, 80, 90, 100],
  ['awg-6', 80, 95, 100, 100, 120, 125, 135],
  ['awg-4', 105, 125, 130, 135, 160, 170, 180],
  ['awg-3', 120, 145, 150, 155, 180, 195, 210],
  ['awg-2', 140, 170, 175, 180, 210, 225, 240],
  ['awg-1', 165, 195, 210, 210, 245, 265, 280],
  ['awg-1/0', 195, 230, 245, 245, 285, 305, 325],
  ['awg-2/0', 225, 265, 285, 285, 330, 355, 370],
  ['awg-3/0', 260, 310, 330, 330, 385, 410, 430],
  ['awg-4/0', 300, 360, 385, 385, 445, 475, 510],
]

describe('33 CFR 183.425 Table 5, exactly as tabulated (outside engine spaces)', () => {
  it.each(TABLE_5)('%s', (sizeId, ...amps) => {
    COLUMNS.forEach((c, i) => expect(marine({ sizeId: sizeId as never, insulationRatingC: c }).ampacityA).toBe(amps[i]))
  })
  it('the vehicle profile reads the same table', () => {
    for (const [sizeId, ...amps] of TABLE_5) expect(marine({ sizeId: sizeId as never, profile: 'vehicle' }).ampacityA).toBe(amps[4])
  })
})

describe('engine spaces (Table 5 Note 1, 50 °C)', () => {
  // 105 °C cable inside an engine space, as printed by two chandlery / cable-maker notes (factor 0.85) [V2]
  const INDUSTRY_105_ENGINE: [string, number][] = [
    ['awg-18', 17], ['awg-16', 21], ['awg-14', 30], ['awg-12', 38], ['awg-10', 51], ['awg-8', 68], ['awg-6', 102],
    ['awg-4', 136], ['awg-3', 153], ['awg-2', 178], ['awg-1', 208], ['awg-1/0', 242], ['awg-2/0', 280], ['awg-3/0', 327],
    ['awg-4/0', 378],
  ]
  it.each(INDUSTRY_105_ENGINE)('%s 105 °C in an engine space: %i A (±1 A)', (sizeId, a) => {
    expect(Math.abs(marine({ sizeId: sizeId as never, installation: 'engine-space' }).ampacityA! - a)).toBeLessThanOrEqual(1)
  })

  it('[C] the √((Tc − 50)/(Tc − 30)) rule gives 0.577 / 0.745 / 0.775 / 0.816 / 0.856 / 0.889 / 0.939', () => {
    const computed = COLUMNS.map((tc) => Math.sqrt((tc - 50) / (tc - 30)))
    expect(computed.map((x) => Number(x.toFixed(3)))).toEqual([0.577, 0.745, 0.775, 0.816, 0.856, 0.889, 0.939])
  })

  it('applied factors: 0.85 at 105 °C (verified), elsewhere the lower of computed and recalled-printed values', () => {
    // recalled printed Note 1 [M]: 0.58 / 0.75 / 0.79 / 0.82 / 0.86 / 0.89 / 1.00
    const recalled = [0.58, 0.75, 0.79, 0.82, 0.86, 0.89, 1.0]
    COLUMNS.forEach((tc, i) => {
      const f = engineSpaceFactor(tc)
      const computed = Math.sqrt((tc - 50) / (tc - 30))
      if (tc === 105) {
        expect(f.value).toBe(0.85)
        expect(f.status).toMatch(/verified/)
      } else {
        expect(f.value).toBeCloseTo(Math.min(computed, recalled[i]), 12)
        expect(f.status).toMatch(/recalled as [0-9.]+ \(unverified\)/)
      }
      // never above the printed value we recall, and within 0.02 of it except the 200 °C column
      expect(f.value).toBeLessThanOrEqual(recalled[i])
      if (tc !== 200) expect(recalled[i] - f.value).toBeLessThanOrEqual(0.02)
    })
  })
})

describe('bundling (USCG compliance guideline, ≥ 50 V) — cable maker’s derived 105 °C tables', () => {
  // Derived table (standards.md §4): outside / inside engine space
  it.each([
    [3, 'awg-14', 24.5, 20.8],
    [3, 'awg-4/0', 311.5, 264.8],
    [4, 'awg-14', 21, 17.9],
    [6, 'awg-14', 21, 17.9],
    [7, 'awg-14', 17.5, 14.9],
    [24, 'awg-14', 17.5, 14.9],
  ] as const)('%i bundled %s: %f A outside, %f A inside an engine space (±0.1 A)', (n, sizeId, outside, inside) => {
    for (const circuitVoltageV of [12, 58]) {
      expect(marine({ sizeId, bundledCount: n, circuitVoltageV }).ampacityA).toBeCloseTo(outside, 1)
      expect(Math.abs(marine({ sizeId, bundledCount: n, circuitVoltageV, installation: 'engine-space' }).ampacityA! - inside)).toBeLessThanOrEqual(0.1)
    }
  })
  it.each([[1, 1], [2, 1], [3, 0.7], [4, 0.6], [6, 0.6], [7, 0.5], [24, 0.5], [25, 0.4], [60, 0.4]])('%i conductors → × %f', (n, f) => {
    const r = marine({ sizeId: 'awg-6', bundledCount: n, circuitVoltageV: 120 })
    expect(r.ampacityA! / r.baseAmpacityA!).toBeCloseTo(f, 12)
  })
})
