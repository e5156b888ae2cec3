import { shortCircuitLimit, withstandI2tA2s, type WithstandOptions } from '../withstand'
import type { ProtectedConductor } from '../checks/types'
import { logSpace } from './_lib/logLog'
import { bandOfDevice, type EmbeddedDevice } from './libraryDevice'
import type { ChartPoint } from './types'

// Everything a log–log time-current chart of one device needs, as plain series: its band, the bands
// upstream, the conductor's damage curve, and markers for the continuous current, the load starts and
// the prospective fault currents. Pure data: the editor view draws it.

export const CHART_TIME_RANGE_S: readonly [number, number] = [0.001, 10_000]
const SAMPLES = 80

export interface ChartDevice {
  id: string
  familyId: string
  ratingA: number
  /** A library device's own points, drawn instead of the family's band. */
  customDevice?: EmbeddedDevice
}

export interface ChartSeries {
  id: string
  kind: 'min-melt' | 'max-clear' | 'damage'
  deviceId?: string
  label: string
  points: ChartPoint[]
  source: string
}

export interface ChartMarker {
  kind: 'continuous' | 'start' | 'fault'
  label: string
  currentA: number
  /** Set for a point (a start pulse); absent for a vertical line at a current. */
  timeS?: number
}

export interface ChartInput {
  device: ChartDevice
  upstream?: ChartDevice[]
  conductor?: ProtectedConductor
  continuousCurrentA?: number
  starts?: { label: string; currentA: number; durationS: number }[]
  faults?: { label: string; currentA: number }[]
}

const inTimeRange = (p: ChartPoint) => Number.isFinite(p.timeS) && p.timeS >= CHART_TIME_RANGE_S[0] && p.timeS <= CHART_TIME_RANGE_S[1]

function bandSeries(device: ChartDevice, currentsA: number[]): ChartSeries[] {
  const band = bandOfDevice(device)
  const sample = (fn: (a: number) => number) => currentsA.map((currentA) => ({ currentA, timeS: fn(currentA) })).filter(inTimeRange)
  return [
    { id: `${device.id}:min`, kind: 'min-melt', deviceId: device.id, label: `${device.id} minimum melting`, points: sample(band.minMeltS), source: band.source },
    { id: `${device.id}:max`, kind: 'max-clear', deviceId: device.id, label: `${device.id} maximum clearing`, points: sample(band.maxClearS), source: band.source },
  ]
}

function damageSeries(conductor: ProtectedConductor, currentsA: number[]): ChartSeries {
  const limit = shortCircuitLimit({ insulationRatingC: conductor.insulationRatingC, insulation: conductor.insulation })
  const initialC = conductor.operatingC ?? conductor.insulationRatingC
  const options: WithstandOptions = { ...conductor, initialC, finalC: limit.finalC }
  const i2t = initialC < limit.finalC ? withstandI2tA2s(options) : 0
  return {
    id: `${conductor.id}:damage`,
    kind: 'damage',
    label: `${conductor.id} insulation damage (${limit.finalC} °C)`,
    points: currentsA.map((currentA) => ({ currentA, timeS: i2t / (currentA * currentA) })).filter(inTimeRange),
    source: `ICEA P-32-382 adiabatic relation; ${limit.source}`,
  }
}

/**
 * Series and markers for the chart of one device, on a current axis from half its rating to twice the
 * largest fault (at least 100 × its rating). Throws a RangeError for an unknown family or size.
 * @example timeCurrentChart({ device: { id: 'F1', familyId: 'blade-regular', ratingA: 15 } }).series.length // 2
 */
export function timeCurrentChart(input: ChartInput) {
  const ratings = [input.device, ...(input.upstream ?? [])].map((d) => d.ratingA)
  const faultMaxA = Math.max(0, ...(input.faults ?? []).map((f) => f.currentA))
  const currentRangeA: [number, number] = [0.5 * Math.min(...ratings), Math.max(100 * Math.max(...ratings), 2 * faultMaxA)]
  const currentsA = logSpace(currentRangeA[0], currentRangeA[1], SAMPLES)
  const series: ChartSeries[] = [input.device, ...(input.upstream ?? [])].flatMap((d) => bandSeries(d, currentsA))
  if (input.conductor) series.push(damageSeries(input.conductor, currentsA))
  const markers: ChartMarker[] = [
    ...(input.continuousCurrentA ? [{ kind: 'continuous' as const, label: 'Continuous current', currentA: input.continuousCurrentA }] : []),
    ...(input.starts ?? []).map((s) => ({ kind: 'start' as const, label: s.label, currentA: s.currentA, timeS: s.durationS })),
    ...(input.faults ?? []).map((f) => ({ kind: 'fault' as const, label: f.label, currentA: f.currentA })),
  ]
  return { series, markers, axes: { currentA: currentRangeA, timeS: CHART_TIME_RANGE_S } }
}
