import { describe, expect, it } from 'vitest'
import type { Finding } from '@shared/analysis/types'
import { protectionChecks, type ProtectedConductor, type ProtectionContext, type ProtectionDevice } from '@shared/protection/checks'

// Each rule through protectionChecks() with hand-worked numbers. Sources: device bands (see the
// reference tests), ICEA P-32-382 withstand, SAE J553 reset types, the rule profiles' sources.

const rel = (a: number, b: number) => Math.abs(a / b - 1)

function run(devices: ProtectionDevice[], extra: Partial<ProtectionContext> = {}): Finding[] {
  const findings = protectionChecks({ devices, ...extra })
  // Never a NaN or an Infinity in a finding (they reach the screen).
  for (const f of findings) for (const q of [f.measured, f.limit]) if (q) expect(Number.isFinite(q.value)).toBe(true)
  return findings
}
const byRule = (findings: Finding[], ruleId: string) => findings.filter((f) => f.ruleId === ruleId)

// 14 AWG copper, 105 °C thermoplastic → limit 150 °C, start at 105 °C. By hand (ICEA):
// k = √(0.0297·log10(384/339)) = 0.040095; A = 4 106.8 cmil (ASTM B258) → I²t = (0.040095·4106.8)² = 27 113 A²s.
const awg14: ProtectedConductor = { id: 'W14', sizeId: 'awg-14', material: 'copper', insulationRatingC: 105, maxDeviceRatingA: 15 }

describe('motor-start-nuisance-open (device band vs start pulse; inrush common practice)', () => {
  const pump = { loadId: 'pump', runningCurrentA: 8, inrushMultiple: 5, startDurationS: 0.5, isMotor: true }
  it('blade 10 A is sure to open on 40 A for 0.5 s: error, suggests the time-delay 6.3 × 32 mm', () => {
    // 40 A = 4 In. Blade min: 0.08·(4/3.5)^(ln 0.5/ln(6/3.5)) = 0.0674 s; max: 0.5·(4/3.5)^(ln 0.2/ln(6/3.5)) = 0.336 s ≤ 0.5 s.
    const [f] = byRule(run([{ id: 'F1', familyId: 'blade-regular', ratingA: 10, conductor: awg14, loadStarts: [pump] }]), 'motor-start-nuisance-open')
    expect(f.severity).toBe('error')
    expect(rel(f.limit!.value, 0.0674)).toBeLessThan(2e-3)
    expect(f.partIds).toEqual(['F1', 'pump'])
    expect(f.suggestion!.text).toMatch(/6\.3 × 32 mm, time-delay/)
    expect(f.source).toMatch(/ISO 8820-3/)
  })
  it('a 10 A time-delay cartridge rides through: no finding', () => {
    expect(run([{ id: 'F1', familyId: 'cartridge-6x32-delay', ratingA: 10, conductor: awg14, loadStarts: [pump] }])).toEqual([])
  })
  it('blade 20 A may open (min 0.15 s < 0.5 s < max 5 s): warning, suggests 30 A where the conductor allows it', () => {
    // 40 A = 2 In on a 20 A blade. At 30 A: 1.333 In lies between 125 % (1 h) and 135 % (0.75 s): min ≈ 2.95 s > 0.5 s.
    const conductor = { ...awg14, id: 'W10', sizeId: 'awg-10', maxDeviceRatingA: 30 }
    const [f] = run([{ id: 'F2', familyId: 'blade-regular', ratingA: 20, conductor, loadStarts: [pump] }])
    expect(f.ruleId).toBe('motor-start-nuisance-open')
    expect(f.severity).toBe('warning')
    expect(f.suggestion!.text).toMatch(/30\u00a0A/)
  })
  it('never suggests a device that would ride through the start but leave the conductor unprotected', () => {
    // 18 AWG, 105 °C: I²t = (0.040095 · 1 624)² = 4 240 A²s; far-end fault 100 A → withstand 0.424 s.
    // Blade 10 A clears 10 In in 0.1·(6/10)² = 36 ms; the 6.3 × 32 mm time-delay only within 120·(2/10)² = 4.8 s.
    const conductor = { ...awg14, id: 'W18', sizeId: 'awg-18', maxDeviceRatingA: 10 }
    const findings = run([{ id: 'F1', familyId: 'blade-regular', ratingA: 10, conductor, faultCurrentFarEndA: 100, loadStarts: [pump] }])
    expect(findings.map((f) => f.ruleId)).toEqual(['motor-start-nuisance-open'])
    expect(findings[0].suggestion!.text).not.toMatch(/6\.3 × 32/)
  })
  it('never suggests a family whose catalogued interrupting rating is below the fault at the device', () => {
    // 6.3 × 32 mm cartridges are catalogued at 35 A at 250 V AC (UL 248-14 minimum, ratings.ts): a 2 kA fault rules them out.
    const [f] = run([{ id: 'F1', familyId: 'blade-regular', ratingA: 10, conductor: awg14, faultCurrentAtDeviceA: 2000, loadStarts: [pump] }])
    expect(f.ruleId).toBe('motor-start-nuisance-open')
    expect(f.suggestion!.text).not.toMatch(/6\.3 × 32/)
  })
  it('adds the current of the other loads to the start pulse', () => {
    const small = { loadId: 'fan', runningCurrentA: 2, inrushMultiple: 3, startDurationS: 0.1 }
    const d = { id: 'F3', familyId: 'blade-regular', ratingA: 10, loadStarts: [small] }
    expect(run([d])).toEqual([]) // 6 A
    expect(byRule(run([{ ...d, baseCurrentA: 40 }]), 'motor-start-nuisance-open')).toHaveLength(1) // 46 A = 4.6 In
  })
})

describe('fault-not-cleared-before-damage (max clearing vs ICEA withstand)', () => {
  it('blade 15 A clears a 500 A far-end fault on 14 AWG (3.2 ms < 108 ms): no finding', () => {
    expect(run([{ id: 'F1', familyId: 'blade-regular', ratingA: 15, conductor: awg14, faultCurrentFarEndA: 500 }])).toEqual([])
  })
  it('strip 60 A on 14 AWG: 500 A = 8.33 In clears in 0.355 s, the wire lasts 0.108 s: error', () => {
    // Strip max: 1·(8.333/6)^(ln 0.2/ln(10/6)) = 0.3552 s; withstand 27 113 / 500² = 0.1085 s.
    const [f] = run([{ id: 'F4', familyId: 'strip-bolt-down', ratingA: 60, conductor: awg14, faultCurrentFarEndA: 500 }])
    expect(f.ruleId).toBe('fault-not-cleared-before-damage')
    expect(f.severity).toBe('error')
    expect(rel(f.measured!.value, 0.3552)).toBeLessThan(2e-3)
    expect(rel(f.limit!.value, 0.1085)).toBeLessThan(2e-3)
    expect(f.conductorIds).toEqual(['W14'])
    expect(f.source).toMatch(/ICEA P-32-382/)
  })
  it('a device upstream that clears in time (magnetic trip, 20 ms) protects the conductor; selectivity is then warned', () => {
    const findings = run([
      { id: 'F4', familyId: 'strip-bolt-down', ratingA: 60, conductor: awg14, faultCurrentFarEndA: 500, upstreamId: 'CB1' },
      { id: 'CB1', familyId: 'breaker-magnetic-hydraulic', ratingA: 40 },
    ])
    expect(byRule(findings, 'fault-not-cleared-before-damage')).toEqual([])
    expect(byRule(findings, 'not-selective')).toHaveLength(1)
  })
  it('a fault below the current the device is sure to open at: error, with no number for "never"', () => {
    // 18 AWG, blade 30 A, 35 A far-end fault = 1.17 In: below 135 %, not sure to open.
    const conductor = { ...awg14, id: 'W18', sizeId: 'awg-18' }
    const [f] = run([{ id: 'F5', familyId: 'blade-regular', ratingA: 30, conductor, faultCurrentFarEndA: 35 }])
    expect(f.ruleId).toBe('fault-not-cleared-before-damage')
    expect(f.measured).toBeUndefined()
    expect(f.message).toMatch(/never/)
  })
})

describe('thermal-breaker-sole-protection (0.2 s floor, common practice)', () => {
  const breaker = { id: 'CB2', familyId: 'breaker-thermal-3', ratingA: 15, conductor: awg14, faultCurrentAtDeviceA: 550 }
  it('14 AWG must clear 550 A in 27 113 / 550² = 89.6 ms: the breaker cannot (0.2 s)', () => {
    const [f] = run([breaker])
    expect(f.ruleId).toBe('thermal-breaker-sole-protection')
    expect(rel(f.limit!.value, 0.0896)).toBeLessThan(2e-3)
    expect(f.measured!.value).toBeCloseTo(0.2, 9)
  })
  it('a Class T fuse upstream clearing in 6 ms makes it backup, not sole protection', () => {
    // Class T 30 A at 550 A = 18.3 In: 0.02·(10/18.33)² = 5.95 ms.
    expect(byRule(run([{ ...breaker, upstreamId: 'T1' }, { id: 'T1', familyId: 'class-t', ratingA: 30 }]), 'thermal-breaker-sole-protection')).toEqual([])
  })
})

describe('not-selective (downstream max clearing < upstream min melting at the downstream fault)', () => {
  it('blade 10 A below Class T 100 A at 1 kA: 0.36 ms < 3 ms, selective', () => {
    const devices = [
      { id: 'F1', familyId: 'blade-regular', ratingA: 10, faultCurrentAtDeviceA: 1000, upstreamId: 'T1' },
      { id: 'T1', familyId: 'class-t', ratingA: 100 },
    ]
    expect(byRule(run(devices), 'not-selective')).toEqual([])
  })
  it('blade 30 A below blade 35 A at 1 kA: 3.24 ms vs 2.76 ms, a warning naming both', () => {
    const devices = [
      { id: 'F30', familyId: 'blade-regular', ratingA: 30, faultCurrentAtDeviceA: 1000, upstreamId: 'F35' },
      { id: 'F35', familyId: 'blade-regular', ratingA: 35, upstreamId: 'T1' },
      { id: 'T1', familyId: 'class-t', ratingA: 200 },
    ]
    const found = byRule(run(devices), 'not-selective')
    expect(found).toHaveLength(1) // F30 vs Class T 200 A is selective: at 5 In it melts after ≥ 50 ms
    expect(found[0].severity).toBe('warning')
    expect(found[0].partIds.sort()).toEqual(['F30', 'F35'])
    expect(rel(found[0].measured!.value, 0.1 * (6 / (1000 / 30)) ** 2)).toBeLessThan(1e-6)
    expect(rel(found[0].limit!.value, 0.01 * (15 / (1000 / 35)) ** 2)).toBeLessThan(1e-6)
  })
})

describe('not-selective at the far-end fault current', () => {
  it('checks the far-end current when no terminal current is given', () => {
    const devices = [
      { id: 'F30', familyId: 'blade-regular', ratingA: 30, faultCurrentFarEndA: 1000, upstreamId: 'F35' },
      { id: 'F35', familyId: 'blade-regular', ratingA: 35 },
    ]
    expect(byRule(run(devices), 'not-selective')).toHaveLength(1)
  })
})

describe('auto-reset-breaker-not-allowed (SAE J553 type I; profile rules)', () => {
  const light = { loadId: 'lamp', runningCurrentA: 2, inrushMultiple: 1, startDurationS: 0.01, isMotor: false }
  const motor = { loadId: 'pump', runningCurrentA: 2, inrushMultiple: 1, startDurationS: 0.01, isMotor: true }
  const typeI = { id: 'CB1', familyId: 'breaker-thermal-1', ratingA: 10, upstreamId: 'F0' }
  const main = { id: 'F0', familyId: 'class-t', ratingA: 100 }
  it('marine (ABYC E-11, recalled): not on a lighting circuit; allowed on a motor circuit', () => {
    const [f] = byRule(run([{ ...typeI, loadStarts: [light] }, main], { profile: 'marine' }), 'auto-reset-breaker-not-allowed')
    expect(f.severity).toBe('error')
    expect(f.source).toMatch(/ABYC E-11/)
    expect(run([{ ...typeI, loadStarts: [motor] }, main], { profile: 'marine' })).toEqual([])
  })
  it('off-grid (NEC 240.80, recalled): never', () => {
    expect(byRule(run([{ ...typeI, loadStarts: [motor] }, main], { profile: 'off-grid' }), 'auto-reset-breaker-not-allowed')).toHaveLength(1)
  })
  it('vehicle: allowed, but warned when nothing upstream ends a persistent fault', () => {
    expect(run([typeI, main], { profile: 'vehicle' })).toEqual([])
    const [f] = run([{ ...typeI, upstreamId: undefined }])
    expect(f.ruleId).toBe('auto-reset-breaker-no-backup')
    expect(f.severity).toBe('warning')
  })
  it('type III (manual reset) is never flagged', () => {
    expect(run([{ ...typeI, familyId: 'breaker-thermal-3', loadStarts: [light] }, main], { profile: 'off-grid' })).toEqual([])
  })
})

describe('bad input becomes a finding, never a throw', () => {
  it('unknown family, non-numeric rating, unknown size, unknown profile', () => {
    const findings = run([
      { id: 'X1', familyId: 'no-such-fuse', ratingA: 10 },
      { id: 'X2', familyId: 'blade-regular', ratingA: Number.NaN },
      { id: 'X3', familyId: 'blade-regular', ratingA: 10, conductor: { ...awg14, sizeId: 'awg-99' }, faultCurrentFarEndA: 300 },
      { id: 'X4', familyId: 'blade-regular', ratingA: 10, upstreamId: 'X1' }, // upstream unusable: chain stops
    ])
    const invalid = byRule(findings, 'protection-input-invalid')
    expect(invalid.map((f) => f.partIds[0]).sort()).toEqual(['X1', 'X2', 'X3'])
    expect(invalid.find((f) => f.partIds[0] === 'X3')!.message).toMatch(/awg-99/)
    expect(byRule(run([], { profile: 'lunar' as never }), 'protection-input-invalid')[0].message).toMatch(/lunar/)
  })
  it('a loop of upstream links ends without hanging', () => {
    const devices = [
      { id: 'A', familyId: 'blade-regular', ratingA: 10, faultCurrentAtDeviceA: 300, upstreamId: 'B' },
      { id: 'B', familyId: 'blade-regular', ratingA: 10, faultCurrentAtDeviceA: 300, upstreamId: 'A' },
    ]
    expect(byRule(run(devices), 'not-selective').length).toBeGreaterThan(0)
  })
})
