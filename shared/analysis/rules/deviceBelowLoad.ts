import { fmt } from '../_lib/finite'
import { makeFinding } from '../findings'
import type { Finding } from '../types'
import { ratingAtLeast, ratingPatch } from './suggest'
import type { Rule } from './types'

const SOURCE = {
  building: 'NEC 210.20(A) and 215.3: overcurrent device at least 125 % of the continuous load',
  marine: 'Common practice: device at least 125 % of the continuous current (after NEC 210.20(A)); intermittent loads and motor starts left out',
  vehicle: 'Common practice: device at least 125 % of the continuous current (after NEC 210.20(A)); intermittent loads and motor starts left out',
} as const

/**
 * A device must carry its load: below the running current it opens (error); below 125 % of the
 * continuous current it runs hot and nuisance-trips (warning). PV devices follow NEC 690.9(B) instead.
 */
export const deviceBelowLoadRule: Rule = {
  id: 'device-below-load',
  title: 'Device rated below the load it carries',
  severity: 'warning',
  source: SOURCE.building,
  run(ctx) {
    const findings: Finding[] = []
    for (const d of ctx.devices) {
      if (d.topology.side === 'pv') continue
      const { device } = d
      const needA = 1.25 * d.continuousA
      const opens = d.maxCurrentA > device.ratingA + 1e-9 && d.maxScenarioId !== null &&
        !ctx.design.scenarios.find((s) => s.id === d.maxScenarioId)?.motorStart
      if (!opens && device.ratingA >= needA - 1e-9) continue
      const targetA = Math.max(needA, opens ? d.maxCurrentA : 0)
      const next = ratingAtLeast(device.family, targetA)
      const measured = opens ? d.maxCurrentA : d.continuousA
      findings.push(makeFinding({
        ruleId: this.id, severity: opens ? 'error' : 'warning', title: opens ? 'Device will open under normal load' : this.title,
        partIds: [device.partId], conductorIds: [],
        message: opens
          ? `${device.label} (${fmt(device.ratingA)} A) carries ${fmt(d.maxCurrentA)} A: it will open in normal use.`
          : `${device.label} (${fmt(device.ratingA)} A) carries ${fmt(d.continuousA)} A continuously; it should be rated at least 125 % of that, ${fmt(needA)} A.`,
        measured: { value: measured, unit: 'A' }, limit: { value: opens ? device.ratingA : needA, unit: 'A' },
        source: SOURCE[ctx.profile], scenarioId: (opens ? d.maxScenarioId : d.continuousScenarioId) ?? undefined,
        suggestion: next !== null
          ? { text: `Use a ${fmt(next)} A device (and check the conductor can carry it).`, patch: ratingPatch(device.partId, device.ratingField, next) }
          : { text: 'No standard rating of this family is large enough: choose another device family.' },
      }))
    }
    return findings
  },
}
