import { describe, expect, it } from 'vitest'
import { analyzeDesign } from '../../../shared/analysis'
import { designOf, expectAllFinite, expectFinding, expectNoFinding, part, simpleBranch, wire } from './helpers'

describe('voltage-drop (ABYC E-11 / ISO 10133: 3 % critical, 10 % other)', () => {
  it('suggests the smallest size that brings a critical 8 A run of 6 m inside 3 %', () => {
    // 12 AWG, 6 m each way at 8 A ≈ 0.0056 Ω/m × 12 m × 8 A ≈ 0.53 V = 4.4 % → over 3 %.
    const f = expectFinding(simpleBranch({ sizeId: 'awg-12', lengthM: 6, load: { model: 'current', currentA: 8, critical: true } }), 'voltage-drop')
    expect(f.partIds).toEqual(['pump'])
    expect(f.conductorIds).toEqual(['neg', 'pos'])
    expect(f.suggestion?.patch).toMatchObject({ kind: 'conductor', id: 'pos', field: 'sizeId' })
    // Applying the size to both conductors must pass (the suggestion is for the pair).
    const size = f.suggestion!.patch!.value as 'awg-10'
    expectNoFinding(simpleBranch({ sizeId: size, lengthM: 6, load: { model: 'current', currentA: 8, critical: true } }), 'voltage-drop')
  })

  it('building profile reports the advisory limit as a warning', () => {
    expect(expectFinding(simpleBranch({ profile: 'building', sizeId: 'awg-14', lengthM: 10, load: { model: 'current', currentA: 8 } }), 'voltage-drop').severity).toBe('warning')
  })
})

describe('part-rating', () => {
  const throughBus = (ratingA: number) =>
    designOf({
      parts: [part('battery', 'bank'), part('fuse', 'fuse', { ratingA: 30 }), part('bus-bar', 'bus', { ratingA }), part('load', 'heater', { model: 'current', currentA: 20 })],
      conductors: [
        wire('feed', 'bank.pos', 'fuse.line', 'awg-8', 0.1), wire('trunk', 'fuse.load', 'bus.a', 'awg-8', 1),
        wire('pos', 'bus.b', 'heater.pos', 'awg-10', 1), wire('neg', 'heater.neg', 'bank.neg', 'awg-10', 2),
      ],
    })
  it('flags a 10 A bus carrying 20 A', () => {
    const f = expectFinding(throughBus(10), 'part-rating')
    expect(f.partIds).toEqual(['bus'])
    expect(f.measured!.value).toBeCloseTo(20, 6)
  })
  it('passes a 100 A bus', () => expectNoFinding(throughBus(100), 'part-rating'))
})

describe('unsolvable circuits give findings naming the parts, never throws or NaN', () => {
  it('a conductor straight across the bank: shorted source', () => {
    const design = designOf({ parts: [part('battery', 'bank')], conductors: [wire('short', 'bank.pos', 'bank.neg', 'awg-2/0', 0.001)] })
    const result = analyzeDesign(design)
    expectAllFinite(result)
    const f = result.findings.find((x) => x.ruleId === 'shorted-source')
    // 0.001 m of 2/0 ≈ 0.27 µΩ, below the solver's 1 µΩ short threshold.
    expect(f?.partIds).toEqual(['bank'])
    expect(f?.conductorIds).toEqual(['short'])
    expect(result.findings.find((x) => x.ruleId === 'conductor-polarity')?.conductorIds).toEqual(['short'])
  })

  it('banks of different voltage in parallel: sources fighting in a loop', () => {
    const design = designOf({
      parts: [part('battery', 'a', { nominalVoltageV: 12.8 }), part('battery', 'b', { nominalVoltageV: 25.6 })],
      conductors: [wire('p', 'a.pos', 'b.pos', 'awg-2/0', 1), wire('n', 'a.neg', 'b.neg', 'awg-2/0', 1)],
    })
    const result = analyzeDesign(design)
    expectAllFinite(result)
    expect(result.findings.find((x) => x.ruleId === 'source-loop')?.partIds).toEqual(['a', 'b'])
  })

  it('2 kW of constant power through 30 m of 18 AWG: no operating point', () => {
    const result = analyzeDesign(simpleBranch({ sizeId: 'awg-18', lengthM: 30, fuse: { ratingA: 200, family: 'class-t' }, load: { model: 'power', powerW: 2000 } }))
    expectAllFinite(result)
    expect(result.findings.find((x) => x.ruleId === 'not-converged')?.partIds).toContain('pump')
  })

  it('a load switched on behind an open switch: not supplied', () => {
    const design = designOf({
      parts: [part('battery', 'bank'), part('battery-switch', 'sw', { closed: false }), part('fuse', 'fuse'), part('load', 'lamp', { model: 'current', currentA: 2 })],
      conductors: [
        wire('feed', 'bank.pos', 'fuse.line', 'awg-8', 0.1), wire('a', 'fuse.load', 'sw.a', 'awg-8', 0.5),
        wire('pos', 'sw.b', 'lamp.pos', 'awg-14', 2), wire('neg', 'lamp.neg', 'bank.neg', 'awg-14', 2),
      ],
    })
    const result = analyzeDesign(design)
    expectAllFinite(result)
    expect(result.findings.find((x) => x.ruleId === 'no-supply')?.partIds).toEqual(['lamp'])
    expect(result.scenarios[0].conductors.find((c) => c.id === 'pos')?.currentA).toBe(0)
  })

  it('a part with nothing wired: floating part', () => {
    const base = simpleBranch()
    const design = designOf({ parts: [...base.parts, part('load', 'spare', { model: 'current', currentA: 1 })], conductors: base.conductors })
    expect(expectFinding(design, 'part-not-connected').partIds).toEqual(['spare'])
  })
})

describe('finding ids and the merged list', () => {
  it('are stable: rule id + sorted targets, one per id, errors first', () => {
    const design = simpleBranch({ sizeId: 'awg-18', lengthM: 8, load: { model: 'current', currentA: 25, critical: true }, fuse: { ratingA: 60, family: 'blade-large', interruptingRatingA: 1000 } })
    const a = analyzeDesign(design).findings
    const b = analyzeDesign(design).findings
    expect(a.map((f) => f.id)).toEqual(b.map((f) => f.id))
    expect(new Set(a.map((f) => f.id)).size).toBe(a.length)
    for (const f of a) expect(f.id.startsWith(`${f.ruleId}:`)).toBe(true)
    const ranks = a.map((f) => ({ error: 0, warning: 1, info: 2 })[f.severity])
    expect([...ranks].sort()).toEqual(ranks)
    expect(a.find((f) => f.ruleId === 'voltage-drop')?.id).toBe('voltage-drop:neg+pos+pump')
  })

  it('limit analysis to chosen scenarios and warn about unknown ids', () => {
    const design = simpleBranch()
    const result = analyzeDesign(design, { scenarioIds: ['nope'] })
    expect(result.scenarios).toEqual([])
    expect(result.findings.map((f) => f.ruleId)).toContain('unknown-scenario')
  })
})

describe('scenario results', () => {
  it('report terminal voltages from the bank negative, conductor drops and part currents', () => {
    // 8 A constant current from a 12.8 V, 4 mΩ bank: terminal voltage 12.8 − 8 × 0.004 = 12.768 V.
    const result = analyzeDesign(simpleBranch())
    const s = result.scenarios[0]
    expect(s.terminals['bank:neg']).toBe(0)
    expect(s.terminals['bank:pos']).toBeCloseTo(12.768, 9)
    const pos = s.conductors.find((c) => c.id === 'pos')!
    expect(pos.currentA).toBeCloseTo(8, 9)
    expect(pos.fromV - pos.toV).toBeCloseTo(pos.dropV, 9)
    expect(pos.dropPercent).toBeCloseTo((100 * pos.dropV) / 12, 9)
    expect(s.parts.find((p) => p.id === 'bank')).toMatchObject({ currentA: expect.closeTo(8, 9), voltageV: expect.closeTo(12.768, 9) })
    expect(result.devices).toEqual([expect.objectContaining({ id: 'fuse', ratingA: 15, protectsConductorIds: ['feed', 'pos'] })])
  })
})

describe('protection-coordination (shared/protection time-current checks fed by the analysis)', () => {
  it('flags a far-end fault a 150 A breaker may never clear on 30 m of 6 AWG (ICEA withstand)', () => {
    // Far-end fault across the load, return included (hand figure from NEC Ch. 9 Table 8, 6 AWG 0.491 Ω/kft at 75 °C):
    //  6 AWG at 30 °C: 0.491 / 304.8 × (1 + 0.00323 × (30 − 75)) = 0.0013768 Ω/m → 30 m: 0.041303 Ω, out and back 0.082607 Ω
    //  R = 0.004 (bank) + 0.0000864 (feed) + 0.001 (breaker) + 0.082607 = 0.087693 Ω → I = 12.8 / 0.087693 = 146.0 A,
    //  about 1 × the 150 A rating: a breaker is not sure to open at all.
    const design = simpleBranch({
      sizeId: 'awg-6', lengthM: 30,
      fuse: { family: 'breaker-magnetic-hydraulic', ratingA: 150, interruptingRatingA: 10000, dcVoltageRatingV: 65 },
      load: { model: 'current', currentA: 60, duty: 'intermittent' },
    })
    const result = analyzeDesign(design, { coordination: true })
    expectAllFinite(result)
    const farEnd = result.conductors.find((c) => c.id === 'pos')!.faultCurrentFarEndA
    expect(Math.abs(farEnd - 146.0) / 146.0).toBeLessThan(0.01)
    const f = result.findings.find((x) => x.ruleId === 'fault-not-cleared-before-damage')
    expect(f?.partIds).toEqual(['fuse'])
    expect(f?.conductorIds).toEqual(['pos'])
  })

  it('finds no motor-start problem on a branch without a start; on by default, off with coordination: false', () => {
    const result = analyzeDesign(simpleBranch(), { coordination: true })
    expect(result.findings.filter((f) => f.ruleId === 'motor-start-nuisance-open')).toEqual([])
    // The same far-end fault as above (≈ 146 A on a 150 A breaker): found by default, not when switched off.
    const slow = simpleBranch({ sizeId: 'awg-6', lengthM: 30, fuse: { family: 'breaker-magnetic-hydraulic', ratingA: 150 } })
    expect(analyzeDesign(slow).findings.some((f) => f.ruleId === 'fault-not-cleared-before-damage')).toBe(true)
    const off = analyzeDesign(slow, { coordination: false })
    expect(off.findings.some((f) => f.ruleId === 'fault-not-cleared-before-damage')).toBe(false)
  })
})
