import { describe, expect, it } from 'vitest'
import type { ParamsOf } from '../../../shared/design/catalogue'
import { designOf, expectFinding, expectNoFinding, findingsOf, part, wire } from './helpers'

// A 12 V solar branch: array → PV fuse → controller → bank, with the controller's output fused at the bank.
function solar(array: Partial<ParamsOf<'pv-array'>>, opts: { pvSizeId?: 'awg-14' | 'awg-10' | 'awg-8'; pvFuseA?: number; maxPvVoltageV?: number } = {}) {
  return designOf({
    parts: [
      part('battery', 'bank'),
      part('pv-array', 'array', { moduleVocV: 37, moduleIscA: 13.8, moduleVmpV: 31, moduleImpA: 12.9, vocTempCoeffPctPerC: -0.27, maxSeriesFuseA: 25, modulesPerString: 3, strings: 1, recordLowC: -10, ...array }),
      part('fuse', 'pv-fuse', { family: 'pv-10x38', ratingA: opts.pvFuseA ?? 25, dcVoltageRatingV: 1000, interruptingRatingA: 20000 }),
      part('charge-controller', 'mppt', { maxPvVoltageV: opts.maxPvVoltageV ?? 150, maxPvCurrentA: 60, outputCurrentA: 60, efficiency: 0.97, mppt: true }),
      part('fuse', 'bat-fuse', { family: 'blade-large', ratingA: 80, interruptingRatingA: 10000 }),
    ],
    conductors: [
      wire('a-pos', 'array.pos', 'pv-fuse.line', opts.pvSizeId ?? 'awg-10', 0.5),
      wire('pv-pos', 'pv-fuse.load', 'mppt.pv-pos', opts.pvSizeId ?? 'awg-10', 5),
      wire('pv-neg', 'array.neg', 'mppt.pv-neg', opts.pvSizeId ?? 'awg-10', 5.5),
      wire('feed', 'bank.pos', 'bat-fuse.line', 'awg-4', 0.1),
      wire('out-pos', 'bat-fuse.load', 'mppt.bat-pos', 'awg-4', 1),
      wire('out-neg', 'mppt.bat-neg', 'bank.neg', 'awg-4', 1),
    ],
  })
}

describe('pv-controller-voltage (NEC 690.7(A)(1) coefficient method)', () => {
  // 4 × 37 V × [1 + (−0.27 / 100)(−10 − 25)] = 148 × 1.0945 = 161.99 V > 150 V
  it('flags 4 modules of 37 V Voc at −10 °C on a 150 V controller and suggests 3 per string', () => {
    const f = expectFinding(solar({ modulesPerString: 4 }), 'pv-controller-voltage')
    expect(f.measured!.value).toBeCloseTo(161.986, 2)
    expect(f.limit).toEqual({ value: 150, unit: 'V' })
    expect(f.suggestion?.patch).toEqual({ kind: 'part', id: 'array', field: 'params.modulesPerString', value: 3 })
  })
  it('passes 3 modules (121.5 V)', () => {
    expectNoFinding(solar({ modulesPerString: 3 }), 'pv-controller-voltage')
  })
})

describe('pv-circuit-sizing (NEC 690.8(A)(1), 690.8(B), 690.9(B))', () => {
  // 2 strings × 13.8 A × 1.25 = 34.5 A (690.8(A)); table ampacity ≥ 1.25 × 34.5 = 43.125 A (690.8(B)(1)).
  // 14 AWG at 105 °C: 35 A (33 CFR 183.425 Table 5) → too small; 10 AWG: 60 A → passes.
  it('flags 14 AWG for two strings of 13.8 A Isc and suggests a size that passes', () => {
    const found = findingsOf(solar({ strings: 2 }, { pvSizeId: 'awg-14', pvFuseA: 45 }), 'pv-circuit-sizing')
    const conductor = found.find((f) => f.conductorIds.includes('pv-pos'))!
    expect(conductor.limit!.value).toBeCloseTo(43.125, 6)
    expect(conductor.measured).toEqual({ value: 35, unit: 'A' })
    expect(conductor.suggestion?.patch).toEqual({ kind: 'conductor', id: 'pv-pos', field: 'sizeId', value: 'awg-12' })
  })
  it('flags a 25 A PV fuse for two strings (needs 43.1 A) and passes 10 AWG with a 45 A fuse', () => {
    const fuse = findingsOf(solar({ strings: 2 }), 'pv-circuit-sizing').find((f) => f.partIds.includes('pv-fuse'))!
    expect(fuse.limit!.value).toBeCloseTo(43.125, 6)
    expectNoFinding(solar({ strings: 2 }, { pvFuseA: 45 }), 'pv-circuit-sizing')
  })
})

describe('pv-string-fuses (NEC 690.9(A), worked example in standards.md §6)', () => {
  // Isc 8.8 A, 15 A maximum series fuse: 2 strings → (2 − 1) × 1.25 × 8.8 = 11 A ≤ 15 A, no fuses;
  // 3 strings → (3 − 1) × 1.25 × 8.8 = 22 A > 15 A, string fuses required.
  const module = { moduleIscA: 8.8, moduleImpA: 8.2, maxSeriesFuseA: 15 }
  it('requires string fuses for three paralleled strings', () => {
    const f = expectFinding(solar({ ...module, strings: 3 }, { pvFuseA: 30 }), 'pv-string-fuses')
    expect(f.measured!.value).toBeCloseTo(22, 9)
    expect(f.limit).toEqual({ value: 15, unit: 'A' })
  })
  it('needs none for two strings', () => {
    expectNoFinding(solar({ ...module, strings: 2 }, { pvFuseA: 30 }), 'pv-string-fuses')
  })

  const threeFusedStrings = (fuseA: number) =>
    designOf({
      parts: [
        part('battery', 'bank'), part('bus-bar', 'combiner'),
        part('charge-controller', 'mppt', { maxPvVoltageV: 150, maxPvCurrentA: 60, outputCurrentA: 60 }),
        part('fuse', 'bat-fuse', { family: 'blade-large', ratingA: 80, interruptingRatingA: 10000 }),
        ...[1, 2, 3].flatMap((i) => [
          part('pv-array', `s${i}`, { moduleVocV: 37, moduleVmpV: 31, ...module, modulesPerString: 3, strings: 1 }),
          part('fuse', `f${i}`, { family: 'pv-10x38', ratingA: fuseA, dcVoltageRatingV: 1000, interruptingRatingA: 20000 }),
        ]),
      ],
      conductors: [
        ...[1, 2, 3].flatMap((i) => [
          wire(`s${i}-pos`, `s${i}.pos`, `f${i}.line`, 'awg-10', 0.3), wire(`s${i}-fused`, `f${i}.load`, `combiner.${'abc'[i - 1]}`, 'awg-10', 3),
          wire(`s${i}-neg`, `s${i}.neg`, 'mppt.pv-neg', 'awg-10', 3),
        ]),
        wire('pv-out', 'combiner.d', 'mppt.pv-pos', 'awg-8', 3),
        wire('feed', 'bank.pos', 'bat-fuse.line', 'awg-4', 0.1), wire('out-pos', 'bat-fuse.load', 'mppt.bat-pos', 'awg-4', 1),
        wire('out-neg', 'mppt.bat-neg', 'bank.neg', 'awg-4', 1),
      ],
    })
  it('passes three strings each with its own 15 A fuse', () => {
    expectNoFinding(threeFusedStrings(15), 'pv-string-fuses')
    expectNoFinding(threeFusedStrings(15), 'pv-string-fuse-rating')
  })
  it('flags a 20 A string fuse above the modules\' 15 A maximum series fuse', () => {
    const f = expectFinding(threeFusedStrings(20), 'pv-string-fuse-rating')
    expect(f.suggestion?.patch?.value).toBe(15)
  })
})

describe('device-voltage-rating on the PV side (NEC 690.7)', () => {
  // 3 × 37 V × [1 + 0.0027 × 35] = 111 × 1.0945 = 121.4895 V at −10 °C: a 32 V blade fuse in the array circuit cannot break it.
  it('flags a 32 V fuse between the array and the controller', () => {
    const design = solar({})
    const weak = { ...design, parts: design.parts.map((p) => (p.id === 'pv-fuse' ? ({ ...p, params: { ...p.params, dcVoltageRatingV: 32 } } as typeof p) : p)) }
    const f = findingsOf(weak, 'device-voltage-rating').find((x) => x.partIds.includes('pv-fuse'))!
    expect(f.measured!.value).toBeCloseTo(121.4895, 3)
    expect(f.limit).toEqual({ value: 32, unit: 'V' })
  })
  it('passes the 1000 V PV fuse', () => {
    expect(findingsOf(solar({}), 'device-voltage-rating')).toEqual([])
  })
})
