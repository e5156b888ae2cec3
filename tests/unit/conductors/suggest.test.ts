import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { dropTemperatureC, smallestPassingSize, type SuggestInput } from '@shared/conductors/suggest'
import { conductorAmpacityA } from '@shared/conductors/ampacity'
import { circuitDrop } from '@shared/conductors/voltageDrop'
import { getConductorSize, sizesInOrder } from '@shared/conductors/sizes'

const base: SuggestInput = {
  currentA: 20, lengthM: 6, allowedDropPercent: 10, nominalV: 12, material: 'copper', insulationRatingC: 105,
  ambientC: 30, installation: 'free-air', bundledCount: 1, profile: 'marine', system: 'awg',
}
const pick = (patch: Partial<SuggestInput>) => smallestPassingSize({ ...base, ...patch })

describe('smallestPassingSize', () => {
  it.each([
    // [patch, size, which limit governs]
    [{}, 'awg-10', 'drop: 10 AWG gives 6.95 % ≤ 10 % (see the voltageDrop worked example); 12 AWG gives 11.05 %'],
    [{ allowedDropPercent: 3 }, 'awg-6', 'drop: 3 % needs 6 AWG (2.75 %)'],
    [{ lengthM: 0.5 }, 'awg-16', 'minimum size: 18 AWG would carry 20 A (Table 5) at 3.7 % drop, but 33 CFR 183.425(e) asks ≥ 16 AWG'],
    [{ lengthM: 0.5, minSizeId: 'awg-18' }, 'awg-18', 'inside a sheath 18 AWG is allowed: 20 A ≤ 20 A (Table 5, 105 °C)'],
    [{ lengthM: 0.5, minSizeId: 'awg-18', installation: 'engine-space' }, 'awg-16', 'ampacity: 18 AWG in an engine space is 20 × 0.85 = 17 A < 20 A; 16 AWG 25 × 0.85 = 21.25 A'],
    [{ lengthM: 0.5, minSizeId: 'awg-18', installation: 'engine-space', bundledCount: 3 }, 'awg-14', 'ampacity: 16 AWG 25 × 0.85 × 0.7 = 14.9 A < 20 A; 14 AWG 35 × 0.85 × 0.7 = 20.8 A (the cable maker\'s derived table prints 20.8 A)'],
    [{ currentA: 100, lengthM: 1, profile: 'building', insulationRatingC: 75 }, 'awg-3', 'ampacity: NEC 75 °C 3 AWG = 100 A'],
    [{ currentA: 12, lengthM: 3, system: 'metric', allowedDropPercent: 3 }, 'mm2-4', 'drop: ≤ 0.36 V over a 6 m loop needs ≤ 5 mΩ/m; 4 mm² is 4.61 × 1.0393 = 4.79 mΩ/m at 30 °C, 2.5 mm² 7.70'],
  ] as const)('%o → %s (%s)', (patch, sizeId, _why) => {
    expect(pick(patch as Partial<SuggestInput>)?.sizeId).toBe(sizeId)
  })

  it('uses 75 °C conductors for building drop and the ambient for boats and vehicles', () => {
    expect(dropTemperatureC('building', 30)).toBe(75)
    expect(dropTemperatureC('marine', 40)).toBe(40)
    expect(pick({ profile: 'building', insulationRatingC: 90 })?.conductorTemperatureC).toBe(75)
    expect(pick({ conductorTemperatureC: 90 })?.conductorTemperatureC).toBe(90)
  })

  it('property: the result meets both limits and the next smaller size misses one', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 200, noNaN: true }), fc.double({ min: 0.3, max: 10, noNaN: true }),
        fc.constantFrom(3, 10), fc.constantFrom('marine', 'building', 'vehicle' as const), fc.constantFrom('awg', 'metric' as const),
        fc.constantFrom('free-air', 'engine-space', 'bundled' as const), fc.integer({ min: 1, max: 8 }),
        (currentA, lengthM, allowedDropPercent, profile, system, installation, bundledCount) => {
          const input: SuggestInput = { ...base, currentA, lengthM, allowedDropPercent, profile, system, installation, bundledCount, insulationRatingC: 90 }
          const r = smallestPassingSize({ ...input, minSizeId: system === 'awg' ? 'awg-18' : 'mm2-0.75' })
          const t = dropTemperatureC(profile, input.ambientC)
          const passes = (sizeId: never) => {
            const a = conductorAmpacityA({ ...input, sizeId }).ampacityA
            const d = circuitDrop({ currentA, sizeId, material: 'copper', lengthM, temperatureC: t, nominalV: 12 }).dropPercent
            return a !== null && a >= currentA && d <= allowedDropPercent
          }
          if (!r) return sizesInOrder(system).every((s) => !passes(s.id as never))
          if (!passes(r.sizeId as never)) return false
          const rank = getConductorSize(r.sizeId).rank
          return sizesInOrder(system).slice(0, rank).every((s) => !passes(s.id as never))
        },
      ),
      { numRuns: 200 },
    )
  })

  describe('edge cases', () => {
    it('returns null when no size carries the current', () => {
      expect(pick({ currentA: 2000, lengthM: 1 })).toBeNull()
    })
    it('aluminium on a boat has no passing size (Table 5 is copper only)', () => {
      expect(pick({ material: 'aluminium' })).toBeNull()
    })
    it.each([
      [{ currentA: -1 }, /currentA/],
      [{ allowedDropPercent: 0 }, /allowedDropPercent/],
      [{ nominalV: 0 }, /nominalV/],
      [{ lengthM: NaN }, /lengthM/],
      [{ minSizeId: 'mm2-4' }, /minSizeId: must be a awg size/],
    ])('rejects %o', (patch, message) => expect(() => pick(patch as Partial<SuggestInput>)).toThrow(message))
  })
})
