// The time-current chart's data: from the demo design (shared/design/demo.ts, our own invented van)
// to labelled series and markers, and from those to chart.js datasets that stay apart in grey-scale.
// Expected figures are worked by hand from the demo's own parameters (named beside each check).
import { describe, expect, it } from 'vitest'
import { analyzeDesign } from '@shared/analysis'
import { customDeviceBand } from '@shared/api/devices.schemas'
import { createDemoDesign } from '@shared/design/demo'
import { deviceChartView, devicesOfPart } from '@/components/protection/model/chartInput'
import { decadeLabel, legendText, timeCurrentConfig, timeCurrentDatasets } from '@/components/protection/model/chartConfig'
import { datasheetView, drawableSeries, viewSources, type TimeCurrentView } from '@/components/protection/model/chartView'

const design = createDemoDesign()
const analysis = analyzeDesign(design)

function pumpView(): TimeCurrentView {
  const result = deviceChartView(design, analysis, 'panel#way3')
  if (!result.ok) throw new Error(result.reason)
  return result.view
}

describe('deviceChartView (demo design, water pump on panel way 3)', () => {
  it('charts the way, the two devices upstream and the pump conductor', () => {
    const view = pumpView()
    expect(view.title).toBe('Habitation fuse panel, way 3 (15 A)')
    const kinds = view.series.map((s) => `${s.kind}:${s.deviceId ?? ''}`)
    // Upstream chain in demo.ts: way 3 ← panel feed fuse 60 A ← main fuse Class T 300 A.
    expect(kinds).toEqual([
      'min-melt:panel#way3', 'max-clear:panel#way3',
      'min-melt:panel-fuse', 'max-clear:panel-fuse',
      'min-melt:main-fuse', 'max-clear:main-fuse',
      'damage:',
    ])
    expect(view.series.at(-1)!.label).toMatch(/^Pump \+, 14 AWG .*105 °C: insulation damage \(short faults, up to 5 s\)$/)
    // ICEA relation drawn only where it holds (withstand.ts ADIABATIC_VALID_UP_TO_S).
    expect(Math.max(...view.series.at(-1)!.points.map((p) => p.timeS))).toBeLessThanOrEqual(5)
  })

  it('marks the pump start, the continuous current and both fault currents', () => {
    const view = pumpView()
    // demo.ts: pump 5 A (current model), start 6 × for 0.3 s → 30 A at 0.3 s.
    const start = view.markers.find((m) => m.kind === 'start')!
    expect(start.currentA).toBeCloseTo(30, 6)
    expect(start.timeS).toBe(0.3)
    expect(start.label).toBe('Water pump start: 6 × 5.0 A for 0.3 s')
    // Outside the start scenario the way carries only the pump's 5 A (night scenario).
    const continuous = view.markers.find((m) => m.kind === 'continuous')!
    expect(continuous.currentA).toBeCloseTo(5, 6)
    const faults = view.markers.filter((m) => m.kind === 'fault')
    const summary = analysis.devices.find((d) => d.id === 'panel#way3')!
    const pumpPos = analysis.conductors.find((c) => c.id === 'pump-pos')!
    expect(faults.map((f) => f.currentA)).toEqual([summary.faultCurrentA, pumpPos.faultCurrentFarEndA])
    // The far end lies behind 2.5 m of 14 AWG each way: less fault current than at the panel.
    expect(faults[1].currentA).toBeLessThan(faults[0].currentA)
  })

  it('never hands NaN or an infinite value to the chart', () => {
    for (const s of drawableSeries(pumpView())) for (const p of s.points) expect(Number.isFinite(p.currentA) && Number.isFinite(p.timeS)).toBe(true)
    const data = timeCurrentDatasets(pumpView()).flatMap((d) => d.data)
    expect(data.every((p) => Number.isFinite(p.x) && Number.isFinite(p.y) && p.x > 0 && p.y > 0)).toBe(true)
  })

  it('lists the ways of a fuse panel and refuses a part without a band', () => {
    expect(devicesOfPart(design, 'panel').map((d) => d.id)).toEqual(['panel#way1', 'panel#way2', 'panel#way3', 'panel#way4', 'panel#way5', 'panel#way6'])
    const notDevice = deviceChartView(design, analysis, 'water-pump')
    expect(notDevice).toEqual({ ok: false, reason: 'This part is not a fuse, a breaker or a fuse-panel way.' })
  })

  it('still draws the bands before the analysis has run (no markers, no damage curve)', () => {
    const result = deviceChartView(design, null, 'inverter-fuse')
    expect(result.ok).toBe(true)
    if (!result.ok) return
    expect(result.view.series.filter((s) => s.kind === 'damage')).toEqual([])
    expect(result.view.markers.filter((m) => m.kind !== 'start')).toEqual([])
    expect(result.view.notes).toEqual(['No protected conductor found below this device: no damage curve drawn.'])
  })
})

describe('chart.js datasets', () => {
  it('gives every kind of line its own dash pattern and colour, and fills only the bands', () => {
    const datasets = timeCurrentDatasets(pumpView())
    const lines = datasets.filter((d) => d.pointStyle === 'line')
    const looks = new Set(lines.map((d) => `${String(d.borderColor)}|${JSON.stringify(d.borderDash ?? [])}`))
    const groups = new Set(lines.map((d) => d.group))
    // Lines of one group (a band's two curves) share a look; different groups never do.
    expect(looks.size).toBe(groups.size)
    expect(datasets.filter((d) => d.fill === '+1').map((d) => d.group)).toEqual(['band:panel#way3', 'band:panel-fuse', 'band:main-fuse'])
    const start = datasets.find((d) => d.pointStyle === 'triangle')!
    expect(start.data).toEqual([{ x: expect.closeTo(30, 6), y: 0.3 }])
  })

  it('has one legend entry per band and per marker', () => {
    const datasets = timeCurrentDatasets(pumpView())
    const entries = datasets.map((_, i) => legendText(datasets, i)).filter((t) => t !== null)
    expect(entries[0]).toBe('Habitation fuse panel, way 3 (15 A): band, minimum melting to maximum clearing')
    expect(entries).toHaveLength(3 + 1 + 4) // three bands, the damage curve, four markers
  })

  it('labels log axes at decades only, without exponents', () => {
    expect([0.001, 0.1, 1, 10, 1000, 10000, 2, 50].map(decadeLabel)).toEqual(['0.001', '0.1', '1', '10', '1\u2009000', '10\u2009000', '', ''])
    const config = timeCurrentConfig(pumpView())
    expect(config.options?.scales?.x).toMatchObject({ type: 'logarithmic', min: expect.closeTo(5 / 1.5, 9), title: { text: 'Current (A)' } })
    expect(config.options?.scales?.y).toMatchObject({ type: 'logarithmic', min: 0.001, max: 10000, title: { text: 'Time (s)' } })
  })
})

describe('datasheetView (device library preview)', () => {
  it('draws a datasheet band through its points and names the source', () => {
    const points = [{ currentA: 27, minMeltS: 120, maxClearS: 1800 }, { currentA: 40, minMeltS: 0.8, maxClearS: 5 }, { currentA: 200, minMeltS: 0.003, maxClearS: 0.02 }]
    const result = customDeviceBand({ name: 'Test fuse', kind: 'fuse', ratingA: 20, timeDelay: false, source: 'invented points', points })
    expect(result.ok).toBe(true)
    if (!result.ok) return
    const view = datasheetView(result.band, 'Test fuse')
    expect(view.series.map((s) => s.kind)).toEqual(['min-melt', 'max-clear'])
    expect(viewSources(view)).toEqual([{ what: 'Device bands', source: 'invented points (user datasheet points)' }])
    // Log–log interpolation runs exactly through the datasheet point (40 A, 5 s).
    expect(result.band.maxClearS(40)).toBeCloseTo(5, 9)
    expect(view.axes.currentA[0]).toBe(10) // half the 20 A rating, the lowest current shown
  })
})
