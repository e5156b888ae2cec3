import { describe, expect, it } from 'vitest'
import { designOf, expectFinding, expectNoFinding, part, settingsFor, simpleBranch, wire } from './helpers'

describe('device-above-ampacity (ABYC E-11 §11.10; NEC 240.4)', () => {
  it('flags a 60 A fuse on 14 AWG (35 A) and suggests the next blade rating within 150 %: 40 A', () => {
    const f = expectFinding(simpleBranch({ sizeId: 'awg-14', fuse: { ratingA: 60, family: 'blade-large' } }), 'device-above-ampacity')
    expect(f.partIds).toEqual(['fuse'])
    expect(f.conductorIds).toEqual(['pos'])
    expect(f.measured).toEqual({ value: 60, unit: 'A' })
    expect(f.limit).toEqual({ value: 40, unit: 'A' })
    expect(f.suggestion?.patch).toEqual({ kind: 'part', id: 'fuse', field: 'params.ratingA', value: 40 })
  })

  it('passes a 30 A fuse on 14 AWG', () => {
    expectNoFinding(simpleBranch({ sizeId: 'awg-14', fuse: { ratingA: 30 } }), 'device-above-ampacity')
  })

  it('building profile: NEC 240.4(D) caps 14 AWG copper at 15 A', () => {
    const f = expectFinding(simpleBranch({ profile: 'building', sizeId: 'awg-14', fuse: { ratingA: 20 } }), 'device-above-ampacity')
    expect(f.limit?.value).toBe(15)
  })

  it('accepts a branch tapped off a bus when its own fuse sits at the bus', () => {
    const design = designOf({
      parts: [
        part('battery', 'bank'), part('fuse', 'main', { family: 'class-t', ratingA: 200, interruptingRatingA: 20000 }), part('bus-bar', 'bus'),
        part('fuse', 'branch', { ratingA: 15 }), part('load', 'lamp', { model: 'current', currentA: 3 }),
      ],
      conductors: [
        wire('feed', 'bank.pos', 'main.line', 'awg-2/0', 0.1), wire('trunk', 'main.load', 'bus.a', 'awg-2/0', 1),
        wire('tap', 'bus.b', 'branch.line', 'awg-14', 0.1), wire('pos', 'branch.load', 'lamp.pos', 'awg-14', 3),
        wire('neg', 'lamp.neg', 'bank.neg', 'awg-14', 3),
      ],
    })
    expectNoFinding(design, 'device-above-ampacity')
    const far = { ...design, conductors: design.conductors.map((c) => (c.id === 'tap' ? { ...c, lengthM: 1 } : c)) }
    expect(expectFinding(far, 'device-above-ampacity').partIds).toEqual(['main'])
  })
})

describe('device-below-load (NEC 210.20(A) / 215.3 125 %; common practice off-grid and afloat)', () => {
  it('warns when a 15 A fuse carries 14 A continuously (needs 17.5 A) and suggests 20 A', () => {
    const f = expectFinding(simpleBranch({ load: { model: 'current', currentA: 14 } }), 'device-below-load')
    expect(f.severity).toBe('warning')
    expect(f.limit?.value).toBeCloseTo(17.5, 6)
    expect(f.suggestion?.patch).toEqual({ kind: 'part', id: 'fuse', field: 'params.ratingA', value: 20 })
  })

  it('is an error when the load exceeds the rating (the fuse would open)', () => {
    expect(expectFinding(simpleBranch({ load: { model: 'current', currentA: 16 } }), 'device-below-load').severity).toBe('error')
  })

  it('leaves intermittent loads out of the continuous current', () => {
    expectNoFinding(simpleBranch({ load: { model: 'current', currentA: 14, duty: 'intermittent' } }), 'device-below-load')
  })
})

describe('device-voltage-rating', () => {
  it('flags a 32 V blade fuse on a 48 V LFP bank (16 cells × 3.65 V = 58.4 V on charge)', () => {
    const s = settingsFor('marine', 48)
    const design = designOf({
      nominalVoltageV: 48,
      parts: [part('battery', 'bank', { nominalVoltageV: 12.8, seriesCount: 4 }, s), part('fuse', 'fuse', { ratingA: 15, dcVoltageRatingV: 32 }, s), part('load', 'lamp', { model: 'current', currentA: 2 }, s)],
      conductors: [wire('feed', 'bank.pos', 'fuse.line', 'awg-12', 0.1), wire('pos', 'fuse.load', 'lamp.pos', 'awg-14', 2), wire('neg', 'lamp.neg', 'bank.neg', 'awg-14', 2)],
    })
    const f = expectFinding(design, 'device-voltage-rating')
    expect(f.measured!.value).toBeCloseTo(58.4, 6)
    expect(f.limit).toEqual({ value: 32, unit: 'V' })
  })

  it('passes a 32 V fuse on a 12 V bank (14.6 V on charge)', () => {
    expectNoFinding(simpleBranch(), 'device-voltage-rating')
  })
})

describe('device-interrupting-rating (ABYC E-11; NEC 110.9)', () => {
  it('flags a 1 kA blade fuse next to a 12.8 V, 4 mΩ bank (about 2.5 kA available)', () => {
    const f = expectFinding(simpleBranch({ fuse: { interruptingRatingA: 1000 } }), 'device-interrupting-rating')
    // 12.8 V / (4 mΩ bank + 0.086 mΩ feed + 1 mΩ fuse) ≈ 2517 A
    expect(f.measured!.value).toBeGreaterThan(2400)
    expect(f.measured!.value).toBeLessThan(2600)
  })
  it('passes a 10 kA device', () => {
    expectNoFinding(simpleBranch({ fuse: { interruptingRatingA: 10000 } }), 'device-interrupting-rating')
  })
})

describe('ignition-protection (33 CFR 183.410; ISO 8846; SAE J1171)', () => {
  const engine = { installation: 'engine-space' as const }
  it('flags a fuse wired into an engine space on a boat', () => {
    const f = expectFinding(simpleBranch({ wireOptions: engine }), 'ignition-protection')
    expect(f.severity).toBe('error')
    expect(f.partIds).toEqual(['fuse'])
    expect(f.suggestion?.patch).toEqual({ kind: 'part', id: 'fuse', field: 'params.ignitionProtected', value: true })
  })
  it('passes an ignition-protected fuse, and does not apply to buildings', () => {
    expectNoFinding(simpleBranch({ wireOptions: engine, fuse: { ignitionProtected: true } }), 'ignition-protection')
    expectNoFinding(simpleBranch({ wireOptions: engine, profile: 'building' }), 'ignition-protection')
  })
})
