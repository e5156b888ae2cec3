import { fmt } from '../_lib/finite'
import { makeFinding } from '../findings'
import type { Finding } from '../types'
import type { Rule } from './types'

/** A device's DC voltage rating must cover the highest voltage it can see (cold PV Voc, charge voltage). */
export const deviceVoltageRatingRule: Rule = {
  id: 'device-voltage-rating',
  title: 'Device DC voltage rating too low',
  severity: 'error',
  source: 'NEC 690.7 (PV maximum voltage, coefficient method) and the device DC rating (ISO 8820-3: 32 V / 58 V blade fuses)',
  run(ctx) {
    const findings: Finding[] = []
    for (const d of ctx.devices) {
      if (d.device.dcVoltageRatingV >= d.highestVoltageV - 1e-9) continue
      findings.push(makeFinding({
        ruleId: this.id, severity: 'error', title: this.title, partIds: [d.device.partId], conductorIds: [],
        message: `${d.device.label} is rated ${fmt(d.device.dcVoltageRatingV)} V DC but can see ${fmt(d.highestVoltageV)} V: ${d.highestVoltageBasis}. It may fail to break the arc.`,
        measured: { value: d.highestVoltageV, unit: 'V' }, limit: { value: d.device.dcVoltageRatingV, unit: 'V' }, source: this.source,
        suggestion: { text: `Use a device rated at least ${fmt(Math.ceil(d.highestVoltageV))} V DC${d.topology.side === 'pv' ? ' (a PV fuse 10 × 38 mm, IEC 60269-6 gPV, is made for this)' : ''}.` },
      }))
    }
    return findings
  },
}
