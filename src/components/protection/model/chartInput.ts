import { protectionTopology } from '@shared/analysis/protectionTopology'
import { deviceChainOfPart } from '@shared/analysis/_lib/deviceStats'
import { protectiveDevices, type ProtectiveDevice } from '@shared/analysis/_lib/devices'
import { buildTerminalNodes } from '@shared/analysis/_lib/terminalNodes'
import type { AnalysisResult } from '@shared/analysis/types'
import { conductorSizeLabel, isConductorSizeId } from '@shared/conductors/sizes'
import { DEVICE_FAMILIES, type DeviceFamilyId } from '@shared/protection/ratings'
import { hasTimeCurrentModel, timeCurrentChart, type ChartInput } from '@shared/protection/timeCurrent'
import type { Conductor, Design } from '@shared/design/schema'
import { ADIABATIC_VALID_UP_TO_S } from '@shared/protection/withstand'
import type { TimeCurrentView } from './chartView'

// From an open design and its analysis to the inputs of one device's time-current chart: the device and
// the devices upstream of it, the weakest conductor it protects, its worst continuous current, the
// starts of the loads it feeds and its prospective fault currents. Pure: the dialog only displays it.

export type ChartInputResult = { ok: true; view: TimeCurrentView } | { ok: false; reason: string }

/** How many devices upstream are drawn for comparison (more would bury the chart). */
const MAX_UPSTREAM = 2

const familyLabel = (family: string) => DEVICE_FAMILIES[family as DeviceFamilyId]?.label ?? family
const deviceTitle = (d: ProtectiveDevice) => (d.label.includes(`${d.ratingA} A`) ? d.label : `${d.label} (${d.ratingA} A)`)

function conductorTitle(c: Conductor): string {
  const size = isConductorSizeId(c.sizeId) ? conductorSizeLabel(c.sizeId) : c.sizeId
  return `${c.label || c.id}, ${size} ${c.material}, ${c.insulationRatingC} °C`
}

/** Fuse-panel ways of a part ("panel#way1"…), or the part's own device. */
export function devicesOfPart(design: Design, partId: string): ProtectiveDevice[] {
  return protectiveDevices(design).filter((d) => d.partId === partId)
}

/**
 * Highest current through the device outside start scenarios: a fuse's or breaker's own current, or
 * for a panel way the largest current of the conductors it protects (the first of them carries it all).
 */
function continuousCurrentA(design: Design, analysis: AnalysisResult, device: ProtectiveDevice, protectedIds: string[]): number {
  const startScenarios = new Set(design.scenarios.filter((s) => s.motorStart).map((s) => s.id))
  const ids = new Set(protectedIds)
  let amps = 0
  for (const s of analysis.scenarios) {
    if (startScenarios.has(s.id)) continue
    const own = device.kind === 'panel-way' ? undefined : s.parts.find((p) => p.id === device.partId)?.currentA
    const values = own !== undefined ? [own] : s.conductors.filter((c) => ids.has(c.id)).map((c) => c.currentA)
    for (const v of values) if (Number.isFinite(v)) amps = Math.max(amps, Math.abs(v))
  }
  return amps
}

/** Running current of a load: highest outside start scenarios (analysis), else from its parameters. */
function runningCurrentA(design: Design, analysis: AnalysisResult, loadId: string): number {
  const startScenarios = new Set(design.scenarios.filter((s) => s.motorStart).map((s) => s.id))
  let amps = 0
  for (const s of analysis.scenarios) {
    if (startScenarios.has(s.id)) continue
    const part = s.parts.find((p) => p.id === loadId)
    if (part && Number.isFinite(part.currentA)) amps = Math.max(amps, Math.abs(part.currentA))
  }
  if (amps > 0) return amps
  const load = design.parts.find((p) => p.id === loadId)
  if (load?.type !== 'load') return 0
  const p = load.params
  const fromParams = p.model === 'current' ? (p.currentA ?? 0) : p.model === 'power' ? (p.powerW ?? 0) / design.settings.nominalVoltageV : 0
  return Number.isFinite(fromParams) ? fromParams : 0
}

/**
 * The chart of one protective device (a fuse, a breaker, or a fuse panel's way "panelId#wayN").
 * Never throws: a device without a time-current model, or one the analysis does not know, gives a reason.
 */
export function deviceChartView(design: Design, analysis: AnalysisResult | null, deviceId: string): ChartInputResult {
  const devices = protectiveDevices(design)
  const device = devices.find((d) => d.id === deviceId)
  if (!device) return { ok: false, reason: 'This part is not a fuse, a breaker or a fuse-panel way.' }
  if (!hasTimeCurrentModel(device.family)) return { ok: false, reason: `No time-current band is on file for the family “${familyLabel(device.family)}”.` }
  if (!(device.ratingA > 0)) return { ok: false, reason: 'Enter the device rating to draw its band.' }

  const byId = new Map(devices.map((d) => [d.id, d]))
  const topology = protectionTopology(design, buildTerminalNodes(design), devices)
  const upstream: ProtectiveDevice[] = []
  for (let id = topology.devices.get(deviceId)?.upstreamDeviceId; id && upstream.length < MAX_UPSTREAM; id = topology.devices.get(id)?.upstreamDeviceId) {
    const d = byId.get(id)
    if (d && hasTimeCurrentModel(d.family) && d.ratingA > 0) upstream.push(d)
  }

  const summary = analysis?.devices.find((d) => d.id === deviceId)
  const conductorById = new Map(design.conductors.map((c) => [c.id, c]))
  const protectedConductors = (summary?.protectsConductorIds ?? [])
    .map((id) => ({ design: conductorById.get(id), result: analysis?.conductors.find((c) => c.id === id) }))
    .filter((c): c is { design: Conductor; result: NonNullable<typeof c.result> } => !!c.design && !!c.result)
  const weakest = protectedConductors.reduce<(typeof protectedConductors)[number] | undefined>((w, c) => (!w || c.result.ampacityA < w.result.ampacityA ? c : w), undefined)

  const conductorsAt = new Map<string, Conductor[]>()
  for (const c of design.conductors) for (const partId of new Set([c.from.partId, c.to.partId])) conductorsAt.set(partId, [...(conductorsAt.get(partId) ?? []), c])
  const starts: NonNullable<ChartInput['starts']> = []
  for (const part of design.parts) {
    if (part.type !== 'load' || !part.params.start) continue
    if (!deviceChainOfPart(part.id, design, topology, conductorsAt).includes(deviceId)) continue
    const running = runningCurrentA(design, analysis ?? { scenarios: [], conductors: [], devices: [], findings: [] }, part.id)
    const { inrushMultiple, durationS } = part.params.start
    const currentA = running * inrushMultiple
    if (currentA > 0 && durationS > 0) starts.push({ label: `${part.label || part.id} start: ${inrushMultiple} × ${round(running)} A for ${durationS} s`, currentA, durationS })
  }

  const faults: NonNullable<ChartInput['faults']> = []
  if (summary && summary.faultCurrentA > 0) faults.push({ label: `Fault at the device: ${round(summary.faultCurrentA)} A`, currentA: summary.faultCurrentA })
  if (weakest && weakest.result.faultCurrentFarEndA > 0) {
    faults.push({ label: `Fault at the far end of ${weakest.design.label || weakest.design.id}: ${round(weakest.result.faultCurrentFarEndA)} A`, currentA: weakest.result.faultCurrentFarEndA })
  }
  const continuousA = analysis && summary ? continuousCurrentA(design, analysis, device, summary.protectsConductorIds) : 0

  const input: ChartInput = {
    // A library device's own points replace its family's band (design field params.customDevice).
    device: { id: device.id, familyId: device.family, ratingA: device.ratingA, customDevice: device.customDevice },
    upstream: upstream.map((d) => ({ id: d.id, familyId: d.family, ratingA: d.ratingA, customDevice: d.customDevice })),
    conductor: weakest
      ? { id: weakest.design.id, sizeId: weakest.design.sizeId, material: weakest.design.material, insulationRatingC: weakest.design.insulationRatingC }
      : undefined,
    // Solver round-off (1e-11 A) is not a load.
    continuousCurrentA: continuousA > 1e-6 ? continuousA : undefined,
    starts,
    faults,
  }
  try {
    const chart = timeCurrentChart(input)
    // Every marker inside the current axis (a 5 A load on a 15 A way sits below its half-rating start).
    const markerA = chart.markers.map((m) => m.currentA).filter((a) => Number.isFinite(a) && a > 0)
    const currentAxis: [number, number] = [Math.min(chart.axes.currentA[0], ...markerA.map((a) => a / 1.5)), Math.max(chart.axes.currentA[1], ...markerA.map((a) => a * 1.5))]
    const names = new Map([device, ...upstream].map((d) => [d.id, deviceTitle(d)]))
    return {
      ok: true,
      view: {
        title: deviceTitle(device),
        subtitle: device.customDevice ? `${device.customDevice.name} (library device)` : familyLabel(device.family),
        deviceId: device.id,
        series: chart.series.map((s) => ({
          ...s,
          // The adiabatic relation holds for short faults only: longer times would read as false alarms.
          points: s.kind === 'damage' ? s.points.filter((p) => p.timeS <= ADIABATIC_VALID_UP_TO_S) : s.points,
          label: s.kind === 'damage' && weakest
            ? `${conductorTitle(weakest.design)}: insulation damage (short faults, up to ${ADIABATIC_VALID_UP_TO_S} s)`
            : `${names.get(s.deviceId ?? '') ?? s.deviceId}: ${s.kind === 'min-melt' ? (device.kind === 'breaker' ? 'minimum opening' : 'minimum melting') : 'maximum clearing'}`,
        })),
        markers: chart.markers.map((m) => (m.kind === 'continuous' ? { ...m, label: `Continuous current: ${round(m.currentA)} A` } : m)),
        axes: { currentA: currentAxis, timeS: chart.axes.timeS },
        notes: weakest
          ? [`The damage curve is drawn up to ${ADIABATIC_VALID_UP_TO_S} s: beyond a few seconds heat leaves the conductor and the adiabatic relation no longer applies (overloads are the ampacity check's job).`]
          : ['No protected conductor found below this device: no damage curve drawn.'],
      },
    }
  } catch (error) {
    return { ok: false, reason: `The band could not be drawn (${error instanceof Error ? error.message : String(error)}).` }
  }
}

/** Two significant figures above 10 A, one decimal below: enough for a chart label. */
export function round(amps: number): string {
  if (!Number.isFinite(amps)) return '—'
  return amps >= 100 ? String(Math.round(amps)) : amps >= 10 ? amps.toFixed(0) : amps.toFixed(1)
}
