import { describe, expect, it } from 'vitest'
import { designOf, expectFinding, expectNoFinding, findingsOf, part, simpleBranch, wire } from './helpers'

// 33 CFR 183.425 Table 5, 105 °C column (standards.md §4): 18 AWG 20 A, 16 AWG 25 A, 14 AWG 35 A, 12 AWG 45 A.

describe('conductor-ampacity', () => {
  it('flags 25 A on 18 AWG (Table 5: 20 A at 105 °C) and suggests 16 AWG (25 A)', () => {
    const all = findingsOf(simpleBranch({ sizeId: 'awg-18', lengthM: 1, load: { model: 'current', currentA: 25 }, fuse: { ratingA: 30 } }), 'conductor-ampacity')
    expect(all.map((x) => x.conductorIds)).toEqual([['neg'], ['pos']])
    const f = all[1]
    expect(f.severity).toBe('error')
    expect(f.measured!.value).toBeCloseTo(25, 6)
    expect(f.limit).toEqual({ value: 20, unit: 'A' })
    expect(f.suggestion?.patch).toEqual({ kind: 'conductor', id: 'pos', field: 'sizeId', value: 'awg-16' })
  })

  it('passes 8 A on 12 AWG', () => {
    expectNoFinding(simpleBranch(), 'conductor-ampacity')
  })

  it('leaves motor-start inrush out (ampacity is a running limit)', () => {
    const design = simpleBranch({ sizeId: 'awg-16', lengthM: 1, fuse: { ratingA: 20 }, load: { model: 'current', currentA: 10, duty: 'intermittent', start: { inrushMultiple: 5, durationS: 0.5 } } })
    const withStart = { ...design, scenarios: [...design.scenarios, { ...design.scenarios[0], id: 'start', name: 'Start', motorStart: true }] }
    expectNoFinding(withStart, 'conductor-ampacity')
  })
})

describe('conductor-unprotected and protection-distance (ABYC E-11 §11.10)', () => {
  const unfused = (lengthM: number, sheathed = false) =>
    designOf({
      parts: [part('battery', 'bank'), part('fuse', 'fuse', { ratingA: 15 }), part('load', 'lamp', { model: 'current', currentA: 2 })],
      conductors: [
        wire('feed', 'bank.pos', 'fuse.line', 'awg-12', lengthM, { sheathed }),
        wire('pos', 'fuse.load', 'lamp.pos', 'awg-14', 2),
        wire('neg', 'lamp.neg', 'bank.neg', 'awg-14', 2),
      ],
    })

  it('flags a conductor with no fuse between it and the battery', () => {
    const design = designOf({
      parts: [part('battery', 'bank'), part('load', 'lamp', { model: 'current', currentA: 2 })],
      conductors: [wire('pos', 'bank.pos', 'lamp.pos', 'awg-14', 2), wire('neg', 'lamp.neg', 'bank.neg', 'awg-14', 2)],
    })
    const f = expectFinding(design, 'conductor-unprotected')
    expect(f.conductorIds).toEqual(['pos'])
    expect(f.partIds).toEqual(['bank'])
  })

  it('passes the negative return (no device needed there) and a fused branch', () => {
    expectNoFinding(simpleBranch(), 'conductor-unprotected')
  })

  it('flags a fuse 0.5 m from the battery on a bare run (limit 7 in = 0.178 m)', () => {
    const f = expectFinding(unfused(0.5), 'protection-distance')
    expect(f.partIds).toEqual(['fuse'])
    expect(f.conductorIds).toEqual(['feed'])
    expect(f.measured).toEqual({ value: 0.5, unit: 'm' })
    expect(f.limit).toEqual({ value: 0.178, unit: 'm' })
  })

  it('allows 72 in (1.83 m) when the run is sheathed, and 0.15 m bare', () => {
    expectNoFinding(unfused(1.5, true), 'protection-distance')
    expectNoFinding(unfused(0.15), 'protection-distance')
    expect(expectFinding(unfused(2, true), 'protection-distance').limit).toEqual({ value: 1.83, unit: 'm' })
  })
})

describe('charging-source-protection (ISO 13297, 1.8 m; self-limiting sources exempt)', () => {
  const charger = (outputCurrentA: number) =>
    designOf({
      parts: [part('battery', 'bank'), part('fuse', 'fuse', { ratingA: 40, family: 'blade-large' }), part('mains-charger', 'charger', { outputCurrentA, outputVoltageV: 14.4 })],
      conductors: [
        wire('feed', 'bank.pos', 'fuse.line', 'awg-8', 0.1),
        wire('chg', 'charger.bat-pos', 'fuse.load', 'awg-12', 4),
        wire('ret', 'charger.bat-neg', 'bank.neg', 'awg-12', 4),
      ],
      scenarios: [{ id: 'shore', name: 'Shore', sunOn: false, chargerOn: true, loads: {} }],
    })

  it('flags a 60 A charger on 12 AWG (45 A) with its fuse 4 m away', () => {
    const f = expectFinding(charger(60), 'charging-source-protection')
    expect(f.partIds).toEqual(['charger'])
    expect(f.conductorIds).toEqual(['chg'])
  })

  it('exempts a 30 A charger that cannot overload the 45 A conductor', () => {
    expectNoFinding(charger(30), 'charging-source-protection')
  })
})
