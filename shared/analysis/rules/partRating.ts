import { fmt } from '../_lib/finite'
import { makeFinding } from '../findings'
import type { Finding } from '../types'
import type { Rule } from './types'

const RATED_TYPES = new Set(['bus-bar', 'battery-switch', 'shunt', 'fuse-panel'])

/** Bus bars, switches, shunts and panels carry no more than their continuous rating. */
export const partRatingRule: Rule = {
  id: 'part-rating',
  title: 'Part carries more than its rating',
  severity: 'error',
  source: 'Manufacturer continuous rating (ABYC E-11: components rated for the circuit current; common practice)',
  run(ctx) {
    const findings: Finding[] = []
    for (const part of ctx.design.parts) {
      if (!RATED_TYPES.has(part.type)) continue
      const ratingA = (part.params as { ratingA: number }).ratingA
      const worst = ctx.partMaxCurrent.get(part.id)
      if (!worst || worst.currentA <= ratingA + 1e-9) continue
      findings.push(makeFinding({
        ruleId: this.id, severity: 'error', title: this.title, partIds: [part.id], conductorIds: [],
        message: `${part.label || part.id} carries ${fmt(worst.currentA)} A, above its ${fmt(ratingA)} A rating.`,
        measured: { value: worst.currentA, unit: 'A' }, limit: { value: ratingA, unit: 'A' }, source: this.source, scenarioId: worst.scenarioId,
        suggestion: { text: `Use a part rated at least ${fmt(Math.ceil(worst.currentA))} A.` },
      }))
    }
    return findings
  },
}
