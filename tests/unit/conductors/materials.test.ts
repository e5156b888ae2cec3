import { describe, expect, it } from 'vitest'
import { getMaterial, MATERIAL_IDS, MATERIALS, materialSchema, resistivityOhmMm2PerM, TINNED_TO_PLAIN_RESISTANCE_RATIO } from '@shared/conductors/materials'

describe('conductor materials', () => {
  it.each([
    // IEC 60028 annealed copper: 1/58 Ω·mm²/m, α20 0.00393
    ['copper', 1 / 58, 0.00393],
    // copper × 1.02 (IEC 60228 metal-coated/plain ratio, computed)
    ['tinned-copper', 1.02 / 58, 0.00393],
    // aluminium 61 % IACS: 1/(58 × 0.61)
    ['aluminium', 0.028264, 0.00403],
  ] as const)('%s: ρ20 %f Ω·mm²/m, α20 %f /°C', (id, rho, alpha) => {
    expect(MATERIALS[id].resistivity20OhmMm2PerM).toBeCloseTo(rho, 7)
    expect(MATERIALS[id].alpha20PerC).toBe(alpha)
    expect(MATERIALS[id].source.length).toBeGreaterThan(10)
  })

  it('aluminium is 61 % IACS within 0.01 %', () => {
    expect(1 / 58 / MATERIALS.aluminium.resistivity20OhmMm2PerM).toBeCloseTo(0.61, 4)
  })

  it('copper resistivity in Ω·cmil/ft is 10.371 at 20 °C (standards.md §2 [C])', () => {
    // Ω·mm²/m → Ω·cmil/ft: divide by mm² per cmil, multiply by m per ft
    expect((1 / 58 / 5.067075e-4) * 0.3048).toBeCloseTo(10.371, 3)
  })

  it('ρ(75 °C)/ρ(20 °C) for copper is 1.21615 (0.00393 × 55), the NEC Table 8 basis', () => {
    expect(resistivityOhmMm2PerM('copper', 75) / resistivityOhmMm2PerM('copper', 20)).toBeCloseTo(1.21615, 5)
  })

  it('the NEC Table 8 note α75 = 0.00323 (Cu), 0.00330 (Al) follows from α20 re-based to 75 °C', () => {
    // α75 = α20 / (1 + α20 × 55)
    expect(0.00393 / (1 + 0.00393 * 55)).toBeCloseTo(0.00323, 5)
    const a = MATERIALS.aluminium.alpha20PerC
    expect(a / (1 + a * 55)).toBeCloseTo(0.0033, 4)
  })

  it('tinned ratio stays inside the IEC 60228 band it was drawn from', () => {
    expect(TINNED_TO_PLAIN_RESISTANCE_RATIO).toBeGreaterThanOrEqual(1.005)
    expect(TINNED_TO_PLAIN_RESISTANCE_RATIO).toBeLessThanOrEqual(1.03)
  })

  describe('edge cases', () => {
    it('rejects unknown materials', () => {
      expect(materialSchema.safeParse('silver').success).toBe(false)
      expect(() => getMaterial('silver' as never)).toThrow(/Unknown conductor material "silver"/)
      expect(MATERIAL_IDS).toEqual(['copper', 'tinned-copper', 'aluminium'])
    })
    it('resistivity at 20 °C equals ρ20 exactly', () => {
      for (const id of MATERIAL_IDS) expect(resistivityOhmMm2PerM(id, 20)).toBe(MATERIALS[id].resistivity20OhmMm2PerM)
    })
  })
})
