import { describe, expect, it } from 'vitest'
import {
  awgAtMostArea, awgDiameterMm, CONDUCTOR_SIZE_IDS, CONDUCTOR_SIZES, conductorSizeIdSchema, conductorSizeLabel,
  getConductorSize, isConductorSizeId, nextLargerSize, sizesInOrder,
} from '@shared/conductors/sizes'

describe('conductor sizes', () => {
  it('offers 15 AWG sizes 18 … 4/0 and 14 metric sizes 0.75 … 120 mm²', () => {
    expect(sizesInOrder('awg').map((s) => s.id)).toEqual([
      'awg-18', 'awg-16', 'awg-14', 'awg-12', 'awg-10', 'awg-8', 'awg-6', 'awg-4', 'awg-3', 'awg-2', 'awg-1',
      'awg-1/0', 'awg-2/0', 'awg-3/0', 'awg-4/0',
    ])
    expect(sizesInOrder('metric').map((s) => s.areaMm2)).toEqual([0.75, 1, 1.5, 2.5, 4, 6, 10, 16, 25, 35, 50, 70, 95, 120])
    expect(CONDUCTOR_SIZES).toHaveLength(29)
    expect(CONDUCTOR_SIZE_IDS).toHaveLength(29)
  })

  it.each([
    ['awg-10', '10 AWG'],
    ['awg-2/0', '2/0 AWG'],
    ['mm2-16', '16 mm²'],
    ['mm2-0.75', '0.75 mm²'],
  ])('labels %s as %s', (id, label) => expect(conductorSizeLabel(id)).toBe(label))

  it('ids follow the labels (awg-<gauge>, mm2-<area>)', () => {
    for (const s of CONDUCTOR_SIZES) {
      const expected = s.system === 'awg' ? `awg-${s.label.replace(' AWG', '')}` : `mm2-${s.areaMm2}`
      expect(s.id).toBe(expected)
    }
  })

  it('areas grow strictly within each system and rank gives the position', () => {
    for (const system of ['awg', 'metric'] as const) {
      const sizes = sizesInOrder(system)
      sizes.forEach((s, i) => {
        expect(s.rank).toBe(i)
        if (i > 0) expect(s.areaMm2).toBeGreaterThan(sizes[i - 1].areaMm2)
      })
    }
  })

  it('cmil and mm² agree through 1 cmil = 5.067075e-4 mm² for every size', () => {
    for (const s of CONDUCTOR_SIZES) expect(s.areaCmil * 5.067075e-4).toBeCloseTo(s.areaMm2, 5)
  })

  it('area ratio over k gauges is 92^(2k/39): 3 gauges ≈ 2.005 × (ASTM B258, area = d²)', () => {
    expect(92 ** (6 / 39)).toBeCloseTo(2.005, 3)
    expect(getConductorSize('awg-10').areaCmil / getConductorSize('awg-12').areaCmil).toBeCloseTo(92 ** (4 / 39), 10)
    expect(getConductorSize('awg-4').areaCmil / getConductorSize('awg-10').areaCmil).toBeCloseTo(92 ** (12 / 39), 10)
  })

  it('4/0 is 0.46 in by definition of the gauge (ASTM B258)', () => {
    expect(awgDiameterMm(-3)).toBeCloseTo(0.46 * 25.4, 10)
    expect(awgDiameterMm(36)).toBeCloseTo(0.005 * 25.4, 12)
  })

  it('steps to the next larger size within the same system', () => {
    expect(nextLargerSize('awg-1')?.id).toBe('awg-1/0')
    expect(nextLargerSize('mm2-2.5')?.id).toBe('mm2-4')
    expect(nextLargerSize('awg-4/0')).toBeNull()
    expect(nextLargerSize('mm2-120')).toBeNull()
  })

  it.each([
    [1, 'awg-18'], // 1 mm² ≥ 0.823 mm² (18 AWG), < 1.309 mm² (16 AWG)
    [2.5, 'awg-14'],
    [4, 'awg-12'],
    [6, 'awg-10'],
    [35, 'awg-2'],
    [50, 'awg-1'],
    [70, 'awg-2/0'],
    [120, 'awg-4/0'],
  ])('%f mm² reads the %s row (largest AWG area not above it)', (mm2, id) => expect(awgAtMostArea(mm2)?.id).toBe(id))

  describe('edge cases', () => {
    it('rejects an unknown id with a message listing the valid ones', () => {
      expect(() => getConductorSize('awg-13')).toThrow(/Unknown conductor size "awg-13".*awg-18/)
      expect(conductorSizeIdSchema.safeParse('awg-13').success).toBe(false)
      expect(conductorSizeIdSchema.safeParse('mm2-2.5').success).toBe(true)
      expect(isConductorSizeId('mm2-3')).toBe(false)
      expect(isConductorSizeId(42)).toBe(false)
    })
    it('a size below 18 AWG has no AWG row', () => {
      expect(awgAtMostArea(0.75)).toBeNull()
      expect(awgAtMostArea(0)).toBeNull()
    })
    it('an exact AWG area maps to itself', () => {
      const a = getConductorSize('awg-8').areaMm2
      expect(awgAtMostArea(a)?.id).toBe('awg-8')
    })
  })
})
