// Overcurrent-device limits and standard ratings.
// Sources (standards.md §1 [V2]): NEC 240.6(A) list (ecmweb.com Code Q&A 2017); 240.4(D) values
// (diy.stackexchange quoting (D)(3)–(D)(7); encorewire.com table footnote); 240.4(B) next-higher rule ≤ 800 A
// (mikeholt.com thread quoting the text) [V]; ABYC E-11 11.10 "≤ ampacity, next larger up to 150 %" (pkys.com) [V].
import { describe, expect, it } from 'vitest'
import { NEC_240_6_A_FUSE_ONLY_RATINGS_A, NEC_240_6_A_RATINGS_A } from '@shared/protection/ratings'
import { maxOcpdA } from '@shared/conductors/maxOcpd'
import { conductorAmpacityA } from '@shared/conductors/ampacity'

describe('NEC 240.6(A) standard ratings', () => {
  it('lists exactly the published ratings', () => {
    expect([...NEC_240_6_A_RATINGS_A]).toEqual([
      15, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80, 90, 100, 110, 125, 150, 175, 200, 225, 250, 300, 350, 400, 450, 500, 600,
      700, 800, 1000, 1200, 1600, 2000, 2500, 3000, 4000, 5000, 6000,
    ])
    expect([...NEC_240_6_A_FUSE_ONLY_RATINGS_A]).toEqual([1, 3, 6, 10])
  })
})

describe('NEC 240.4(D) small conductors, applied after correction and adjustment', () => {
  it.each([
    ['awg-18', 'copper', 7, 6], // no 7 A standard rating: the largest at most 7 A is the 6 A fuse
    ['awg-16', 'copper', 10, 10],
    ['awg-14', 'copper', 15, 15],
    ['awg-12', 'aluminium', 15, 15],
    ['awg-12', 'copper', 20, 20],
    ['awg-10', 'aluminium', 25, 25],
    ['awg-10', 'copper', 30, 30],
  ] as const)('%s %s: ≤ %i A → largest standard rating %i A', (sizeId, material, limit, rating) => {
    const ampacityA = conductorAmpacityA({ sizeId, material, insulationRatingC: 90, ambientC: 30, installation: 'conduit', profile: 'building' }).ampacityA!
    const r = maxOcpdA({ sizeId, material, ampacityA, profile: 'building' })
    expect(r.limitA).toBe(limit)
    expect(r.maxRatingA).toBe(rating)
  })
})

describe('ABYC E-11 11.10: ≤ ampacity, next larger standard size up to 150 %', () => {
  it('10 AWG 105 °C in an engine space (51 A): 60 A is allowed (118 %)', () => {
    expect(maxOcpdA({ sizeId: 'awg-10', material: 'copper', ampacityA: 51, profile: 'marine' }).maxRatingA).toBe(60)
  })
  it('a 14 AWG conductor bundled in an engine space (20.8 A): 25 A is allowed (120 %)', () => {
    expect(maxOcpdA({ sizeId: 'awg-14', material: 'copper', ampacityA: 20.8, profile: 'marine' }).maxRatingA).toBe(25)
  })
  it('a 10 A conductor in a list whose next size is 20 A: 200 % is refused, the largest below is used', () => {
    expect(maxOcpdA({ sizeId: 'awg-18', material: 'copper', ampacityA: 11, profile: 'marine', family: 'battery-terminal' }).maxRatingA).toBeNull()
    expect(maxOcpdA({ sizeId: 'awg-18', material: 'copper', ampacityA: 11, profile: 'marine' }).maxRatingA).toBe(15) // 136 %
    expect(maxOcpdA({ sizeId: 'awg-18', material: 'copper', ampacityA: 9.9, profile: 'marine' }).maxRatingA).toBe(10)
  })
})
