import { makeFinding } from '../findings'
import type { Finding } from '../types'
import type { Rule } from './types'

const SWITCHING_TYPES = new Set(['fuse', 'breaker', 'fuse-panel', 'battery-switch'])

/**
 * Devices that can spark (fuses, breakers, panels, switches) where fuel vapour can collect must be
 * ignition protected. A part is taken to sit in an engine space when a conductor on it is installed
 * there (the design has no part locations).
 */
export const ignitionProtectionRule: Rule = {
  id: 'ignition-protection',
  title: 'Device in an engine space not ignition protected',
  severity: 'error',
  source: '33 CFR 183.410; ISO 8846; SAE J1171 (external ignition protection of marine devices)',
  run(ctx) {
    if (ctx.profile === 'building') return []
    const findings: Finding[] = []
    for (const part of ctx.design.parts) {
      if (!SWITCHING_TYPES.has(part.type)) continue
      const params = part.params as { ignitionProtected?: boolean }
      if (params.ignitionProtected) continue
      const engine = (ctx.conductorsAtPart.get(part.id) ?? []).filter((c) => c.installation === 'engine-space')
      if (engine.length === 0) continue
      findings.push(makeFinding({
        ruleId: this.id, severity: ctx.profile === 'marine' ? 'error' : 'warning', title: this.title,
        partIds: [part.id], conductorIds: engine.map((c) => c.id).sort(),
        message: `${part.label || part.id} is wired with conductors run in an engine space but is not marked ignition protected.${ctx.profile === 'vehicle' ? ' Vehicles: applies where fuel vapour can collect (common practice).' : ''}`,
        source: this.source,
        suggestion: { text: 'Use a device marked ignition protected (SAE J1171 / ISO 8846), or mount it outside the engine space.',
          patch: { kind: 'part', id: part.id, field: 'params.ignitionProtected', value: true } },
      }))
    }
    return findings
  },
}
