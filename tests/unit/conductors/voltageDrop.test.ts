import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { circuitDrop, dropPercent, smallestSizeForDrop, VOLTAGE_DROP_LIMITS, voltageDropV } from '@shared/conductors/voltageDrop'
import { getConductorSize } from '@shared/conductors/sizes'

describe('voltage drop', () => {
  it('worked example: 20 A over 6 m one-way of 10 AWG copper at 30 °C, 12 V system', () => {
    // area:  d = 0.127 mm × 92^(26/39) = 2.58819 mm;  A = π/4 × d² = 5.26115 mm²           (ASTM B258)
    // ρ:     ρ30 = (1/58) × (1 + 0.00393 × 10) = 0.0179190 Ω·mm²/m                         (IEC 60028)
    // R/m:   0.0179190 / 5.26115 × 1.02 (stranding) = 0.00347402 Ω/m
    // loop:  2 × 6 m = 12 m  →  R = 12 × 0.00347402 = 0.0416882 Ω
    // drop:  20 A × 0.0416882 Ω = 0.833764 V
    // %:     0.833764 / 12 × 100 = 6.948 %  → passes 10 % (non-critical), fails 3 % (critical)
    const d = circuitDrop({ currentA: 20, sizeId: 'awg-10', material: 'copper', lengthM: 6, temperatureC: 30, nominalV: 12 })
    expect(getConductorSize('awg-10').areaMm2).toBeCloseTo(5.26115, 5)
    expect(d.loopResistanceOhm).toBeCloseTo(0.0416882, 6)
    expect(d.dropV).toBeCloseTo(0.833764, 5)
    expect(d.dropPercent).toBeCloseTo(6.948, 3)
  })

  it('worked example, ABYC method cross-check: CM = K × I × L / E with K = 10.75, L round trip in ft', () => {
    // 20 A, round trip 12 m = 39.37 ft, E = 3 % of 12 V = 0.36 V
    // CM = 10.75 × 20 × 39.37 / 0.36 = 23 512 cmil → next AWG up is 6 AWG (26 251 cmil)
    const cm = (10.75 * 20 * (12 / 0.3048)) / 0.36
    expect(cm).toBeCloseTo(23512, -1)
    const ours = smallestSizeForDrop({ currentA: 20, lengthM: 6, temperatureC: 30, nominalV: 12, allowedDropPercent: 3, material: 'copper', system: 'awg' })
    expect(ours?.sizeId).toBe('awg-6')
    // 6 AWG: R/m at 30 °C = 0.0179190 / 13.3018 × 1.02 = 0.00137405 Ω/m; × 12 m × 20 A = 0.32977 V = 2.748 %
    expect(ours?.dropV).toBeCloseTo(0.32977, 4)
    expect(ours?.dropPercent).toBeCloseTo(2.748, 3)
  })

  it('worked example, metric: 10 A over 5 m of 2.5 mm² copper class 2 at 20 °C, 24 V', () => {
    // R = 7.41 Ω/km (IEC 60228 max) × 0.010 km loop = 0.0741 Ω;  drop = 0.741 V;  3.0875 % of 24 V
    const d = circuitDrop({ currentA: 10, sizeId: 'mm2-2.5', material: 'copper', lengthM: 5, temperatureC: 20, nominalV: 24 })
    expect(d.dropV).toBeCloseTo(0.741, 9)
    expect(d.dropPercent).toBeCloseTo(3.0875, 9)
    expect(smallestSizeForDrop({ currentA: 10, lengthM: 5, temperatureC: 20, nominalV: 24, allowedDropPercent: 3, material: 'copper', system: 'metric' })?.sizeId).toBe('mm2-4')
  })

  it.each([
    [5, 0.1, 0.5],
    [0, 1, 0],
    [-5, 0.1, 0.5], // direction does not matter
  ])('voltageDropV(%f A, %f Ω) = %f V', (currentA, resistanceOhm, v) => expect(voltageDropV({ currentA, resistanceOhm })).toBeCloseTo(v, 12))

  it.each([
    [0.36, 12, 3],
    [1.2, 12, 10],
    [0.72, 24, 3],
    [2.4, 48, 5],
  ])('dropPercent(%f V, %f V) = %f %', (v, n, p) => expect(dropPercent(v, n)).toBeCloseTo(p, 12))

  it('limits per profile carry their sources and status', () => {
    expect(VOLTAGE_DROP_LIMITS.marine).toMatchObject({ critical: { percent: 3 }, general: { percent: 10 }, status: 'verified' })
    expect(VOLTAGE_DROP_LIMITS.marine.source).toMatch(/ABYC E-11.*ISO 10133/)
    expect(VOLTAGE_DROP_LIMITS.vehicle.status).toBe('common practice')
    expect(VOLTAGE_DROP_LIMITS.building).toMatchObject({ critical: { percent: 3 }, general: { percent: 5 }, status: 'informational note, recalled' })
    expect(VOLTAGE_DROP_LIMITS.building.source).toMatch(/210\.19\(A\) informational note/)
  })

  it('property: the chosen size passes and the next smaller one fails', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 150, noNaN: true }), fc.double({ min: 0.5, max: 15, noNaN: true }),
        fc.constantFrom(12, 24, 48), fc.constantFrom(3, 10), fc.constantFrom('awg', 'metric' as const),
        (currentA, lengthM, nominalV, allowedDropPercent, system) => {
          const common = { currentA, lengthM, temperatureC: 30, nominalV, material: 'copper' as const }
          const r = smallestSizeForDrop({ ...common, allowedDropPercent, system })
          if (!r) return circuitDrop({ ...common, sizeId: system === 'awg' ? 'awg-4/0' : 'mm2-120' }).dropPercent > allowedDropPercent
          const size = getConductorSize(r.sizeId)
          if (r.dropPercent > allowedDropPercent) return false
          if (size.rank === 0) return true
          const smaller = (system === 'awg' ? ['awg-18', 'awg-16', 'awg-14', 'awg-12', 'awg-10', 'awg-8', 'awg-6', 'awg-4', 'awg-3', 'awg-2', 'awg-1', 'awg-1/0', 'awg-2/0', 'awg-3/0'] : ['mm2-0.75', 'mm2-1', 'mm2-1.5', 'mm2-2.5', 'mm2-4', 'mm2-6', 'mm2-10', 'mm2-16', 'mm2-25', 'mm2-35', 'mm2-50', 'mm2-70', 'mm2-95'])[size.rank - 1]
          return circuitDrop({ ...common, sizeId: smaller as never }).dropPercent > allowedDropPercent
        },
      ),
    )
  })

  describe('edge cases', () => {
    it('rejects a zero or negative nominal voltage instead of returning Infinity or NaN', () => {
      expect(() => dropPercent(1, 0)).toThrow(/nominalV: must be greater than zero/)
      expect(() => dropPercent(1, -12)).toThrow(/nominalV/)
      expect(() => dropPercent(NaN, 12)).toThrow(/dropV/)
    })
    it('rejects a negative resistance or non-finite current', () => {
      expect(() => voltageDropV({ currentA: 1, resistanceOhm: -1 })).toThrow(/resistanceOhm/)
      expect(() => voltageDropV({ currentA: Infinity, resistanceOhm: 1 })).toThrow(/currentA/)
    })
    it('returns null when even the largest size cannot meet the allowance', () => {
      expect(smallestSizeForDrop({ currentA: 500, lengthM: 100, temperatureC: 30, nominalV: 12, allowedDropPercent: 3, material: 'copper', system: 'awg' })).toBeNull()
    })
    it('rejects a zero allowance', () => {
      expect(() => smallestSizeForDrop({ currentA: 5, lengthM: 1, temperatureC: 30, nominalV: 12, allowedDropPercent: 0, material: 'copper', system: 'awg' })).toThrow(/allowedDropPercent/)
    })
    it('zero current needs the smallest size', () => {
      expect(smallestSizeForDrop({ currentA: 0, lengthM: 10, temperatureC: 30, nominalV: 12, allowedDropPercent: 3, material: 'copper', system: 'awg' })?.sizeId).toBe('awg-18')
    })
  })
})
