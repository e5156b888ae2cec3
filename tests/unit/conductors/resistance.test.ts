import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import {
  AWG_COATED_TO_PLAIN_RATIO, conductorResistanceOhm, resistanceBasis, resistancePerMetreOhm, STRANDING_LAY_FACTOR,
} from '@shared/conductors/resistance'
import { CONDUCTOR_SIZE_IDS, sizesInOrder } from '@shared/conductors/sizes'
import { MATERIAL_IDS } from '@shared/conductors/materials'

const sizeArb = fc.constantFrom(...CONDUCTOR_SIZE_IDS)
const materialArb = fc.constantFrom(...MATERIAL_IDS)

describe('conductorResistanceOhm', () => {
  it('worked example: 10 AWG copper, 6 m one-way, 30 °C', () => {
    // d = 0.127 mm × 92^((36 − 10)/39) = 2.58819 mm                     (ASTM B258)
    // A = π/4 × d² = 5.26115 mm²
    // ρ30 = (1/58) × (1 + 0.00393 × (30 − 20)) = 0.0179190 Ω·mm²/m       (IEC 60028)
    // R/m = ρ30 / A × 1.02 (lay factor) = 0.0034059 × 1.02 = 0.00347402 Ω/m
    // R = 0.00347402 × 6 = 0.0208441 Ω
    const r = conductorResistanceOhm({ sizeId: 'awg-10', material: 'copper', lengthM: 6, temperatureC: 30 })
    expect(r).toBeCloseTo(0.0208441, 6)
  })

  it('worked example: 2.5 mm² copper class 2, 10 m, 20 °C = IEC 60228 maximum 7.41 Ω/km × 0.010 km', () => {
    expect(conductorResistanceOhm({ sizeId: 'mm2-2.5', material: 'copper', lengthM: 10, temperatureC: 20 })).toBeCloseTo(0.0741, 6)
  })

  it('worked example: 16 mm² tinned class 5 at 60 °C: 1.24 Ω/km × (1 + 0.00393 × 40) = 1.43493 Ω/km', () => {
    const r = conductorResistanceOhm({ sizeId: 'mm2-16', material: 'tinned-copper', lengthM: 1000, temperatureC: 60, iecClass: 5 })
    expect(r).toBeCloseTo(1.24 * 1.1572, 6)
  })

  it('worked example: 35 mm² aluminium at 20 °C = 0.524 Ω/km × 0.028264 × 58 (ρAl/ρCu)', () => {
    const r = conductorResistanceOhm({ sizeId: 'mm2-35', material: 'aluminium', lengthM: 1000, temperatureC: 20 })
    expect(r).toBeCloseTo(0.524 * 0.028264 * 58, 6)
  })

  it('SAE J1127/J1128 cable of the same gauge number has less copper, so more resistance (10 AWG: 10 383 ÷ 9 343 cmil)', () => {
    const astm = conductorResistanceOhm({ sizeId: 'awg-10', material: 'copper', lengthM: 1, temperatureC: 20 })
    const sae = conductorResistanceOhm({ sizeId: 'awg-10', material: 'copper', lengthM: 1, temperatureC: 20, gaugeStandard: 'sae-j1128' })
    expect(sae / astm).toBeCloseTo(10383 / 9343, 3)
  })

  it.each([
    ['awg-4/0', 'copper'],
    ['awg-18', 'tinned-copper'],
    ['mm2-50', 'aluminium'],
  ] as const)('basis for %s %s names its method and source', (size, material) => {
    const b = resistanceBasis(size, material)
    expect(b.ohmPerMAt20).toBeGreaterThan(0)
    expect(b.method).not.toBe('')
    expect(b.source).toMatch(/IEC|NEC|ASTM/)
  })

  it('constants are the documented ones', () => {
    expect(STRANDING_LAY_FACTOR).toBe(1.02)
    expect(AWG_COATED_TO_PLAIN_RATIO).toBe(1.05)
  })

  describe('properties', () => {
    it('is proportional to length', () => {
      fc.assert(
        fc.property(sizeArb, materialArb, fc.double({ min: 0, max: 1000, noNaN: true }), fc.double({ min: -40, max: 150, noNaN: true }), (sizeId, material, lengthM, temperatureC) => {
          const r1 = conductorResistanceOhm({ sizeId, material, lengthM: 1, temperatureC })
          const r = conductorResistanceOhm({ sizeId, material, lengthM, temperatureC })
          return Math.abs(r - r1 * lengthM) <= 1e-12 * Math.max(1, r)
        }),
      )
    })
    it('rises strictly with temperature', () => {
      fc.assert(
        fc.property(sizeArb, materialArb, fc.double({ min: -60, max: 200, noNaN: true }), fc.double({ min: 0.1, max: 50, noNaN: true }), (sizeId, material, t, dt) =>
          conductorResistanceOhm({ sizeId, material, lengthM: 10, temperatureC: t + dt }) >
          conductorResistanceOhm({ sizeId, material, lengthM: 10, temperatureC: t }),
        ),
      )
    })
    it('falls strictly as the size grows, in both systems', () => {
      for (const system of ['awg', 'metric'] as const)
        for (const material of MATERIAL_IDS) {
          const rs = sizesInOrder(system).map((s) => resistancePerMetreOhm({ sizeId: s.id, material, temperatureC: 25 }))
          rs.slice(1).forEach((r, i) => expect(r).toBeLessThan(rs[i]))
        }
    })
    it('orders materials: copper < tinned copper < aluminium for every size', () => {
      for (const sizeId of CONDUCTOR_SIZE_IDS) {
        const [cu, sn, al] = MATERIAL_IDS.map((material) => resistancePerMetreOhm({ sizeId, material, temperatureC: 20 }))
        expect(cu).toBeLessThan(sn)
        expect(sn).toBeLessThan(al)
      }
    })
  })

  describe('edge cases', () => {
    it('zero length is zero ohms', () => {
      expect(conductorResistanceOhm({ sizeId: 'awg-8', material: 'copper', lengthM: 0, temperatureC: 20 })).toBe(0)
    })
    it.each([
      [{ lengthM: -1 }, /lengthM: must not be negative/],
      [{ lengthM: NaN }, /lengthM: must be a finite number/],
      [{ lengthM: Infinity }, /lengthM: must be a finite number/],
      [{ temperatureC: NaN }, /temperatureC: must be a finite number/],
      [{ temperatureC: -300 }, /temperatureC: must be between/],
      [{ temperatureC: 1000 }, /temperatureC: must be between/],
      [{ sizeId: 'awg-13' }, /Unknown conductor size/],
      [{ material: 'gold' }, /Unknown conductor material/],
      [{ sizeId: 'awg-3', gaugeStandard: 'sae-j1128' }, /gaugeStandard: no SAE J1127\/J1128 area on file for 3 AWG/],
    ])('rejects %o', (patch, message) => {
      const input = { sizeId: 'awg-10', material: 'copper', lengthM: 1, temperatureC: 20, ...patch } as never
      expect(() => conductorResistanceOhm(input)).toThrow(message)
    })
    it('at −40 °C a copper conductor has 76.4 % of its 20 °C resistance (1 − 0.00393 × 60)', () => {
      const cold = resistancePerMetreOhm({ sizeId: 'awg-2', material: 'copper', temperatureC: -40 })
      const warm = resistancePerMetreOhm({ sizeId: 'awg-2', material: 'copper', temperatureC: 20 })
      expect(cold / warm).toBeCloseTo(0.7642, 4)
    })
  })
})
