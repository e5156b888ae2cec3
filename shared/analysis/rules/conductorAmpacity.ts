import { fmt } from '../_lib/finite'
import { makeFinding } from '../findings'
import type { Finding } from '../types'
import { suggestConductor } from './suggest'
import type { Rule } from './types'

const SOURCE_BY_PROFILE = {
  building: 'NEC (NFPA 70) Table 310.16 with 310.15(B)(1) temperature correction and 310.15(C)(1) adjustment',
  marine: '33 CFR 183.425 Table 5 (same values as ABYC E-11), engine-space and bundling factors',
  vehicle: '33 CFR 183.425 Table 5 applied to vehicles (common practice)',
} as const

/** The highest running current (motor starts left out) must not exceed the conductor's derated ampacity. */
export const conductorAmpacityRule: Rule = {
  id: 'conductor-ampacity',
  title: 'Conductor over its ampacity',
  severity: 'error',
  source: SOURCE_BY_PROFILE.marine,
  run(ctx) {
    const findings: Finding[] = []
    const source = SOURCE_BY_PROFILE[ctx.profile]
    for (const s of ctx.conductors) {
      const c = s.conductor
      const name = c.label || c.id
      if (s.ampacityA === null) {
        if (s.steadyCurrentA > 0)
          findings.push(makeFinding({ ruleId: this.id, severity: 'warning', title: 'No ampacity on file for this conductor', partIds: [], conductorIds: [c.id],
            message: `${name}: ${s.ampacitySource}. Its current (${fmt(s.steadyCurrentA)} A) could not be checked.`, source }))
        continue
      }
      if (s.steadyCurrentA <= s.ampacityA + 1e-9) continue
      findings.push(makeFinding({
        ruleId: this.id, severity: 'error', title: this.title, partIds: [], conductorIds: [c.id],
        message: `${name} carries ${fmt(s.steadyCurrentA)} A but its ampacity is ${fmt(s.ampacityA)} A (${s.ampacitySource}).`,
        measured: { value: s.steadyCurrentA, unit: 'A' }, limit: { value: s.ampacityA, unit: 'A' }, source,
        scenarioId: s.steadyScenarioId ?? undefined,
        suggestion: suggestConductor(ctx, c, s.steadyCurrentA),
      }))
    }
    return findings
  },
}
