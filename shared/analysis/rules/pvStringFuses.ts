import { fmt } from '../_lib/finite'
import { nodeAt } from '../_lib/terminalNodes'
import { makeFinding } from '../findings'
import type { Finding } from '../types'
import { ratingAtMost, ratingPatch } from './suggest'
import type { Rule, RuleContext } from './types'

const SOURCE = 'NEC 690.9(A): string fuses unless the current from all other parallel strings, (N − 1) × 1.25 × Isc, is within the module\'s maximum series fuse (its informational worked example); 690.9(B)'

interface OwnRegion {
  nodes: Set<number>
  deviceIds: string[]
}

/** Conductors reachable from an array's positive before any protective device. */
function unfusedRegion(ctx: RuleContext, start: number, adjacency: Map<number, number[]>, deviceAtNode: Map<number, string[]>): OwnRegion {
  const nodes = new Set<number>([start])
  const deviceIds: string[] = []
  const stack = [start]
  while (stack.length > 0) {
    const n = stack.pop()!
    const devices = deviceAtNode.get(n)
    if (devices && n !== start) { deviceIds.push(...devices); continue }
    if (devices && n === start) deviceIds.push(...devices)
    for (const m of adjacency.get(n) ?? []) if (!nodes.has(m)) { nodes.add(m); stack.push(m) }
  }
  return { nodes, deviceIds }
}

/** Where three or more strings are paralleled, each string needs its own fuse, within the module's series fuse rating. */
export const pvStringFusesRule: Rule = {
  id: 'pv-string-fuses',
  title: 'PV string fuses missing',
  severity: 'error',
  source: SOURCE,
  run(ctx) {
    const findings: Finding[] = []
    const node = (partId: string, t: string) => nodeAt(ctx.nodes, partId, t)
    const adjacency = new Map<number, number[]>()
    const link = (a: number, b: number) => { adjacency.set(a, [...(adjacency.get(a) ?? []), b]) }
    for (const s of ctx.conductors) {
      if (!s.pv || s.protection.polarity !== 'positive') continue
      const a = node(s.conductor.from.partId, s.conductor.from.terminal)
      const b = node(s.conductor.to.partId, s.conductor.to.terminal)
      if (a !== undefined && b !== undefined) { link(a, b); link(b, a) }
    }
    const deviceAtNode = new Map<number, string[]>()
    for (const d of ctx.devices) {
      if (d.topology.side !== 'pv') continue
      for (const t of [d.device.lineTerminal, d.device.loadTerminal]) {
        const n = node(d.device.partId, t)
        if (n !== undefined) deviceAtNode.set(n, [...(deviceAtNode.get(n) ?? []), d.device.id])
      }
    }
    for (const g of ctx.pvGroups) {
      const totalStrings = g.arrays.reduce((s, a) => s + a.params.strings, 0)
      const regions = new Map(g.arrays.map((a) => {
        const pos = node(a.id, 'pos')
        return [a.id, pos === undefined ? { nodes: new Set<number>(), deviceIds: [] } : unfusedRegion(ctx, pos, adjacency, deviceAtNode)] as const
      }))
      for (const a of g.arrays) {
        const p = a.params
        const backfeedA = (totalStrings - 1) * 1.25 * p.moduleIscA
        const region = regions.get(a.id)!
        const combinedUnfused = g.arrays.some((o) => o.id !== a.id && [...regions.get(o.id)!.nodes].some((n) => region.nodes.has(n)))
        const needed = totalStrings >= 3 && backfeedA > p.maxSeriesFuseA + 1e-9
        if (needed && (p.strings >= 2 || combinedUnfused || region.deviceIds.length === 0)) {
          findings.push(makeFinding({
            ruleId: this.id, severity: 'error', title: this.title, partIds: [a.id], conductorIds: [],
            message: `${totalStrings} strings are paralleled: a fault in one string of ${a.label || a.id} can be fed ${fmt(backfeedA)} A by the others, above the module's ${fmt(p.maxSeriesFuseA)} A maximum series fuse, and ${p.strings >= 2 ? `its ${p.strings} strings are joined without a fuse each` : 'it reaches the others without its own fuse'}.`,
            measured: { value: backfeedA, unit: 'A' }, limit: { value: p.maxSeriesFuseA, unit: 'A' }, source: SOURCE,
            suggestion: { text: `Give each string its own PV fuse (10 × 38 mm, gPV) rated between ${fmt(1.5625 * p.moduleIscA)} A and ${fmt(p.maxSeriesFuseA)} A${p.strings >= 2 ? ': draw each string as its own array with its fuse' : ''}.` },
          }))
        }
        // Whatever the count, a string's own fuse must not exceed the module's maximum series fuse.
        if (combinedUnfused) continue
        for (const id of region.deviceIds) {
          const d = ctx.deviceById.get(id)
          if (!d || d.device.ratingA <= p.maxSeriesFuseA + 1e-9 || p.strings > 1) continue
          const lower = ratingAtMost(d.device.family, p.maxSeriesFuseA)
          findings.push(makeFinding({
            ruleId: 'pv-string-fuse-rating', severity: 'error', title: 'String fuse above the module\'s maximum series fuse',
            partIds: [a.id, d.device.partId].sort(), conductorIds: [],
            message: `${d.device.label} (${fmt(d.device.ratingA)} A) protects ${a.label || a.id}, whose modules allow at most a ${fmt(p.maxSeriesFuseA)} A series fuse.`,
            measured: { value: d.device.ratingA, unit: 'A' }, limit: { value: p.maxSeriesFuseA, unit: 'A' }, source: SOURCE,
            suggestion: lower !== null ? { text: `Use a ${fmt(lower)} A fuse.`, patch: ratingPatch(d.device.partId, d.device.ratingField, lower) } : undefined,
          }))
        }
      }
    }
    return findings
  },
}
