import type { Conductor } from '../../design/schema'
import { makeFinding } from '../findings'
import type { Finding } from '../types'
import type { Rule } from './types'

/** Parts whose every terminal must be wired to work at all. */
const ALL_TERMINALS_NEEDED = new Set(['battery', 'load', 'inverter', 'fuse', 'breaker', 'battery-switch', 'shunt', 'mains-charger', 'pv-array'])

/** A conductor of `at` ends on this terminal of the part. */
function isWired(at: readonly Conductor[] | undefined, partId: string, terminal: string): boolean {
  if (at) for (const c of at) if ((c.from.partId === partId && c.from.terminal === terminal) || (c.to.partId === partId && c.to.terminal === terminal)) return true
  return false
}

/** Floating parts (nothing wired) and open terminals, named so the designer can find them. */
export const connectivityRule: Rule = {
  id: 'part-not-connected',
  title: 'Part not connected',
  severity: 'warning',
  source: 'Circuit model (every terminal is a node); common practice',
  run(ctx) {
    const findings: Finding[] = []
    for (const part of ctx.design.parts) {
      const terminals = ctx.nodes.byPart.get(part.id)?.terminals ?? []
      // The conductors at this part (the analysis lists them once per part): a terminal is wired when one ends on it.
      const at = ctx.conductorsAtPart.get(part.id)
      let openCount = 0
      for (const t of terminals) if (!isWired(at, part.id, t.id)) openCount++
      if (openCount === 0) continue // the usual case: no list built
      const open = terminals.filter((t) => !isWired(at, part.id, t.id))
      if (open.length === terminals.length && terminals.length > 0) {
        findings.push(makeFinding({ ruleId: this.id, severity: 'warning', title: 'Part not connected', partIds: [part.id], conductorIds: [],
          message: `${part.label || part.id} has no conductor on any terminal; it takes no part in the analysis.`, source: this.source }))
      } else if (open.length > 0 && ALL_TERMINALS_NEEDED.has(part.type)) {
        findings.push(makeFinding({ ruleId: 'terminal-not-connected', severity: 'warning', title: 'Terminal not connected', partIds: [part.id], conductorIds: [],
          message: `${part.label || part.id}: terminal${open.length > 1 ? 's' : ''} ${open.map((t) => t.label).join(', ')} ${open.length > 1 ? 'are' : 'is'} not wired.`, source: this.source }))
      }
    }
    return findings
  },
}

/** A conductor from a positive terminal to a negative one is a short or a miswire. */
export const conductorPolarityRule: Rule = {
  id: 'conductor-polarity',
  title: 'Conductor joins positive to negative',
  severity: 'error',
  source: 'Circuit model (terminal polarity from the part catalogue); common practice',
  run(ctx) {
    const findings: Finding[] = []
    for (let i = 0; i < ctx.design.conductors.length; i++) {
      const c = ctx.design.conductors[i]
      const a = ctx.nodes.conductorFromPolarity[i]
      const b = ctx.nodes.conductorToPolarity[i]
      if (!a || !b || a === b) continue
      findings.push(makeFinding({
        ruleId: this.id, severity: 'error', title: this.title, partIds: [...new Set([c.from.partId, c.to.partId])].sort(), conductorIds: [c.id],
        message: `${c.label || c.id} runs from a ${a} terminal (${c.from.partId}:${c.from.terminal}) to a ${b} one (${c.to.partId}:${c.to.terminal}): a short circuit or a wiring mistake.`,
        source: this.source,
      }))
    }
    return findings
  },
}
