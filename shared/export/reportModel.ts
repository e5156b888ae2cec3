import type { AnalysisResult, Finding, Quantity, Severity } from '../analysis/types'
import { getConductorSize } from '../conductors/sizes'
import type { Design, Part } from '../design/schema'
import { DEVICE_FAMILIES } from '../protection/ratings'
import { formatNumber, formatSignificant } from '../units/format'
import { designCautions, stringVocAtRecordLowV } from './cautions'
import type { TitleBlockInfo } from './titleBlock'

// Everything the PDF report prints, as plain text tables: computed once here from the design and the
// shared analysis, so the PDF code only lays it out.

export interface ReportTable {
  columns: { header: string; weight: number; align?: 'left' | 'right' }[]
  rows: string[][]
}

export interface ReportFinding {
  number: number
  severity: Severity
  title: string
  ruleId: string
  message: string
  targets: string
  measured: string
  limit: string
  scenario: string
  source: string
  suggestion: string
}

export interface ReportModel {
  info: TitleBlockInfo
  summary: string[]
  energy: ReportTable
  scenarios: ReportTable
  conductors: ReportTable
  devices: ReportTable
  findings: ReportFinding[]
  cautions: string[]
}

/** The device column: the family, or a library device's own name beside its family. */
function deviceFamilyText(params: Extract<Part, { type: 'fuse' | 'breaker' | 'fuse-panel' }>['params']): string {
  const family = DEVICE_FAMILIES[params.family]?.label ?? params.family
  const custom = 'customDevice' in params ? params.customDevice : undefined
  return custom ? `${custom.name} (library device; ${family})` : family
}

const SEVERITY_RANK: Record<Severity, number> = { error: 0, warning: 1, info: 2 }
const f = formatNumber
const q = (x: Quantity | undefined) => (x ? `${formatSignificant(x.value, 3)} ${x.unit}`.trim() : '')

/** A load's power at full level, W: constant power, current × nominal voltage, or V² / R. */
export function loadPowerW(part: Extract<Part, { type: 'load' }>, nominalV: number): number {
  const p = part.params
  if (p.model === 'power') return p.powerW ?? 0
  if (p.model === 'current') return (p.currentA ?? 0) * nominalV
  return p.resistanceOhm ? (nominalV * nominalV) / p.resistanceOhm : 0
}

export function sortedFindings(findings: readonly Finding[]): Finding[] {
  return [...findings].sort((a, b) => SEVERITY_RANK[a.severity] - SEVERITY_RANK[b.severity])
}

export function buildReportModel(design: Design, analysis: AnalysisResult, info: TitleBlockInfo): ReportModel {
  const nominalV = design.settings.nominalVoltageV
  const partById = new Map(design.parts.map((p) => [p.id, p]))
  const name = (id: string) => partById.get(id)?.label || id
  const conductorName = new Map(design.conductors.map((c) => [c.id, c.label || c.id]))

  const loads = design.parts.filter((p): p is Extract<Part, { type: 'load' }> => p.type === 'load')
  const dailyWh = loads.reduce((s, l) => s + loadPowerW(l, nominalV) * l.params.hoursPerDay, 0)
  const banks = design.parts.filter((p): p is Extract<Part, { type: 'battery' }> => p.type === 'battery')
  const bankWh = banks.reduce((s, b) => s + b.params.nominalVoltageV * b.params.seriesCount * b.params.capacityAh * b.params.parallelCount, 0)
  const arrays = design.parts.filter((p): p is Extract<Part, { type: 'pv-array' }> => p.type === 'pv-array')
  const pvW = arrays.reduce((s, a) => s + a.params.moduleVmpV * a.params.moduleImpA * a.params.modulesPerString * a.params.strings, 0)
  const counts = { error: 0, warning: 0, info: 0 }
  for (const finding of analysis.findings) counts[finding.severity] += 1

  const summary = [
    `${design.name}: ${nominalV} V ${design.settings.profile} system; ${design.parts.length} parts, ${design.conductors.length} conductors, ${design.scenarios.length} scenarios.`,
    `Battery storage: ${f(bankWh / 1000, 2)} kWh nominal in ${banks.length} bank(s); PV: ${f(pvW, 0)} W at maximum power in ${arrays.length} array(s).`,
    ...arrays.map((a) => `${a.label || a.id}: string Voc at the record low of ${a.params.recordLowC} °C is ${f(stringVocAtRecordLowV(a.params), 1)} V (NEC 690.7(A) coefficient method).`),
    `Daily load energy: ${f(dailyWh, 0)} Wh (${f(dailyWh / nominalV, 1)} Ah at ${nominalV} V) from the loads' power and hours per day; inverter loads are not in this figure.`,
    `Findings: ${counts.error} errors, ${counts.warning} warnings, ${counts.info} notes — worst case over the scenarios.`,
  ]

  const energy: ReportTable = {
    columns: [{ header: 'Load', weight: 3 }, { header: 'Power W', weight: 1, align: 'right' }, { header: 'Hours/day', weight: 1, align: 'right' },
      { header: 'Wh/day', weight: 1, align: 'right' }, { header: 'Duty', weight: 1.2 }, { header: 'Critical', weight: 0.8 }],
    rows: loads.map((l) => [l.label || l.id, f(loadPowerW(l, nominalV), 1), f(l.params.hoursPerDay, 1), f(loadPowerW(l, nominalV) * l.params.hoursPerDay, 0),
      l.params.duty, l.params.critical ? 'yes' : 'no']),
  }

  const scenarios: ReportTable = {
    columns: [{ header: 'Scenario', weight: 2.5 }, { header: 'Solved', weight: 1.2 }, { header: 'Load power W', weight: 1.2, align: 'right' },
      { header: 'Battery current A (+ discharge)', weight: 1.8, align: 'right' }, { header: 'Lowest load voltage V', weight: 1.5, align: 'right' }],
    rows: analysis.scenarios.map((s) => {
      const typeOf = (id: string) => partById.get(id)?.type
      const loadW = s.parts.filter((p) => typeOf(p.id) === 'load' || typeOf(p.id) === 'inverter').reduce((sum, p) => sum + Math.max(0, p.powerW), 0)
      const batteryA = s.parts.filter((p) => typeOf(p.id) === 'battery').reduce((sum, p) => sum + p.currentA, 0)
      const loadV = s.parts.filter((p) => typeOf(p.id) === 'load' && p.currentA > 1e-6).map((p) => p.voltageV)
      return [s.name, s.status, f(loadW, 0), f(batteryA, 1), loadV.length ? f(Math.min(...loadV), 2) : '—']
    }),
  }

  const summaryById = new Map(analysis.conductors.map((c) => [c.id, c]))
  const conductors: ReportTable = {
    columns: [{ header: 'Conductor', weight: 2.4 }, { header: 'From → to', weight: 3 }, { header: 'Size', weight: 1 }, { header: 'Length m', weight: 0.9, align: 'right' },
      { header: 'Max A', weight: 0.9, align: 'right' }, { header: 'Ampacity A', weight: 1, align: 'right' }, { header: 'Drop %', weight: 0.8, align: 'right' },
      { header: 'Protected by', weight: 1.8 }, { header: 'Fault A far end', weight: 1.1, align: 'right' }],
    rows: design.conductors.map((c) => {
      const s = summaryById.get(c.id)
      let size: string = c.sizeId
      try { size = getConductorSize(c.sizeId).label } catch { /* unknown ids cannot pass parseDesign */ }
      return [c.label || c.id, `${name(c.from.partId)}.${c.from.terminal} → ${name(c.to.partId)}.${c.to.terminal}`, size, f(c.lengthM, 2),
        f(s?.maxCurrentA, 1), f(s?.ampacityA, 0), f(s?.dropPercentMax, 2), s?.protectingDeviceId ? name(s.protectingDeviceId.split('#')[0]) + (s.protectingDeviceId.includes('#') ? ` ${s.protectingDeviceId.split('#')[1]}` : '') : 'none',
        f(s?.faultCurrentFarEndA, 0)]
    }),
  }

  const devices: ReportTable = {
    columns: [{ header: 'Device', weight: 2.6 }, { header: 'Family', weight: 2.6 }, { header: 'Rating A', weight: 0.9, align: 'right' },
      { header: 'Max A', weight: 0.9, align: 'right' }, { header: 'Fault A', weight: 1, align: 'right' }, { header: 'Interrupting A', weight: 1.1, align: 'right' },
      { header: 'DC V rating', weight: 0.9, align: 'right' }, { header: 'Protects', weight: 2.4 }],
    rows: analysis.devices.map((d) => {
      const part = partById.get(d.partId)
      const params = part && (part.type === 'fuse' || part.type === 'breaker' || part.type === 'fuse-panel') ? part.params : undefined
      const way = d.id.includes('#') ? ` ${d.id.split('#')[1]}` : ''
      return [`${name(d.partId)}${way}`, params ? deviceFamilyText(params) : '', f(d.ratingA, 1), f(d.maxCurrentA, 1),
        f(d.faultCurrentA, 0), params ? f(params.interruptingRatingA, 0) : '', params ? f(params.dcVoltageRatingV, 0) : '',
        d.protectsConductorIds.map((id) => conductorName.get(id) ?? id).join(', ')]
    }),
  }

  const scenarioName = new Map(design.scenarios.map((s) => [s.id, s.name]))
  const findings: ReportFinding[] = sortedFindings(analysis.findings).map((x, i) => ({
    number: i + 1, severity: x.severity, title: x.title, ruleId: x.ruleId, message: x.message,
    targets: [...x.partIds.map(name), ...x.conductorIds.map((id) => conductorName.get(id) ?? id)].join(', '),
    measured: q(x.measured), limit: q(x.limit),
    scenario: x.scenarioId === undefined ? 'all scenarios' : scenarioName.get(x.scenarioId) ?? x.scenarioId,
    source: x.source, suggestion: x.suggestion?.text ?? '',
  }))

  return { info, summary, energy, scenarios, conductors, devices, findings, cautions: designCautions(design) }
}
