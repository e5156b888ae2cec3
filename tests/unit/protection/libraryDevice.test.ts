import { describe, expect, it } from 'vitest'
import { protectionChecks, type ProtectedConductor } from '@shared/protection/checks'
import { bandOfDevice, deviceBand, embedLibraryDevice, timeCurrentChart, type EmbeddedDevice } from '@shared/protection/timeCurrent'

// A library device embedded in a design: its band is built from its own datasheet points and every
// time-current check and the chart read that band, not the family's. The device below is our own
// invented 10 A time-delay fuse (no product's data); the expected numbers are worked by hand.

const entry = {
  id: 'lib-1',
  name: 'Invented slow fuse 10 A',
  kind: 'fuse' as const,
  ratingA: 10,
  timeDelay: true,
  source: 'invented test datasheet, fig. 1',
  // Mixed as the library stores them: amperes or multiples, one or both times, not in order.
  points: [
    { multiple: 4, minMeltS: 2, maxClearS: 20 },
    { currentA: 15, minMeltS: 3600 },
    { currentA: 20, maxClearS: 3600 },
    { currentA: 100, minMeltS: 0.05, maxClearS: 0.5 },
  ],
}
const device: EmbeddedDevice = embedLibraryDevice(entry)

describe('embedLibraryDevice (library entry → design copy)', () => {
  it('turns multiples into amperes and splits the two curves in current order', () => {
    expect(device.minMeltPoints).toEqual([
      { currentA: 15, timeS: 3600 },
      { currentA: 40, timeS: 2 },
      { currentA: 100, timeS: 0.05 },
    ])
    expect(device.maxClearPoints).toEqual([
      { currentA: 20, timeS: 3600 },
      { currentA: 40, timeS: 20 },
      { currentA: 100, timeS: 0.5 },
    ])
    expect(device.libraryId).toBe('lib-1')
  })
})

describe('bandOfDevice with an embedded device (band from points)', () => {
  const band = bandOfDevice({ familyId: 'blade-regular', ratingA: 10, customDevice: device })
  it('passes through every point it was given', () => {
    for (const p of device.minMeltPoints) expect(band.minMeltS(p.currentA)).toBe(p.timeS)
    for (const p of device.maxClearPoints) expect(band.maxClearS(p.currentA)).toBe(p.timeS)
  })
  it('interpolates on log–log axes between points and extends at constant I²t beyond the last', () => {
    // Log midpoint of (40 A, 20 s) and (100 A, 0.5 s): √(40·100) = 63.25 A → √(20·0.5) = 3.162 s.
    expect(band.maxClearS(Math.sqrt(4000))).toBeCloseTo(Math.sqrt(10), 9)
    // Beyond 100 A: 0.5 s · (100/200)² = 0.125 s (adiabatic slope −2, computed).
    expect(band.maxClearS(200)).toBeCloseTo(0.125, 12)
    // Below the first point the device carries the current.
    expect(band.minMeltS(12)).toBe(Infinity)
  })
  it('names the device and its source, and is not the family band', () => {
    expect(band.source).toMatch(/Invented slow fuse 10 A: invented test datasheet, fig\. 1/)
    expect(band.timeDelay).toBe(true)
    expect(band.maxClearS(40)).not.toBe(deviceBand('blade-regular', 10).maxClearS(40))
  })
  it('without an embedded device is the family band', () => {
    expect(bandOfDevice({ familyId: 'blade-regular', ratingA: 10 })).toBe(deviceBand('blade-regular', 10))
  })
  it('throws a RangeError naming the device when its points cannot make a band', () => {
    const crossing = { ...device, minMeltPoints: [{ currentA: 20, timeS: 9000 }, { currentA: 40, timeS: 30 }] }
    expect(() => bandOfDevice({ familyId: 'blade-regular', ratingA: 10, customDevice: crossing })).toThrow(/Invented slow fuse 10 A/)
  })
})

// 14 AWG copper, 105 °C thermoplastic (limit 150 °C): I²t = (0.040095 · 4106.8)² = 27 113 A²s (ICEA P-32-382,
// worked in checks.test.ts).
const awg14: ProtectedConductor = { id: 'W14', sizeId: 'awg-14', material: 'copper', insulationRatingC: 105, maxDeviceRatingA: 15 }

describe('time-current checks read the embedded band', () => {
  const pump = { loadId: 'pump', runningCurrentA: 8, inrushMultiple: 5, startDurationS: 0.5, isMotor: true }
  it('motor start: the blade family opens on 40 A for 0.5 s; the library device (2 s at 40 A) rides through', () => {
    const generic = protectionChecks({ devices: [{ id: 'F1', familyId: 'blade-regular', ratingA: 10, conductor: awg14, loadStarts: [pump] }] })
    expect(generic.map((f) => f.ruleId)).toEqual(['motor-start-nuisance-open'])
    const library = protectionChecks({ devices: [{ id: 'F1', familyId: 'blade-regular', ratingA: 10, customDevice: device, conductor: awg14, loadStarts: [pump] }] })
    expect(library).toEqual([])
  })
  it('motor start: a longer pulse meets the library band at its own point, and the message names the device', () => {
    const long = { ...pump, startDurationS: 3 } // 40 A for 3 s; the device may open after 2 s (its own point)
    const [f] = protectionChecks({ devices: [{ id: 'F1', familyId: 'blade-regular', ratingA: 10, customDevice: device, loadStarts: [long] }] })
    expect(f.ruleId).toBe('motor-start-nuisance-open')
    expect(f.limit!.value).toBe(2)
    expect(f.message).toMatch(/Invented slow fuse 10 A \(library device\)/)
    expect(f.source).toMatch(/invented test datasheet/)
  })
  it('fault clearing: 200 A at the far end is cleared by the blade family in time, not by the library device', () => {
    // Withstand 27 113 / 200² = 0.678 s. Blade 10 A at 20 In: 0.1 · (6/20)² = 9 ms. Library: 0.125 s (above).
    // At 60 A: withstand 7.53 s; library max clearing by log–log between (40 A, 20 s) and (100 A, 0.5 s):
    // 20 · (60/40)^(ln(0.025)/ln(2.5)) = 20 · 1.5^−4.026 = 3.90 s < 7.53 s. So take a conductor that is weaker.
    const awg18: ProtectedConductor = { ...awg14, id: 'W18', sizeId: 'awg-18' } // I²t = (0.040095 · 1624)² = 4240 A²s
    // Far end 60 A: withstand 4240 / 3600 = 1.18 s; library 3.90 s → not cleared. Blade: 6 In → 0.1 s → cleared.
    const base = { id: 'F1', familyId: 'blade-regular', ratingA: 10, conductor: awg18, faultCurrentFarEndA: 60 }
    expect(protectionChecks({ devices: [base] })).toEqual([])
    const [f] = protectionChecks({ devices: [{ ...base, customDevice: device }] })
    expect(f.ruleId).toBe('fault-not-cleared-before-damage')
    expect(f.measured!.value).toBeCloseTo(20 * Math.pow(1.5, Math.log(0.025) / Math.log(2.5)), 9)
    expect(f.limit!.value / (4240 / 3600)).toBeCloseTo(1, 2)
  })
  it('selectivity: an upstream library device that may melt before the downstream blade clears', () => {
    // 300 A below F2 (blade 15 A, 20 In): max clearing 0.1 · (6/20)² = 9 ms. Upstream library fuse at 300 A:
    // minimum 0.05 · (100/300)² = 5.6 ms < 9 ms → not selective. The generic 40 A strip fuse upstream is.
    const down = { id: 'F2', familyId: 'blade-regular', ratingA: 15, faultCurrentAtDeviceA: 300, upstreamId: 'F1' }
    const generic = protectionChecks({ devices: [down, { id: 'F1', familyId: 'strip-bolt-down', ratingA: 40 }] })
    expect(generic.filter((f) => f.ruleId === 'not-selective')).toEqual([])
    const library = protectionChecks({ devices: [down, { id: 'F1', familyId: 'strip-bolt-down', ratingA: 10, customDevice: device }] })
    const [f] = library.filter((x) => x.ruleId === 'not-selective')
    expect(f.limit!.value).toBeCloseTo(0.05 / 9, 12)
    expect(f.message).toMatch(/library device/)
  })
  it('an embedded device whose points cannot make a band becomes an input finding, not a throw', () => {
    const bad = { ...device, maxClearPoints: [{ currentA: 40, timeS: 1 }] }
    const [f] = protectionChecks({ devices: [{ id: 'F1', familyId: 'blade-regular', ratingA: 10, customDevice: bad }] })
    expect(f.ruleId).toBe('protection-input-invalid')
    expect(f.message).toMatch(/library device "Invented slow fuse 10 A": maxClear/)
  })
})

describe('timeCurrentChart draws the embedded band', () => {
  it('samples the library band, labelled with its source', () => {
    const chart = timeCurrentChart({ device: { id: 'F1', familyId: 'blade-regular', ratingA: 10, customDevice: device } })
    const max = chart.series.find((s) => s.kind === 'max-clear')!
    expect(max.source).toMatch(/Invented slow fuse 10 A/)
    expect(max.points.length).toBeGreaterThan(10)
    const band = bandOfDevice({ familyId: 'blade-regular', ratingA: 10, customDevice: device })
    for (const p of max.points) expect(p.timeS).toBe(band.maxClearS(p.currentA))
  })
})
