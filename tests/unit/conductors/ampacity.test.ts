import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { ampacityInputSchema, conductorAmpacityA, type AmpacityInput } from '@shared/conductors/ampacity'
import { sizesInOrder } from '@shared/conductors/sizes'
import { CODE_PROFILES, INSTALLATIONS, INSULATION_RATINGS_C } from '@shared/conductors/profiles'

const base: AmpacityInput = {
  sizeId: 'awg-10', material: 'copper', insulationRatingC: 90, ambientC: 30, installation: 'free-air', bundledCount: 1, profile: 'building',
}
const amp = (patch: Partial<AmpacityInput>) => conductorAmpacityA({ ...base, ...patch })

describe('conductorAmpacityA — building (NEC 310.16 × 310.15 factors)', () => {
  it.each([
    // [patch, expected A, how]
    [{}, 40, 'Table 310.16 Cu 10 AWG 90 °C'],
    [{ insulationRatingC: 75 }, 35, '75 °C column'],
    [{ insulationRatingC: 60 }, 30, '60 °C column'],
    [{ installation: 'conduit', bundledCount: 4 }, 32, '40 × 0.80 (4–6 conductors)'],
    [{ installation: 'conduit', bundledCount: 3 }, 40, 'no adjustment up to 3'],
    [{ ambientC: 40 }, 36.4, '40 × 0.91 (36–40 °C band, 90 °C)'],
    [{ ambientC: 40, installation: 'bundled', bundledCount: 9 }, 40 * 0.91 * 0.7, 'both factors multiply'],
    [{ ambientC: 10 }, 46, '40 × 1.15 (≤10 °C band): cooler ambient raises the ampacity'],
    [{ material: 'aluminium' }, 35, 'Al 10 AWG 90 °C'],
    [{ material: 'tinned-copper' }, 40, 'coated copper reads the copper table'],
  ] as const)('%o → %f A (%s)', (patch, expected, _why) => {
    expect(amp(patch as Partial<AmpacityInput>).ampacityA).toBeCloseTo(expected, 9)
  })

  it('reads insulation above 90 °C in the 90 °C column and says so', () => {
    const r = amp({ insulationRatingC: 105 })
    expect(r.ampacityA).toBe(40)
    expect(r.columnC).toBe(90)
    expect(r.notes.join(' ')).toMatch(/105 °C read in the 90 °C column/)
  })

  it('maps metric sizes to the AWG row of largest area not above them, and says so', () => {
    const r = amp({ sizeId: 'mm2-6' })
    expect(r.rowSizeId).toBe('awg-10')
    expect(r.ampacityA).toBe(40)
    expect(r.notes.join(' ')).toMatch(/6 mm² read on the 10 AWG row/)
  })

  it('lists each applied factor with a source', () => {
    const r = amp({ ambientC: 45, installation: 'conduit', bundledCount: 12 })
    expect(r.factors.map((f) => f.value)).toEqual([0.87, 0.5])
    for (const f of r.factors) expect(f.source).toMatch(/NEC Table 310\.15/)
    expect(r.table).toMatch(/310\.16/)
  })
})

describe('conductorAmpacityA — marine and vehicle (33 CFR 183.425 Table 5)', () => {
  const boat = (patch: Partial<AmpacityInput>) => amp({ profile: 'marine', insulationRatingC: 105, ...patch })
  it.each([
    [{}, 60, 'Table 5, 10 AWG 105 °C'],
    [{ installation: 'engine-space' }, 51, '60 × 0.85 (Note 1, 105 °C)'],
    [{ bundledCount: 3 }, 42, '60 × 0.70'],
    [{ bundledCount: 5, installation: 'engine-space' }, 60 * 0.85 * 0.6, 'engine space and bundle'],
    [{ bundledCount: 2 }, 60, 'two conductors: no factor'],
    [{ ambientC: 20 }, 60, 'no credit below 30 °C'],
    [{ ambientC: 45 }, 60 * Math.sqrt(60 / 75), '√((105 − 45)/(105 − 30)) above 30 °C outside engine spaces'],
    [{ ambientC: 105 }, 0, 'ambient at the insulation rating'],
    [{ profile: 'vehicle' }, 60, 'vehicle uses the same table'],
  ] as const)('%o → %f A (%s)', (patch, expected, _why) => {
    expect(boat(patch as Partial<AmpacityInput>).ampacityA).toBeCloseTo(expected, 9)
  })

  it('below 50 V the bundling source is marked as our conservative choice; at 50 V and above it is the USCG rule', () => {
    const low = boat({ bundledCount: 4, circuitVoltageV: 12 }).factors[0]
    const high = boat({ bundledCount: 4, circuitVoltageV: 58 }).factors[0]
    expect(low.value).toBe(0.6)
    expect(high.value).toBe(0.6)
    expect(low.source).toMatch(/no bundling limit below 50 V.*conservative choice/)
    expect(high.source).not.toMatch(/conservative choice/)
  })

  it('an engine space hotter than 50 °C is corrected further by the formula', () => {
    const r = boat({ installation: 'engine-space', ambientC: 70 })
    expect(r.ampacityA).toBeCloseTo(60 * Math.sqrt(35 / 75), 9)
  })

  it('vehicle results carry the common-practice note', () => {
    expect(boat({ profile: 'vehicle' }).notes.join(' ')).toMatch(/common practice/)
  })

  it('aluminium is not allowed on boats (183.425(a))', () => {
    const r = boat({ material: 'aluminium' })
    expect(r.ampacityA).toBeNull()
    expect(r.unavailableReason).toMatch(/stranded copper/)
  })
})

describe('properties', () => {
  const inputs = fc.record({
    material: fc.constantFrom('copper', 'tinned-copper', 'aluminium' as const),
    insulationRatingC: fc.constantFrom(...INSULATION_RATINGS_C),
    ambientC: fc.integer({ min: -20, max: 90 }),
    installation: fc.constantFrom(...INSTALLATIONS),
    bundledCount: fc.integer({ min: 1, max: 50 }),
    profile: fc.constantFrom(...CODE_PROFILES),
    system: fc.constantFrom('awg', 'metric' as const),
  })
  it('never decreases as the size grows', () => {
    fc.assert(
      fc.property(inputs, ({ system, ...rest }) => {
        let last = -1
        for (const s of sizesInOrder(system)) {
          const a = conductorAmpacityA({ ...rest, sizeId: s.id }).ampacityA
          if (a === null) continue
          if (a < last) return false
          last = a
        }
        return true
      }),
    )
  })
  it('never increases with more conductors or a hotter ambient, and is never NaN or negative', () => {
    fc.assert(
      fc.property(inputs, fc.integer({ min: 1, max: 20 }), fc.integer({ min: 1, max: 30 }), ({ system, ...rest }, extra, hotter) => {
        const sizeId = sizesInOrder(system)[5].id
        const a = conductorAmpacityA({ ...rest, sizeId }).ampacityA
        const more = conductorAmpacityA({ ...rest, sizeId, bundledCount: rest.bundledCount + extra }).ampacityA
        const hot = conductorAmpacityA({ ...rest, sizeId, ambientC: rest.ambientC + hotter }).ampacityA
        if (a === null) return more === null && hot === null
        return Number.isFinite(a) && a >= 0 && more! <= a + 1e-9 && hot! <= a + 1e-9
      }),
    )
  })
})

describe('edge cases', () => {
  it('18 AWG copper has no 60/75 °C value in Table 310.16', () => {
    const r = amp({ sizeId: 'awg-18', insulationRatingC: 75 })
    expect(r.ampacityA).toBeNull()
    expect(r.unavailableReason).toMatch(/no 75 °C value for 18 AWG/)
  })
  it('aluminium below 12 AWG is not in the table', () => {
    expect(amp({ sizeId: 'awg-14', material: 'aluminium' }).ampacityA).toBeNull()
  })
  it('0.75 mm² is smaller than every row', () => {
    for (const profile of CODE_PROFILES) expect(amp({ sizeId: 'mm2-0.75', profile }).unavailableReason).toMatch(/smaller than the smallest row/)
  })
  it('a 60 °C conductor in a 56 °C ambient gets 0 A (the table shows "–")', () => {
    expect(amp({ insulationRatingC: 60, ambientC: 56 }).ampacityA).toBe(0)
  })
  it('a fractional ambient reads the next band up (30.5 °C → 31–35)', () => {
    expect(amp({ ambientC: 30.5 }).ampacityA).toBeCloseTo(40 * 0.96, 9)
  })
  it.each([
    [{ ambientC: NaN }, /ambientC: must be a finite number/],
    [{ ambientC: 200 }, /ambientC: must be between/],
    [{ bundledCount: 0 }, /bundledCount/],
    [{ bundledCount: 2.5 }, /bundledCount/],
    [{ insulationRatingC: 70 }, /insulationRatingC/],
    [{ installation: 'buried' }, /installation/],
    [{ profile: 'aircraft' }, /profile/],
    [{ sizeId: 'awg-0' }, /Unknown conductor size/],
    [{ material: 'silver' }, /material: must be one of copper, tinned-copper, aluminium/],
  ])('rejects %o with a message naming the field', (patch, message) => {
    expect(() => amp(patch as never)).toThrow(message)
  })
  it('the input schema accepts a good input and names the bad field', () => {
    expect(ampacityInputSchema.safeParse(base).success).toBe(true)
    const bad = ampacityInputSchema.safeParse({ ...base, ambientC: 'hot' })
    expect(bad.success).toBe(false)
    expect(bad.error?.issues[0].path).toEqual(['ambientC'])
  })
})
