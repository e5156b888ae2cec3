import { BRANCH_DISTANCE_LIMITS, maxDeviceRating } from '../_lib/ocpdLimit'
import { fmt } from '../_lib/finite'
import { makeFinding } from '../findings'
import type { Finding } from '../types'
import { ratingPatch, suggestConductor } from './suggest'
import type { Rule } from './types'

/** A device may not be rated above what the conductors it protects can carry. */
export const deviceAboveAmpacityRule: Rule = {
  id: 'device-above-ampacity',
  title: 'Device rated above the conductor it protects',
  severity: 'error',
  source: 'ABYC E-11 §11.10 (not above the ampacity; next size up to 150 %); NEC 240.4(B) and (D) for buildings',
  run(ctx) {
    const findings: Finding[] = []
    for (const d of ctx.devices) {
      // The weakest conductor the device protects sets its ceiling.
      let worst: { conductorId: string; maxRatingA: number; limitA: number; rules: string[] } | null = null
      for (const id of d.protectsConductorIds) {
        const s = ctx.conductorById.get(id)
        if (!s || s.ampacityA === null) continue
        const r = maxDeviceRating(s.conductor, s.ampacityA, ctx.profile, d.device.family)
        if (!r) continue
        const maxRatingA = r.maxRatingA ?? 0
        if (!worst || maxRatingA < worst.maxRatingA) worst = { conductorId: id, maxRatingA, limitA: r.limitA, rules: r.rules }
      }
      if (!worst || d.device.ratingA <= worst.maxRatingA + 1e-9) continue
      const s = ctx.conductorById.get(worst.conductorId)!
      const needA = 1.25 * d.continuousA
      // Lower the device if that still carries the load with margin; otherwise the conductor must grow.
      const suggestion =
        worst.maxRatingA > 0 && worst.maxRatingA >= needA
          ? { text: `Use a ${fmt(worst.maxRatingA)} A device.`, patch: ratingPatch(d.device.partId, d.device.ratingField, worst.maxRatingA) }
          : suggestConductor(ctx, s.conductor, d.device.ratingA, 100, ` to suit the ${fmt(d.device.ratingA)} A device`)
      const branch = s.protection.downstreamDeviceId ? ctx.deviceById.get(s.protection.downstreamDeviceId) : undefined
      const branchNote = branch && s.protection.downstreamRunM !== null
        ? ` Its own device, ${branch.device.label}, sits ${fmt(s.protection.downstreamRunM)} m from the bus (at most ${fmt(s.conductor.sheathed ? BRANCH_DISTANCE_LIMITS.sheathedM : BRANCH_DISTANCE_LIMITS.bareM)} m${s.conductor.sheathed ? '' : `, ${fmt(BRANCH_DISTANCE_LIMITS.sheathedM)} m sheathed`}) and rated ${fmt(branch.device.ratingA)} A.`
        : ''
      findings.push(makeFinding({
        ruleId: this.id, severity: 'error', title: this.title, partIds: [d.device.partId], conductorIds: [worst.conductorId],
        message: `${d.device.label} is rated ${fmt(d.device.ratingA)} A but protects ${s.conductor.label || s.conductor.id}, whose ampacity is ${fmt(s.ampacityA ?? 0)} A: the largest device allowed is ${fmt(worst.maxRatingA)} A (${worst.rules.join('; ')}).${branchNote}`,
        measured: { value: d.device.ratingA, unit: 'A' }, limit: { value: worst.maxRatingA, unit: 'A' }, source: this.source, suggestion,
      }))
    }
    return findings
  },
}
