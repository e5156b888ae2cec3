import { getConductorSize, sizesInOrder } from '../../conductors/sizes'
import { ampacityOf } from '../_lib/conductorStats'
import { fmt } from '../_lib/finite'
import { makeFinding } from '../findings'
import type { Finding } from '../types'
import { ratingAtLeast, ratingPatch } from './suggest'
import type { ConductorStats, Rule, RuleContext } from './types'

const SOURCE = 'NEC 690.8(A)(1) (Σ Isc × 1.25) and 690.8(B) (conductor: 1.25 × that before correction, and that after); 690.9(B) (device ≥ 1.25 × that)'

/** NEC 690.8(A)(1): maximum PV circuit current of the strings a conductor carries. */
const pvCircuitCurrentA = (s: NonNullable<ConductorStats['pv']>) =>
  1.25 * s.arrays.reduce((max, a) => Math.max(max, a.params.moduleIscA), 0) * s.strings

/** PV conductors and PV-side devices sized from Isc × 1.25 × 1.25. */
export const pvCircuitSizingRule: Rule = {
  id: 'pv-circuit-sizing',
  title: 'PV circuit under-sized for Isc × 1.25 × 1.25',
  severity: 'error',
  source: SOURCE,
  run(ctx) {
    const findings: Finding[] = []
    for (const s of ctx.conductors) {
      if (!s.pv || s.ampacity?.baseAmpacityA == null || s.ampacityA === null) continue
      const currentA = pvCircuitCurrentA(s.pv)
      const baseNeedA = 1.25 * currentA
      if (s.ampacity.baseAmpacityA >= baseNeedA - 1e-9 && s.ampacityA >= currentA - 1e-9) continue
      const shortBase = s.ampacity.baseAmpacityA < baseNeedA - 1e-9
      const better = largerPassingSize(ctx, s, currentA)
      findings.push(makeFinding({
        ruleId: this.id, severity: 'error', title: 'PV conductor under-sized', partIds: [], conductorIds: [s.conductor.id],
        message: shortBase
          ? `${s.conductor.label || s.conductor.id} carries ${s.pv.strings} string(s): 690.8(A) current ${fmt(currentA)} A, so its table ampacity must be at least 1.25 × that, ${fmt(baseNeedA)} A; it is ${fmt(s.ampacity.baseAmpacityA)} A.`
          : `${s.conductor.label || s.conductor.id}: after derating its ampacity is ${fmt(s.ampacityA)} A, below the 690.8(A) current ${fmt(currentA)} A.`,
        measured: { value: shortBase ? s.ampacity.baseAmpacityA : s.ampacityA, unit: 'A' }, limit: { value: shortBase ? baseNeedA : currentA, unit: 'A' },
        source: SOURCE,
        suggestion: better ? { text: `Use ${getConductorSize(better).label}.`, patch: { kind: 'conductor', id: s.conductor.id, field: 'sizeId', value: better } } : undefined,
      }))
    }
    for (const d of ctx.devices) {
      if (d.topology.side !== 'pv') continue
      const strings = Math.max(0, ...d.protectsConductorIds.map((id) => ctx.conductorById.get(id)?.pv?.strings ?? 0))
      const pv = d.protectsConductorIds.map((id) => ctx.conductorById.get(id)?.pv).find((p) => p)
      if (!pv || strings === 0) continue
      const needA = 1.25 * pvCircuitCurrentA({ ...pv, strings })
      if (d.device.ratingA >= needA - 1e-9) continue
      const next = ratingAtLeast(d.device.family, needA)
      findings.push(makeFinding({
        ruleId: this.id, severity: 'error', title: 'PV fuse or breaker rated too low', partIds: [d.device.partId], conductorIds: [],
        message: `${d.device.label} (${fmt(d.device.ratingA)} A) protects ${strings} string(s); NEC 690.9(B) asks for at least 1.25 × 1.25 × Isc = ${fmt(needA)} A, or it will open on a bright day.`,
        measured: { value: d.device.ratingA, unit: 'A' }, limit: { value: needA, unit: 'A' }, source: SOURCE,
        suggestion: next !== null ? { text: `Use a ${fmt(next)} A device (not above the module's maximum series fuse).`, patch: ratingPatch(d.device.partId, d.device.ratingField, next) } : undefined,
      }))
    }
    return findings
  },
}

function largerPassingSize(ctx: RuleContext, s: ConductorStats, currentA: number): string | null {
  const size = getConductorSize(s.conductor.sizeId)
  for (const candidate of sizesInOrder(size.system)) {
    if (candidate.rank <= size.rank) continue
    const { result } = ampacityOf(s.conductor, ctx.design, ctx.nominalV, undefined, candidate.id)
    if (result?.ampacityA != null && result.baseAmpacityA != null && result.baseAmpacityA >= 1.25 * currentA && result.ampacityA >= currentA) return candidate.id
  }
  return null
}
