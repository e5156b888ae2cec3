import { fmt } from '../_lib/finite'
import { makeFinding } from '../findings'
import type { Finding } from '../types'
import type { Rule } from './types'

/** A device must be able to interrupt the prospective fault current where it sits. */
export const deviceInterruptingRule: Rule = {
  id: 'device-interrupting-rating',
  title: 'Interrupting rating below the fault current',
  severity: 'error',
  source: 'ABYC E-11 §11.10 interrupting capacity; NEC 110.9 (interrupting rating at least the available fault current)',
  run(ctx) {
    const findings: Finding[] = []
    for (const d of ctx.devices) {
      if (d.faultCurrentA <= d.device.interruptingRatingA + 1e-9) continue
      findings.push(makeFinding({
        ruleId: this.id, severity: 'error', title: this.title, partIds: [d.device.partId], conductorIds: [],
        message: `A short just past ${d.device.label} could draw ${fmt(d.faultCurrentA)} A from the bank, above its interrupting rating of ${fmt(d.device.interruptingRatingA)} A: it could arc over and keep conducting.`,
        measured: { value: d.faultCurrentA, unit: 'A' }, limit: { value: d.device.interruptingRatingA, unit: 'A' }, source: this.source,
        suggestion: { text: `Use a device with an interrupting rating of at least ${fmt(Math.ceil(d.faultCurrentA))} A DC at the system voltage (e.g. Class T, commonly 20 kA DC), or add one upstream that limits the fault.` },
      }))
    }
    return findings
  },
}
