import { describe, expect, it } from 'vitest'
import { analyzeDesign } from '../../../shared/analysis'
import { designOf, part, settingsFor, simpleBranch, wire } from './helpers'

// Worked by hand from published tables, independent of the conductor module's own formula:
// NEC Chapter 9 Table 8 gives stranded uncoated copper at 75 °C, and its note gives
// R2 = R1 [1 + 0.00323 (T2 − 75)] (standards.md §2). 1 ft = 0.3048 m.
const necOhmPerM = (ohmPerKft: number, temperatureC: number) => (ohmPerKft / 304.8) * (1 + 0.00323 * (temperatureC - 75))

describe('voltage drop of a 12 V pump circuit (hand-worked)', () => {
  // Circuit: 12.8 V LFP module (4 mΩ) → 0.1 m 4 AWG → 15 A blade fuse (1 mΩ contact) → 6 m 14 AWG →
  // pump drawing a constant 6 A → 6 m 14 AWG back to the bank. Copper at the 30 °C ambient.
  //  14 AWG, Table 8: 3.14 Ω/kft at 75 °C → 3.14 / 304.8 = 0.010302 Ω/m
  //  at 30 °C: × (1 + 0.00323 × (30 − 75)) = × 0.85465 → 0.0088045 Ω/m
  //  one 6 m conductor: 0.052827 Ω; out and back: 0.10565 Ω
  //   4 AWG feed, 0.1 m: 0.308 / 304.8 × 0.85465 × 0.1 = 0.0000864 Ω; fuse 0.001 Ω
  //  drop from the bank terminals to the pump at 6 A: 6 × (0.10565 + 0.0000864 + 0.001) = 6 × 0.10674 = 0.6404 V
  //  as a share of the 12 V nominal: 0.6404 / 12 = 5.34 %
  //  → over the 3 % limit for a critical circuit, within the 10 % for others (ABYC E-11).
  const loopOhm = 2 * 6 * necOhmPerM(3.14, 30) + 0.1 * necOhmPerM(0.308, 30) + 0.001
  const expectedPercent = (100 * 6 * loopOhm) / 12

  it('matches the hand figure within 1 % (Table 8 stranded vs our ASTM B258 area × lay factor)', () => {
    const design = simpleBranch({ sizeId: 'awg-14', lengthM: 6, load: { model: 'current', currentA: 6, critical: true } })
    const f = analyzeDesign(design).findings.find((x) => x.ruleId === 'voltage-drop')
    expect(expectedPercent).toBeCloseTo(5.34, 2)
    expect(f?.measured?.value).toBeDefined()
    expect(Math.abs(f!.measured!.value - expectedPercent) / expectedPercent).toBeLessThan(0.01)
    expect(f!.limit).toEqual({ value: 3, unit: '%' })
  })

  it('passes as a non-critical circuit (10 %)', () => {
    const design = simpleBranch({ sizeId: 'awg-14', lengthM: 6, load: { model: 'current', currentA: 6, critical: false } })
    expect(analyzeDesign(design).findings.filter((x) => x.ruleId === 'voltage-drop')).toEqual([])
  })
})

describe('fault current of a 24 V LFP bank through 2 m of 2/0 AWG (hand-worked)', () => {
  // Bank: two 12.8 V LFP modules in series, 2 mΩ each → EMF 25.6 V, R_bank = 2 × 0.002 = 0.004 Ω
  // (standards.md §7: Isc ≈ E / (R_int + R_ext); series strings add resistance).
  // bank + → 0.15 m 2/0 → Class T fuse (0.1 mΩ) → 2 m 2/0 → inverter + ; inverter − → 2 m 2/0 → bank −.
  //  2/0 AWG, Table 8: 0.0967 Ω/kft at 75 °C → at 30 °C 0.0967 / 304.8 × 0.85465 = 2.7115e-4 Ω/m
  //  R(0.15 m) = 4.067e-5 Ω; R(2 m) = 5.423e-4 Ω
  //  fault at the fuse's load terminal (return path ignored, the interrupting-rating case):
  //    R = 0.004 + 4.067e-5 + 1e-4 = 4.1407e-3 Ω → I = 25.6 / 4.1407e-3 = 6183 A
  //  fault across the inverter terminals (far end of the 2 m conductor, return included):
  //    R = 4.1407e-3 + 2 × 5.423e-4 = 5.2253e-3 Ω → I = 25.6 / 5.2253e-3 = 4899 A
  const s = settingsFor('vehicle', 24)
  const design = designOf({
    profile: 'vehicle', nominalVoltageV: 24,
    parts: [
      part('battery', 'bank', { chemistry: 'lfp', nominalVoltageV: 12.8, internalResistanceOhm: 0.002, seriesCount: 2, parallelCount: 1 }, s),
      part('fuse', 'main', { family: 'class-t', ratingA: 250, dcVoltageRatingV: 125, interruptingRatingA: 20000, resistanceOhm: 0.0001 }, s),
      part('inverter', 'inv', { continuousW: 2000, surgeW: 4000, efficiency: 0.9 }, s),
    ],
    conductors: [
      wire('c1', 'bank.pos', 'main.line', 'awg-2/0', 0.15),
      wire('c2', 'main.load', 'inv.pos', 'awg-2/0', 2),
      wire('c3', 'inv.neg', 'bank.neg', 'awg-2/0', 2),
    ],
  })
  const r2m = 2 * necOhmPerM(0.0967, 30)
  const atFuse = 25.6 / (0.004 + 0.15 * necOhmPerM(0.0967, 30) + 1e-4)
  const farEnd = 25.6 / (0.004 + 0.15 * necOhmPerM(0.0967, 30) + 1e-4 + 2 * r2m)
  const result = analyzeDesign(design)

  it('gives the device fault current within 0.5 %', () => {
    expect(atFuse).toBeCloseTo(6183, -1)
    const device = result.devices.find((d) => d.id === 'main')!
    expect(Math.abs(device.faultCurrentA - atFuse) / atFuse).toBeLessThan(0.005)
  })

  it('gives the far-end fault current within 0.5 %', () => {
    expect(farEnd).toBeCloseTo(4899, -1)
    const c2 = result.conductors.find((c) => c.id === 'c2')!
    expect(Math.abs(c2.faultCurrentFarEndA - farEnd) / farEnd).toBeLessThan(0.005)
    expect(c2.protectingDeviceId).toBe('main')
  })

  it('flags a 2 kA device at that spot and passes the 20 kA Class T', () => {
    expect(result.findings.filter((f) => f.ruleId === 'device-interrupting-rating')).toEqual([])
    const weak = designOf({ ...{ profile: 'vehicle' as const, nominalVoltageV: 24 as const }, parts: design.parts.map((p) => p.id === 'main' ? { ...p, params: { ...p.params, interruptingRatingA: 2000 } } as typeof p : p), conductors: design.conductors })
    const f = analyzeDesign(weak).findings.find((x) => x.ruleId === 'device-interrupting-rating')!
    expect(f.partIds).toEqual(['main'])
    expect(f.limit).toEqual({ value: 2000, unit: 'A' })
    expect(Math.abs(f.measured!.value - atFuse) / atFuse).toBeLessThan(0.005)
  })
})
