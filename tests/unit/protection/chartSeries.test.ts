import { describe, expect, it } from 'vitest'
import { deviceBand, timeCurrentChart } from '@shared/protection/timeCurrent'

// Chart data for a motor circuit: 15 A blade under a 100 A Class T, 14 AWG 105 °C copper,
// a 40 A start for 0.5 s (5 × 8 A, common practice) and a 500 A far-end fault.
const chart = timeCurrentChart({
  device: { id: 'F1', familyId: 'blade-regular', ratingA: 15 },
  upstream: [{ id: 'T1', familyId: 'class-t', ratingA: 100 }],
  conductor: { id: 'W1', sizeId: 'awg-14', material: 'copper', insulationRatingC: 105 },
  continuousCurrentA: 8,
  starts: [{ label: 'pump start', currentA: 40, durationS: 0.5 }],
  faults: [{ label: 'far-end fault', currentA: 500 }],
})

describe('timeCurrentChart', () => {
  it('has both band curves of each device and the damage curve, each with its source', () => {
    expect(chart.series.map((s) => s.id)).toEqual(['F1:min', 'F1:max', 'T1:min', 'T1:max', 'W1:damage'])
    for (const s of chart.series) {
      expect(s.points.length).toBeGreaterThan(5)
      expect(s.source.length).toBeGreaterThan(10)
    }
  })
  it('keeps every point on the axes, and the axes span half the smallest rating to 100 × the largest', () => {
    expect(chart.axes.currentA).toEqual([7.5, 10_000])
    for (const s of chart.series) for (const p of s.points) {
      expect(p.timeS).toBeGreaterThanOrEqual(chart.axes.timeS[0])
      expect(p.timeS).toBeLessThanOrEqual(chart.axes.timeS[1])
    }
  })
  it('samples the band functions themselves', () => {
    const band = deviceBand('blade-regular', 15)
    for (const p of chart.series[1].points) expect(p.timeS).toBe(band.maxClearS(p.currentA))
  })
  it('damage curve: I²t = (0.040095 × 4 106.8)² ≈ 27 113 A²s (ICEA, 105 → 150 °C), by hand', () => {
    for (const p of chart.series[4].points) expect(Math.abs((p.currentA ** 2 * p.timeS) / 27_113 - 1)).toBeLessThan(2e-3)
  })
  it('markers: continuous current, the start point and the fault line', () => {
    expect(chart.markers).toEqual([
      { kind: 'continuous', label: 'Continuous current', currentA: 8 },
      { kind: 'start', label: 'pump start', currentA: 40, timeS: 0.5 },
      { kind: 'fault', label: 'far-end fault', currentA: 500 },
    ])
  })
})
