import { VOLTAGE_DROP_LIMITS } from '../../conductors/voltageDrop'
import { fmt } from '../_lib/finite'
import { makeFinding } from '../findings'
import type { Finding } from '../types'
import { suggestConductor } from './suggest'
import type { Rule } from './types'

/**
 * Round-trip drop from the bank's terminals to each load against the profile's limit: 3 % for
 * critical loads (and inverter feeders, as main feeders), 10 % for others (ABYC E-11, ISO 10133).
 */
export const voltageDropRule: Rule = {
  id: 'voltage-drop',
  title: 'Voltage drop over its limit',
  severity: 'error',
  source: VOLTAGE_DROP_LIMITS.marine.source,
  run(ctx) {
    const limits = VOLTAGE_DROP_LIMITS[ctx.profile]
    const findings: Finding[] = []
    for (const drop of ctx.loadDrops) {
      const limit = drop.critical ? limits.critical : limits.general
      if (drop.dropPercent <= limit.percent + 1e-9) continue
      const part = ctx.partById.get(drop.partId)
      const name = part?.label || drop.partId
      // Budget left for the load's own pair of conductors once the shared feeders have taken their share.
      const own = drop.conductorIds.map((id) => ctx.conductorById.get(id)).filter((s) => s !== undefined)
      const ownDropV = own.reduce((sum, s) => sum + drop.currentA * s.resistanceOhm, 0)
      const budgetPercent = limit.percent - (drop.dropPercent - (100 * ownDropV) / ctx.nominalV)
      const positive = own.find((s) => s.protection.polarity === 'positive') ?? own[0]
      const suggestion =
        positive && budgetPercent > 0
          ? suggestConductor(ctx, positive.conductor, drop.currentA, budgetPercent, ' and its return')
          : { text: 'The shared feeders already use the whole allowance: enlarge them or shorten the runs.' }
      findings.push(makeFinding({
        ruleId: this.id, severity: ctx.profile === 'building' ? 'warning' : 'error', title: this.title,
        partIds: [drop.partId], conductorIds: [...drop.conductorIds].sort(),
        message: `${name} sees a ${fmt(drop.dropPercent)} % drop (${fmt(drop.dropV)} V at ${fmt(drop.currentA)} A) from the bank; the limit for ${drop.critical ? 'critical' : 'non-critical'} circuits is ${limit.percent} % (${limit.appliesTo}).`,
        measured: { value: drop.dropPercent, unit: '%' }, limit: { value: limit.percent, unit: '%' }, source: limits.source,
        scenarioId: drop.scenarioId, suggestion,
      }))
    }
    return findings
  },
}
