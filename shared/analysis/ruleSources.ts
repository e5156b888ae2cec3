// The README section "Where each engineering rule comes from", built from the source strings the
// code itself carries (rules, tables, bands), so the document cannot drift from what runs.
// tests/unit/analysis/ruleSources.test.ts checks README.md holds exactly this text.
import { CFR_183_425_SOURCE, USCG_BUNDLING_SOURCE } from '../conductors/cfr183'
import { MATERIALS } from '../conductors/materials'
import { ABYC_OCPD_SOURCE, NEC_240_4_B_SOURCE, NEC_240_4_D_SOURCE } from '../conductors/maxOcpd'
import { NEC_310_16_SOURCE, NEC_ADJUSTMENT_SOURCE, NEC_AMBIENT_SOURCE } from '../conductors/nec310'
import { resistanceBasis } from '../conductors/resistance'
import { VOLTAGE_DROP_LIMITS } from '../conductors/voltageDrop'
import { PROTECTION_RULES } from '../protection/checks'
import { DEVICE_FAMILIES } from '../protection/families'
import { NEC_240_6_A_SOURCE } from '../protection/ratings'
import { TIME_CURRENT_FAMILIES } from '../protection/timeCurrent/families'
import { IEC_K_SOURCE, ICEA_SOURCE, shortCircuitLimit } from '../protection/withstand'
import { COORDINATION_RULES, RULES } from './rules'

export const RULE_SOURCES_HEADING = '## Where each engineering rule comes from'

/** How far a source can be trusted, read from its own wording. */
function standing(source: string): string {
  const s = source.toLowerCase()
  if (s.includes('recalled')) return 'recalled, unverified (in part)'
  if (s.includes('common practice')) return 'common practice (in part)'
  return 'published'
}

const cell = (text: string) => text.replace(/\|/g, '\\|').replace(/\n/g, ' ')
const row = (...cells: string[]) => `| ${cells.map(cell).join(' | ')} |`

// Finding ids a protection rule reports besides its own (same module, same source family).
const ALSO_REPORTS: Record<string, string> = {
  'fault-not-cleared-before-damage': 'also `thermal-breaker-sole-protection` (a thermal breaker whose ≈ 0.2 s floor is slower than the withstand)',
  'auto-reset-breaker-not-allowed': 'also `auto-reset-breaker-no-backup` (warning: allowed, but nothing upstream)',
}

export function ruleSourcesMarkdown(): string {
  const lines: string[] = [
    RULE_SOURCES_HEADING,
    '',
    'Generated from the source strings in the code (`shared/analysis/ruleSources.ts`; a unit test keeps this',
    'section equal to it). "Recalled, unverified" marks figures written from memory that no public copy of the',
    'standard confirmed; treat them as such. Every result defers to local codes, the authority having jurisdiction',
    'and licensed practice.',
    '',
    '### Rules (finding ids)',
    '',
    row('Rule id', 'What it checks', 'Source', 'Standing'),
    row('---', '---', '---', '---'),
  ]
  for (const rule of RULES) lines.push(row(`\`${rule.id}\``, rule.title, rule.source, standing(rule.source)))
  for (const rule of PROTECTION_RULES) {
    const also = ALSO_REPORTS[rule.ruleId]
    lines.push(row(`\`${rule.ruleId}\``, also ? `${rule.requirement}; ${also}` : rule.requirement, rule.source, standing(rule.source)))
  }
  lines.push(
    '',
    `The time-current rules run inside \`${COORDINATION_RULES.map((r) => r.id).join('`, `')}\` (on by default; \`analyzeDesign(design, { coordination: false })\` leaves them out).`,
    '',
    '### Tables and their sources',
    '',
    row('Table', 'Source', 'Standing'),
    row('---', '---', '---'),
  )
  const table = (name: string, source: string) => lines.push(row(name, source, standing(source)))
  for (const [id, m] of Object.entries(MATERIALS)) table(`Resistivity and temperature coefficient, ${id}`, m.source)
  table('Conductor resistance, AWG sizes', resistanceBasis('awg-10', 'copper').source)
  table('Conductor resistance, mm² sizes', resistanceBasis('mm2-6', 'copper').source)
  table('Ampacity, buildings (NEC)', NEC_310_16_SOURCE)
  table('Ampacity, boats and vehicles', CFR_183_425_SOURCE)
  table('Derating for ambient temperature (NEC)', NEC_AMBIENT_SOURCE)
  table('Derating for conductors together (NEC)', NEC_ADJUSTMENT_SOURCE)
  table('Derating for bundled conductors (boats and vehicles)', USCG_BUNDLING_SOURCE)
  table('Largest device for a conductor, small sizes (NEC)', NEC_240_4_D_SOURCE)
  table('Largest device for a conductor, next size up (NEC)', NEC_240_4_B_SOURCE)
  table('Largest device for a conductor (boats and vehicles)', ABYC_OCPD_SOURCE)
  for (const [profile, limits] of Object.entries(VOLTAGE_DROP_LIMITS)) table(`Voltage-drop limits, ${profile} profile`, limits.source)
  table('Standard device ratings (generic)', NEC_240_6_A_SOURCE)
  for (const f of Object.values(DEVICE_FAMILIES)) {
    table(`Device family: ${f.label} (ratings)`, f.ratingsSource)
    table(`Device family: ${f.label} (voltage, general)`, f.source)
    if (f.interruptingRating) table(`Device family: ${f.label} (interrupting rating)`, f.interruptingRating.source)
  }
  for (const f of TIME_CURRENT_FAMILIES) table(`Time-current band: ${f.label}`, f.bandAt(10).source)
  table('Conductor short-circuit withstand', ICEA_SOURCE)
  table('Short-circuit temperature, thermoplastic insulation', shortCircuitLimit({ insulationRatingC: 105 }).source)
  table('Short-circuit temperature, thermoset insulation', shortCircuitLimit({ insulationRatingC: 125, insulation: 'thermoset' }).source)
  table('Adiabatic k factors (cross-check)', IEC_K_SOURCE)
  return `${lines.join('\n')}\n`
}
