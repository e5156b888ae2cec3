import { CHART_TIME_RANGE_S, type ChartMarker, type ChartSeries } from '@shared/protection/timeCurrent'
import type { ChartPoint, DeviceBand } from '@shared/protection/timeCurrent/types'

// What the time-current chart component draws: labelled series and markers on fixed axes, with the
// sources to print under it. Built from a design (chartInput.ts) or from one datasheet band (below).

export interface TimeCurrentView {
  /** The device charted, e.g. "Habitation fuse panel, way 3 (15 A)". */
  title: string
  subtitle?: string
  deviceId?: string
  series: ChartSeries[]
  markers: ChartMarker[]
  axes: { currentA: readonly [number, number]; timeS: readonly [number, number] }
  /** Plain remarks shown under the chart (what is missing and why). */
  notes: string[]
}

const finitePoint = (p: ChartPoint) => Number.isFinite(p.currentA) && Number.isFinite(p.timeS) && p.currentA > 0 && p.timeS > 0
const inTimeRange = (p: ChartPoint) => finitePoint(p) && p.timeS >= CHART_TIME_RANGE_S[0] && p.timeS <= CHART_TIME_RANGE_S[1]

/** A series is drawable when it keeps at least two finite points inside the axes. */
export function drawableSeries(view: TimeCurrentView): ChartSeries[] {
  return view.series.map((s) => ({ ...s, points: s.points.filter(inTimeRange) })).filter((s) => s.points.length >= 2)
}

export function drawableMarkers(view: TimeCurrentView): ChartMarker[] {
  return view.markers.filter((m) => Number.isFinite(m.currentA) && m.currentA > 0 && (m.timeS === undefined || (Number.isFinite(m.timeS) && m.timeS > 0)))
}

/** The sources named under the chart, one line per distinct source. */
export function viewSources(view: TimeCurrentView): { what: string; source: string }[] {
  const seen = new Map<string, string>()
  for (const s of view.series) {
    const what = s.kind === 'damage' ? 'Conductor damage curve' : 'Device bands'
    if (!seen.has(s.source)) seen.set(s.source, what)
  }
  return [...seen].map(([source, what]) => ({ what, source }))
}

/** The chart of a datasheet band alone (device-library preview). */
export function datasheetView(band: DeviceBand, name: string): TimeCurrentView {
  const minMelt = band.points.minMelt.filter(finitePoint)
  const maxClear = band.points.maxClear.filter(finitePoint)
  const currents = [...minMelt, ...maxClear, ...band.points.anchors].map((p) => p.currentA).filter((a) => Number.isFinite(a) && a > 0)
  const lowA = currents.length ? Math.min(...currents) : band.ratingA
  const highA = currents.length ? Math.max(...currents) : band.ratingA
  const id = band.familyId
  const title = name.includes(`${band.ratingA} A`) ? name : `${name} (${band.ratingA} A)`
  return {
    title,
    subtitle: 'Datasheet points',
    deviceId: id,
    series: [
      { id: `${id}:min`, kind: 'min-melt', deviceId: id, label: `${title}: ${band.kind === 'fuse' ? 'minimum melting' : 'minimum opening'}`, points: minMelt, source: band.source },
      { id: `${id}:max`, kind: 'max-clear', deviceId: id, label: `${title}: maximum clearing`, points: maxClear, source: band.source },
    ],
    markers: [],
    axes: { currentA: [0.5 * Math.min(lowA, band.ratingA), 2 * highA], timeS: CHART_TIME_RANGE_S },
    notes: [],
  }
}
