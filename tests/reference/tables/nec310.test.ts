// Ampacity against NEC (NFPA 70) Table 310.16, 2011–2023 values, with the 310.15 factors.
// Sources (standards.md §1, [V2] unless marked): scribd 602627451 reproduction of Table 310.15(B)(16)
// (2014/2017) and a 2023-labelled reproduction; ambient table from up.codes IRC 2021 E3705.2 tagged
// [310.15(B)(1)]; adjustment table from buildmyowncabin.com NEC 2014 and ecmweb.com Code Q&A; the worked
// example from ecmweb.com [V].
import { describe, expect, it } from 'vitest'
import { conductorAmpacityA, type AmpacityInput } from '@shared/conductors/ampacity'

const building = (patch: Partial<AmpacityInput>) =>
  conductorAmpacityA({
    sizeId: 'awg-10', material: 'copper', insulationRatingC: 90, ambientC: 30, installation: 'conduit', bundledCount: 3,
    profile: 'building', ...patch,
  })

// Table 310.16, copper, A at 60 / 75 / 90 °C (null = no entry)
const COPPER: [string, number | null, number | null, number][] = [
  ['awg-18', null, null, 14], ['awg-16', null, null, 18], ['awg-14', 15, 20, 25], ['awg-12', 20, 25, 30],
  ['awg-10', 30, 35, 40], ['awg-8', 40, 50, 55], ['awg-6', 55, 65, 75], ['awg-4', 70, 85, 95], ['awg-3', 85, 100, 115],
  ['awg-2', 95, 115, 130], ['awg-1', 110, 130, 145], ['awg-1/0', 125, 150, 170], ['awg-2/0', 145, 175, 195],
  ['awg-3/0', 165, 200, 225], ['awg-4/0', 195, 230, 260],
]
// Table 310.16, aluminium or copper-clad aluminium
const ALUMINIUM: [string, number, number, number][] = [
  ['awg-12', 15, 20, 25], ['awg-10', 25, 30, 35], ['awg-8', 35, 40, 45], ['awg-6', 40, 50, 55], ['awg-4', 55, 65, 75],
  ['awg-3', 65, 75, 85], ['awg-2', 75, 90, 100], ['awg-1', 85, 100, 115], ['awg-1/0', 100, 120, 135],
  ['awg-2/0', 115, 135, 150], ['awg-3/0', 130, 155, 175], ['awg-4/0', 150, 180, 205],
]

describe('NEC Table 310.16 (2011+), exactly as tabulated at 30 °C, ≤ 3 conductors', () => {
  it.each(COPPER)('copper %s: %s / %s / %s A', (sizeId, a60, a75, a90) => {
    expect(building({ sizeId: sizeId as never, insulationRatingC: 60 }).ampacityA).toBe(a60)
    expect(building({ sizeId: sizeId as never, insulationRatingC: 75 }).ampacityA).toBe(a75)
    expect(building({ sizeId: sizeId as never, insulationRatingC: 90 }).ampacityA).toBe(a90)
  })
  it.each(ALUMINIUM)('aluminium %s: %i / %i / %i A', (sizeId, a60, a75, a90) => {
    expect(building({ sizeId: sizeId as never, material: 'aluminium', insulationRatingC: 60 }).ampacityA).toBe(a60)
    expect(building({ sizeId: sizeId as never, material: 'aluminium', insulationRatingC: 75 }).ampacityA).toBe(a75)
    expect(building({ sizeId: sizeId as never, material: 'aluminium', insulationRatingC: 90 }).ampacityA).toBe(a90)
  })
  it('is pinned to the 2011+ edition: pre-2011 Cu 14 AWG 60 °C was 20 A, Cu 3 AWG 90 °C 110 A, Al 8 AWG 60 °C 30 A', () => {
    expect(building({ sizeId: 'awg-14', insulationRatingC: 60 }).ampacityA).toBe(15)
    expect(building({ sizeId: 'awg-3', insulationRatingC: 90 }).ampacityA).toBe(115)
    expect(building({ sizeId: 'awg-8', material: 'aluminium', insulationRatingC: 60 }).ampacityA).toBe(35)
  })
})

// Table 310.15(B)(1): [upper end of band °C, 60, 75, 90 °C factors]
const AMBIENT: [number, number, number, number][] = [
  [10, 1.29, 1.2, 1.15], [15, 1.22, 1.15, 1.12], [20, 1.15, 1.11, 1.08], [25, 1.08, 1.05, 1.04], [30, 1.0, 1.0, 1.0],
  [35, 0.91, 0.94, 0.96], [40, 0.82, 0.88, 0.91], [45, 0.71, 0.82, 0.87], [50, 0.58, 0.75, 0.82], [55, 0.41, 0.67, 0.76],
  [60, 0, 0.58, 0.71], [65, 0, 0.47, 0.65], [70, 0, 0.33, 0.58], [75, 0, 0, 0.5], [80, 0, 0, 0.41], [85, 0, 0, 0.29],
]
const factorAt = (ambientC: number, insulationRatingC: 60 | 75 | 90) => {
  const r = building({ sizeId: 'awg-4/0', ambientC, insulationRatingC })
  return r.ampacityA! / r.baseAmpacityA!
}

describe('ambient correction, Table 310.15(B)(1), by the tabulated bands', () => {
  it.each(AMBIENT)('band ending %i °C: %f / %f / %f (at both ends of the band)', (upTo, f60, f75, f90) => {
    const lower = upTo === 10 ? -20 : upTo - 4
    for (const t of [lower, upTo]) {
      expect(factorAt(t, 60)).toBeCloseTo(f60, 10)
      expect(factorAt(t, 75)).toBeCloseTo(f75, 10)
      expect(factorAt(t, 90)).toBeCloseTo(f90, 10)
    }
  })
  it('[C] each tabulated factor equals √((Tc − Ta)/(Tc − 30)) at the band’s upper end, to ±0.01', () => {
    // standards.md §1: the NEC's own formula, evaluated at the upper end of each band
    for (const [upTo, ...fs] of AMBIENT) {
      ;([60, 75, 90] as const).forEach((tc, i) => {
        if (fs[i] === 0 || upTo <= 30) return // "–" entries; below 30 °C the bands use the lower end
        expect(Math.abs(Math.sqrt((tc - upTo) / (tc - 30)) - fs[i])).toBeLessThanOrEqual(0.01)
      })
    }
  })
})

describe('adjustment for more than three current-carrying conductors, Table 310.15(C)(1)', () => {
  it.each([
    [1, 1], [3, 1], [4, 0.8], [6, 0.8], [7, 0.7], [9, 0.7], [10, 0.5], [20, 0.5], [21, 0.45], [30, 0.45], [31, 0.4], [40, 0.4], [41, 0.35], [100, 0.35],
  ])('%i conductors → × %f', (n, f) => {
    const r = building({ sizeId: 'awg-2', bundledCount: n })
    expect(r.ampacityA! / r.baseAmpacityA!).toBeCloseTo(f, 10)
  })
  it('worked example (ecmweb.com): 4 × 10 AWG THHN (90 °C) in a raceway → 40 A × 0.8 = 32 A', () => {
    const r = building({ sizeId: 'awg-10', insulationRatingC: 90, bundledCount: 4 })
    expect(r.baseAmpacityA).toBe(40)
    expect(r.factors).toEqual([expect.objectContaining({ value: 0.8 })])
    expect(r.ampacityA).toBeCloseTo(32, 10)
  })
  it('the adjustment is applied after temperature correction: 6 × 8 AWG THHN at 40 °C → 55 × 0.91 × 0.8 = 40.04 A', () => {
    expect(building({ sizeId: 'awg-8', ambientC: 40, bundledCount: 6 }).ampacityA).toBeCloseTo(40.04, 9)
  })
})
