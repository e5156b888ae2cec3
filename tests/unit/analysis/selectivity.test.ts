import { describe, expect, it } from 'vitest'
import { protectionChecks, type ProtectionDevice } from '../../../shared/protection/checks'

// Selectivity as the analysis now runs it by default: the downstream device's maximum clearing time
// against the upstream device's minimum melting time, both read from the bands at the current a
// downstream fault draws. Figures worked by hand from the band points (shared/protection/timeCurrent,
// recalled values, labelled there). Above a band's last point both curves continue at constant I²t
// (slope −2 on log–log axes), so where both are extended the comparison is the I²t comparison of
// IEC 60269-1 (downstream total clearing I²t below upstream pre-arcing I²t).

const pair = (down: Partial<ProtectionDevice>, up: Partial<ProtectionDevice>): ProtectionDevice[] => [
  { id: 'main', familyId: 'class-t', ratingA: 250, ...up },
  { id: 'branch', familyId: 'blade-regular', ratingA: 10, upstreamId: 'main', ...down },
]
const selectivity = (devices: ProtectionDevice[]) => protectionChecks({ devices }).filter((f) => f.ruleId === 'not-selective')

describe('selectivity between series devices (not-selective, warning)', () => {
  it('a 10 A blade under a 400 A Class T stays selective at 5 kA (both bands extended at constant I²t)', () => {
    // Blade max clearing, last point 6 × 0.1 s: at 5000 A = 500 × → 0.1 · (500/6)^−2 = 14 µs.
    // Class T min melting, last point 10 × 3 ms: at 5000 A = 12.5 × → 0.003 · 1.25^−2 = 1.9 ms.
    expect(selectivity(pair({ faultCurrentAtDeviceA: 5000, faultCurrentFarEndA: 300 }, { ratingA: 400 }))).toEqual([])
  })

  it('a 40 A strip fuse under a 150 A Class T is not selective at 1.38 kA (the old van main)', () => {
    // Strip max clearing, last point 10 × 0.2 s: at 1380 A = 34.5 × → 0.2 · 3.45^−2 = 16.8 ms.
    // Class T min melting between 5 × 50 ms and 10 × 3 ms: at 9.2 × → 0.05 · 1.84^(ln(0.06)/ln 2) = 4.2 ms.
    const found = selectivity(pair({ familyId: 'strip-bolt-down', ratingA: 40, faultCurrentAtDeviceA: 1380 }, { ratingA: 150 }))
    expect(found).toHaveLength(1)
    expect(found[0].severity).toBe('warning')
    expect(found[0].measured!.value).toBeCloseTo(0.2 / 3.45 ** 2, 6)
    expect(found[0].limit!.value).toBeCloseTo(0.05 * 1.84 ** (Math.log(0.06) / Math.LN2), 6)
  })

  it('the same strip fuse under a 250 A Class T (the van as built) is selective at 1.38 kA', () => {
    // Class T at 5.52 × → 0.05 · 1.104^−4.06 = 33 ms > 16.8 ms; a 50 A strip: 0.2 · 2.76^−2 = 26 ms < 33 ms.
    expect(selectivity(pair({ familyId: 'strip-bolt-down', ratingA: 40, faultCurrentAtDeviceA: 1380 }, {}))).toEqual([])
    expect(selectivity(pair({ familyId: 'strip-bolt-down', ratingA: 50, faultCurrentAtDeviceA: 1380 }, {}))).toEqual([])
  })

  it('raises nothing where neither device is sure to open (a fault-clearing matter, not selectivity)', () => {
    // 11 A: blade below its 135 % first clearing point, Class T below its 110 % carry point.
    expect(selectivity(pair({ faultCurrentFarEndA: 11 }, {}))).toEqual([])
  })

  it('a thermal breaker under a fast main fuse is not selective at a high fault: its 0.2 s floor', () => {
    // Thermal breaker: clearing never below 0.2 s (common practice); Class T 100 A at 7.4 × may melt in ≈ 10 ms.
    const found = selectivity(pair({ familyId: 'breaker-thermal-3', faultCurrentAtDeviceA: 740 }, { ratingA: 100 }))
    expect(found).toHaveLength(1)
    expect(found[0].measured!.value).toBe(0.2)
  })
})
