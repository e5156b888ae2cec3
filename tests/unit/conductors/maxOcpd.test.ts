import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { maxOcpdA, type MaxOcpdInput } from '@shared/conductors/maxOcpd'
import { NEC_STANDARD_RATINGS_A } from '@shared/protection/ratings'

const base: MaxOcpdInput = { sizeId: 'awg-8', material: 'copper', ampacityA: 50, profile: 'building' }
const max = (patch: Partial<MaxOcpdInput>) => maxOcpdA({ ...base, ...patch })

describe('maxOcpdA — building (NEC 240.4)', () => {
  it.each([
    // [patch, max rating, why]
    [{}, 50, 'ampacity 50 A is itself a standard rating'],
    [{ ampacityA: 52 }, 60, '240.4(B): next higher standard rating (52 → 60)'],
    [{ ampacityA: 32 }, 35, '240.4(B): 32 → 35'],
    [{ sizeId: 'awg-12', ampacityA: 30 }, 20, '240.4(D): 12 AWG Cu ≤ 20 A although Table 310.16 gives 30 A at 90 °C'],
    [{ sizeId: 'awg-12', material: 'aluminium', ampacityA: 25 }, 15, '240.4(D): 12 AWG Al ≤ 15 A'],
    [{ sizeId: 'awg-14', ampacityA: 25 }, 15, '240.4(D): 14 AWG Cu ≤ 15 A'],
    [{ sizeId: 'awg-18', ampacityA: 14 }, 6, '240.4(D): 18 AWG Cu ≤ 7 A → largest 240.6(A) rating ≤ 7 is the 6 A fuse'],
    [{ sizeId: 'awg-16', ampacityA: 18 }, 10, '240.4(D): 16 AWG Cu ≤ 10 A'],
    [{ sizeId: 'awg-10', ampacityA: 32 }, 30, '240.4(D) caps the 240.4(B) step (35 A) at 30 A'],
    [{ sizeId: 'awg-10', ampacityA: 24, material: 'aluminium' }, 25, '240.4(B) 24 → 25, within the 25 A Al limit'],
  ] as const)('%o → %f A (%s)', (patch, expected, _why) => {
    expect(max(patch as Partial<MaxOcpdInput>).maxRatingA).toBe(expected)
  })
  it('names the rules applied', () => {
    expect(max({ sizeId: 'awg-12', ampacityA: 30 }).rules.join(' ')).toMatch(/240\.4\(D\)/)
    expect(max({ ampacityA: 52 }).rules.join(' ')).toMatch(/240\.4\(B\)/)
  })
  it('does not step up above 800 A (240.4(B) limit)', () => {
    expect(max({ sizeId: 'awg-4/0', ampacityA: 850 }).maxRatingA).toBe(800)
  })
})

describe('maxOcpdA — marine and vehicle (ABYC E-11 11.10)', () => {
  const boat = (patch: Partial<MaxOcpdInput>) => max({ profile: 'marine', ...patch })
  it.each([
    [{ ampacityA: 60 }, 60, 'a standard rating equal to the ampacity'],
    [{ ampacityA: 51 }, 60, 'no rating equals 51 A: next larger (60 A) is 118 % ≤ 150 %'],
    [{ ampacityA: 51, family: 'blade-regular' }, 40, 'blade fuses stop at 40 A: largest ≤ ampacity'],
    [{ ampacityA: 17, family: 'blade-regular' }, 20, '20 A is 118 % of 17 A'],
    [{ ampacityA: 7, family: 'strip-bolt-down' }, null, 'no strip fuse small enough'],
    [{ ampacityA: 27, family: 'battery-terminal' }, 30, '30 A is 111 % of 27 A'],
    [{ ampacityA: 27, family: 'strip-bolt-down' }, 40, '40 A is 148 % of 27 A'],
    [{ ampacityA: 26, family: 'battery-terminal' }, 30, '30 A is 115 % of 26 A'],
    [{ ampacityA: 24, family: 'strip-bolt-down' }, null, '40 A would be 167 % of 24 A: refused, nothing smaller'],
  ] as const)('%o → %s A (%s)', (patch, expected, _why) => {
    expect(boat(patch as Partial<MaxOcpdInput>).maxRatingA).toBe(expected)
  })
  it('vehicle applies the same rule and says it is common practice', () => {
    const r = max({ profile: 'vehicle', ampacityA: 51 })
    expect(r.maxRatingA).toBe(60)
    expect(r.rules.join(' ')).toMatch(/common practice/)
  })
  it('property: the allowed rating never exceeds 150 % of the ampacity, and is a listed rating', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 500, noNaN: true }), (ampacityA) => {
        const r = boat({ ampacityA, sizeId: 'awg-4/0' })
        return r.maxRatingA === null || (r.maxRatingA <= 1.5 * ampacityA + 1e-9 && NEC_STANDARD_RATINGS_A.includes(r.maxRatingA))
      }),
    )
  })
})

describe('edge cases', () => {
  it('zero ampacity allows no device', () => {
    expect(max({ ampacityA: 0 }).maxRatingA).toBeNull()
    expect(max({ ampacityA: 0, profile: 'marine' }).maxRatingA).toBeNull()
  })
  it.each([NaN, -5, Infinity])('rejects ampacity %f', (ampacityA) => {
    expect(() => max({ ampacityA })).toThrow(/ampacityA/)
  })
})
