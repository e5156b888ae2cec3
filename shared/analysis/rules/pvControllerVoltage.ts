import { fmt } from '../_lib/finite'
import { pvMaxVoltageV } from '../_lib/sourceModels'
import { makeFinding } from '../findings'
import type { Finding } from '../types'
import type { Rule } from './types'

/** The array's cold open-circuit voltage must stay under the controller's PV input limit. */
export const pvControllerVoltageRule: Rule = {
  id: 'pv-controller-voltage',
  title: 'PV voltage above the controller input limit',
  severity: 'error',
  source: 'NEC 690.7(A)(1): Voc,max = N × Voc × [1 + β (T_min − 25 °C)] at the record low temperature',
  run(ctx) {
    const findings: Finding[] = []
    for (const g of ctx.pvGroups) {
      for (const a of g.arrays) {
        const vocMaxV = pvMaxVoltageV(a.params)
        if (vocMaxV <= g.controller.params.maxPvVoltageV + 1e-9) continue
        const p = a.params
        const fits = Math.floor(g.controller.params.maxPvVoltageV / (vocMaxV / p.modulesPerString))
        findings.push(makeFinding({
          ruleId: this.id, severity: 'error', title: this.title, partIds: [a.id, g.controller.id].sort(), conductorIds: [],
          message: `${a.label || a.id}: ${p.modulesPerString} × ${fmt(p.moduleVocV)} V at ${fmt(p.recordLowC)} °C (β ${p.vocTempCoeffPctPerC} %/°C) gives ${fmt(vocMaxV)} V, above the ${fmt(g.controller.params.maxPvVoltageV)} V limit of ${g.controller.label || g.controller.id}. The controller can be destroyed on a cold morning.`,
          measured: { value: vocMaxV, unit: 'V' }, limit: { value: g.controller.params.maxPvVoltageV, unit: 'V' }, source: this.source,
          suggestion: fits >= 1
            ? { text: `Use at most ${fits} modules per string.`, patch: { kind: 'part', id: a.id, field: 'params.modulesPerString', value: fits } }
            : { text: 'Choose a controller with a higher PV input voltage.' },
        }))
      }
    }
    return findings
  },
}
