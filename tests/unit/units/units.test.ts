import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import {
  cmilToKcmil, cmilToMm2, cToF, formatNumber, formatPercent, formatSignificant, formatWithUnit, fToC, ftToM,
  MM2_PER_CMIL, mm2ToCmil, mToFt, MISSING_VALUE,
} from '@shared/units'

const finite = fc.double({ min: -1e6, max: 1e6, noNaN: true, noDefaultInfinity: true })

describe('length m ↔ ft (1 ft = 0.3048 m exactly, international foot)', () => {
  it.each([
    [0, 0],
    [0.3048, 1],
    [1, 3.280839895],
    [100, 328.0839895],
    [1609.344, 5280], // one statute mile
  ])('%f m = %f ft', (m, ft) => {
    expect(mToFt(m)).toBeCloseTo(ft, 7)
    expect(ftToM(ft)).toBeCloseTo(m, 7)
  })
  it('round-trips any finite length', () => {
    fc.assert(fc.property(finite, (x) => Math.abs(ftToM(mToFt(x)) - x) <= 1e-9 * Math.max(1, Math.abs(x))))
  })
})

describe('area mm² ↔ cmil', () => {
  it('1 cmil is π/4 × (0.0254 mm)² = 5.067075e-4 mm² (definition of the circular mil)', () => {
    // a circle of diameter 1 mil: (π/4) d² with d = 0.0254 mm
    expect(MM2_PER_CMIL).toBeCloseTo(5.067075e-4, 10)
  })
  it.each([
    // NEC Chapter 9 Table 8 areas beside their mm² (standards.md §2); 211 600 cmil ≈ 107.2 mm²
    [211600, 107.2193],
    [10380, 5.2596],
    [1_000_000, 506.7075], // 1000 kcmil
  ])('%i cmil = %f mm²', (cmil, mm2) => {
    expect(cmilToMm2(cmil)).toBeCloseTo(mm2, 3)
    expect(mm2ToCmil(mm2)).toBeCloseTo(cmil, -1)
  })
  it('kcmil is a thousand cmil', () => expect(cmilToKcmil(250_000)).toBe(250))
  it('round-trips', () => {
    fc.assert(fc.property(finite, (x) => Math.abs(cmilToMm2(mm2ToCmil(x)) - x) <= 1e-9 * Math.max(1, Math.abs(x))))
  })
})

describe('temperature °C ↔ °F', () => {
  it.each([
    [-40, -40],
    [0, 32],
    [30, 86], // 33 CFR Table 5 basis
    [50, 122], // engine-space basis of Table 5 Note 1
    [100, 212],
    [105, 221],
  ])('%f °C = %f °F', (c, f) => {
    expect(cToF(c)).toBeCloseTo(f, 10)
    expect(fToC(f)).toBeCloseTo(c, 10)
  })
  it('round-trips', () => {
    fc.assert(fc.property(finite, (x) => Math.abs(fToC(cToF(x)) - x) <= 1e-9 * Math.max(1, Math.abs(x))))
  })
})

describe('formatting', () => {
  it.each([
    [3.14159, 2, '3.14'],
    [2.5, 0, '3'],
    [12, 1, '12.0'],
    [-0.0001, 2, '0.00'], // no "-0.00" on a report
    [1e21, 0, '1e+21'],
  ])('formatNumber(%f, %i) = %s', (v, d, s) => expect(formatNumber(v, d)).toBe(s))
  it('adds units and percent signs with a no-break space', () => {
    expect(formatWithUnit(12.5, 'V', 1)).toBe('12.5\u00a0V')
    expect(formatPercent(2.345, 1)).toBe('2.3\u00a0%')
  })
  it('formats significant figures', () => {
    expect(formatSignificant(0.000123456, 3)).toBe('0.000123')
    expect(formatSignificant(2634.9, 2)).toBe('2600')
    expect(formatSignificant(0)).toBe('0')
  })

  describe('edge cases', () => {
    it.each([NaN, Infinity, -Infinity, undefined, null, '12', {}])('never prints NaN for %s', (v) => {
      expect(formatNumber(v, 2)).toBe(MISSING_VALUE)
      expect(formatSignificant(v, 2)).toBe(MISSING_VALUE)
      expect(formatWithUnit(v, 'A')).toBe(MISSING_VALUE)
      expect(formatPercent(v)).toBe(MISSING_VALUE)
    })
    it('falls back to 2 decimals for a bad digit count', () => {
      expect(formatNumber(1.23456, -1)).toBe('1.23')
      expect(formatNumber(1.23456, 2.5)).toBe('1.23')
      expect(formatNumber(1.23456, NaN)).toBe('1.23')
    })
    it('no finite input ever yields NaN or Infinity text', () => {
      fc.assert(
        fc.property(fc.double(), fc.integer({ min: -5, max: 25 }), (v, d) => {
          const s = formatNumber(v, d) + formatSignificant(v, d)
          return !s.includes('NaN') && !s.includes('Infinity')
        }),
      )
    })
  })
})
