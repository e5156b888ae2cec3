import type { Design } from '../../shared/design/schema'
import type { AnalysisResult, Finding, Quantity, Severity } from '../../shared/analysis/types'
import { renderTable } from './table'

// The command line's findings report: a per-scenario summary, an aligned table of findings and
// the caution every report carries.

export const CAUTION =
  'Caution: these results are design aids. The installer remains responsible; local codes, the authority having ' +
  'jurisdiction and licensed practice prevail.'

/** PV strings above this open-circuit voltage get a shock-hazard caution (common practice: 60 V DC is
 * the usual upper bound of touch-safe extra-low voltage in dry locations). */
export const PV_CAUTION_ABOVE_V = 60

/** The cautions a design calls for: always the general one, plus lithium and high-voltage PV notes. */
export function designCautions(design: Design): string[] {
  const cautions = [CAUTION]
  if (design.parts.some((p) => p.type === 'battery' && (p.params.chemistry === 'lfp' || p.params.chemistry === 'nmc'))) {
    cautions.push('Lithium batteries: their fault current can exceed what common fuses interrupt; follow the battery ' +
      "maker's instructions for its BMS, main fuse, charging limits and installation.")
  }
  for (const p of design.parts) {
    if (p.type !== 'pv-array') continue
    // Coefficient method (NEC 690.7; standards.md §6): N × Voc × (1 + β/100 × (Tmin − 25 °C)).
    const p1 = p.params
    const vocMaxV = p1.modulesPerString * p1.moduleVocV * (1 + (p1.vocTempCoeffPctPerC / 100) * (p1.recordLowC - 25))
    if (vocMaxV > PV_CAUTION_ABOVE_V) {
      cautions.push(`High-voltage PV: ${p.label || p.id} can reach ${vocMaxV.toFixed(0)} V DC open circuit on a cold morning; ` +
        'treat its wiring as a shock hazard and use PV-rated disconnects and fuses.')
    }
  }
  return cautions
}

const SEVERITY_ORDER: Record<Severity, number> = { error: 0, warning: 1, info: 2 }

export function countBySeverity(findings: readonly Finding[]): Record<Severity, number> {
  const counts: Record<Severity, number> = { error: 0, warning: 0, info: 0 }
  for (const finding of findings) counts[finding.severity] = (counts[finding.severity] ?? 0) + 1
  return counts
}

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`
const describeCounts = (c: Record<Severity, number>) => `${plural(c.error, 'error')}, ${plural(c.warning, 'warning')}, ${c.info} info`

function formatQuantity(q: Quantity | undefined): string {
  if (!q || !Number.isFinite(q.value)) return ''
  const abs = Math.abs(q.value)
  const digits = abs === 0 || abs >= 100 ? 0 : abs >= 10 ? 1 : abs >= 1 ? 2 : 3
  return `${q.value.toFixed(digits)} ${q.unit}`.trim()
}

export function sortFindings(findings: readonly Finding[]): Finding[] {
  return [...findings].sort((a, b) => SEVERITY_ORDER[a.severity] - SEVERITY_ORDER[b.severity] || a.ruleId.localeCompare(b.ruleId))
}

export function formatReport(design: Design, result: AnalysisResult, source: string): string {
  const scenarioNames = new Map(design.scenarios.map((s) => [s.id, s.name]))
  const lines: string[] = [`${design.name} — ${source}`, `${design.settings.nominalVoltageV} V ${design.settings.profile} system, ` +
    `${plural(design.parts.length, 'part')}, ${plural(design.conductors.length, 'conductor')}`, '']
  // Devices whose time-current band comes from their own datasheet points, not their family's.
  for (const part of design.parts) {
    const device = (part.type === 'fuse' || part.type === 'breaker') ? part.params.customDevice : undefined
    if (device) lines.push(`Library device: ${part.label || part.id} uses “${device.name}” (${device.ratingA} A, points from ${device.source})`)
  }
  if (lines.length > 3) lines.push('')

  lines.push('Scenarios')
  lines.push(renderTable(
    [{ header: 'SCENARIO', maxWidth: 32 }, { header: 'SOLVED', maxWidth: 14 }, { header: 'FINDINGS', maxWidth: 40 }],
    result.scenarios.map((s) => [s.name, s.status, describeCounts(countBySeverity(result.findings.filter((f) => f.scenarioId === s.id)))]),
  ))
  const designWide = result.findings.filter((f) => f.scenarioId === undefined)
  if (designWide.length > 0) lines.push(`(not tied to a scenario: ${describeCounts(countBySeverity(designWide))})`)
  lines.push('')

  const findings = sortFindings(result.findings)
  lines.push(`Findings: ${describeCounts(countBySeverity(findings))}`)
  if (findings.length === 0) lines.push('No findings.')
  else {
    lines.push(renderTable(
      [
        { header: 'SEVERITY', maxWidth: 8 }, { header: 'RULE', maxWidth: 26 }, { header: 'FINDING', maxWidth: 34 },
        { header: 'PARTS', maxWidth: 22 }, { header: 'MEASURED', maxWidth: 12 }, { header: 'LIMIT', maxWidth: 12 },
        { header: 'SCENARIO', maxWidth: 18 }, { header: 'SOURCE', maxWidth: 30 }, { header: 'SUGGESTION', maxWidth: 34 },
      ],
      findings.map((f) => [
        f.severity, f.ruleId, f.title, [...f.partIds, ...f.conductorIds].join(', '), formatQuantity(f.measured), formatQuantity(f.limit),
        f.scenarioId === undefined ? 'all' : scenarioNames.get(f.scenarioId) ?? f.scenarioId, f.source, f.suggestion?.text ?? '',
      ]),
    ))
  }
  lines.push('', ...designCautions(design))
  return lines.join('\n')
}

export function reportAsJson(design: Design, result: AnalysisResult, source: string) {
  return {
    file: source,
    design: { id: design.id, name: design.name, nominalVoltageV: design.settings.nominalVoltageV },
    counts: countBySeverity(result.findings),
    scenarios: result.scenarios.map((s) => ({ id: s.id, name: s.name, status: s.status,
      counts: countBySeverity(result.findings.filter((f) => f.scenarioId === s.id)) })),
    findings: sortFindings(result.findings),
    caution: CAUTION,
    cautions: designCautions(design),
  }
}
