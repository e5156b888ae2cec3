import { describe, expect, it } from 'vitest'
import {
  damageCurve,
  iecK,
  iecKFromTemperatures,
  iecWithstandTimeS,
  shortCircuitLimit,
  withstandI2tA2s,
  withstandTimeS,
} from '@shared/protection/withstand'

// ICEA P-32-382 adiabatic relation [V2] (standards.md §8), worked out by hand below:
//   copper: (I/A)²·t = 0.0297·log10[(T2 + 234)/(T1 + 234)], A in cmil.
// IEC 60364-4-43 k factors [V2]: t = (k·S/I)², S in mm².

const rel = (a: number, b: number) => Math.abs(a / b - 1)

describe('ICEA P-32-382, copper 4/0 AWG, 90 → 250 °C (thermoset)', () => {
  // By hand: log10(484/324) = log10(1.493827) = 0.174300; × 0.0297 = 0.0051767; √ = 0.071949,
  // the published constant 0.07195 [V]. A(4/0) = 211 600 cmil (ASTM B258: d = 460 mils).
  // I = 0.07195 × 211 600 / √t: at t = 1 s, I = 15 225 A; at I = 10 kA, t = (1.52246)² = 2.3179 s.
  it('withstands 10 kA for 2.318 s', () => {
    const t = withstandTimeS({ sizeId: 'awg-4/0', material: 'copper', currentA: 10_000, initialC: 90, finalC: 250 })
    expect(rel(t, 2.3179)).toBeLessThan(2e-4)
  })
  it('carries 15 225 A for 1 s (I = 0.07195 × 211 600 / √1)', () => {
    const i2t = withstandI2tA2s({ areaCmil: 211_600, material: 'copper', initialC: 90, finalC: 250 })
    expect(rel(Math.sqrt(i2t), 15_225)).toBeLessThan(2e-4)
  })
  it('the damage curve keeps I²t constant and passes through (15 225 A, 1 s)', () => {
    const curve = damageCurve({ sizeId: 'awg-4/0', material: 'copper', initialC: 90, finalC: 250, fromS: 0.01, toS: 1 })
    const last = curve.points[curve.points.length - 1]
    expect(last.timeS).toBeCloseTo(1, 12)
    expect(rel(last.currentA, 15_225)).toBeLessThan(2e-4)
    for (const p of curve.points) expect(rel(p.currentA ** 2 * p.timeS, curve.i2tA2s)).toBeLessThan(1e-9)
  })
})

describe('ICEA P-32-382, copper 10 AWG', () => {
  // 10 AWG, NEC Table 8 area 10 380 cmil. 90 → 250 °C: I(1 s) = 0.07195 × 10 380 = 746.8 A;
  // at 2 kA: t = (746.8 / 2000)² = 0.13943 s.
  it('90 → 250 °C: 746.8 A for 1 s; 2 kA for 0.1394 s', () => {
    const i2t = withstandI2tA2s({ areaCmil: 10_380, material: 'copper', initialC: 90, finalC: 250 })
    expect(rel(Math.sqrt(i2t), 746.8)).toBeLessThan(2e-4)
    const t = withstandTimeS({ areaCmil: 10_380, material: 'copper', currentA: 2000, initialC: 90, finalC: 250 })
    expect(rel(t, 0.13943)).toBeLessThan(5e-4)
  })
  // 75 → 150 °C (thermoplastic): log10(384/309) = 0.094360; × 0.0297 = 0.0028025; √ = 0.052939 (k = 0.05294 [C]).
  // I(1 s) = 0.05294 × 10 380 = 549.5 A.
  it('75 → 150 °C thermoplastic: 549.5 A for 1 s', () => {
    const i2t = withstandI2tA2s({ areaCmil: 10_380, material: 'copper', initialC: 75, finalC: 150 })
    expect(rel(Math.sqrt(i2t), 549.5)).toBeLessThan(3e-4)
  })
  // The size table's geometric 10 AWG area (10 383 cmil) differs from NEC's rounded 10 380 by 0.03 %.
  it('by size id (ASTM B258 area) agrees with the NEC area within 0.1 %', () => {
    const bySize = withstandTimeS({ sizeId: 'awg-10', material: 'copper', currentA: 2000, initialC: 90, finalC: 250 })
    expect(rel(bySize, 0.13943)).toBeLessThan(1e-3)
  })
})

describe('insulation short-circuit limits', () => {
  it('thermoplastic 150 °C [M], thermoset 250 °C [V]; 105 °C cable read as thermoplastic', () => {
    expect(shortCircuitLimit({ insulationRatingC: 105 })).toMatchObject({ finalC: 150, status: 'recalled' })
    expect(shortCircuitLimit({ insulationRatingC: 125 })).toMatchObject({ finalC: 250, status: 'verified' })
    expect(shortCircuitLimit({ insulationRatingC: 90, insulation: 'thermoset' }).finalC).toBe(250)
  })
  // 105 → 150 °C copper: k = 0.0401 [C] (standards.md §8): log10(384/339) = 0.054128; ×0.0297 → √ = 0.040095.
  it('105 → 150 °C copper reproduces k = 0.0401', () => {
    const i2t = withstandI2tA2s({ areaCmil: 1, material: 'copper', initialC: 105, finalC: 150 })
    expect(rel(Math.sqrt(i2t), 0.0401)).toBeLessThan(3e-3)
  })
})

describe('IEC 60364-4-43 k-factor cross-check [V2]', () => {
  it('k from the temperatures reproduces 115 (Cu/PVC 70 → 160 °C) and 143 (Cu/XLPE 90 → 250 °C) [C]', () => {
    expect(rel(iecKFromTemperatures('copper', 70, 160), 115)).toBeLessThan(2e-3)
    expect(rel(iecKFromTemperatures('copper', 90, 250), 143)).toBeLessThan(2e-3)
    expect(iecK('copper', 'thermoplastic')).toBe(115)
    expect(iecK('copper', 'thermoset')).toBe(143)
  })
  // ICEA and IEC are independent publications of the same adiabatic physics: on the same temperatures
  // they must agree within about 1 % (ICEA's constant in cmil → mm²: √(0.0297·log10(394/304)) / 5.067e-4 = 114.1).
  it.each([
    { areaMm2: 16, currentA: 2000, initialC: 70, finalC: 160, k: 115 },
    { areaMm2: 2.5, currentA: 600, initialC: 70, finalC: 160, k: 115 },
    { areaMm2: 50, currentA: 8000, initialC: 90, finalC: 250, k: 143 },
  ])('$areaMm2 mm² at $currentA A: ICEA within 2 % of (k·S/I)² with k = $k', (c) => {
    const iec = iecWithstandTimeS({ areaMm2: c.areaMm2, currentA: c.currentA, k: c.k })
    const icea = withstandTimeS({ areaMm2: c.areaMm2, material: 'copper', currentA: c.currentA, initialC: c.initialC, finalC: c.finalC })
    expect(rel(icea, iec)).toBeLessThan(0.02)
  })
  it('16 mm² Cu/PVC at 2 kA: (115 × 16 / 2000)² = 0.8464 s by hand', () => {
    expect(rel(iecWithstandTimeS({ areaMm2: 16, currentA: 2000, k: 115 }), 0.8464)).toBeLessThan(1e-9)
  })
})
