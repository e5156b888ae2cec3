// Checks on sources that the nodal solution alone would not make obvious to a designer.
import type { CircuitElement, SolverProblem } from '../circuit'
import { UnionFind } from './islands'

export interface SourceCheckOptions {
  /** A source is driven backwards "in a fight" when I·R exceeds this fraction of the island's largest EMF. */
  sourceLoopFraction: number
  /** ... or when the current driven back into it exceeds this (A). */
  sourceLoopLimitA: number
}

/** Sources whose two terminals are joined through resistors below `shortResistanceOhm` (or wired to one node). */
export function findShortedSources(
  elements: CircuitElement[],
  valid: Uint8Array,
  nodeCount: number,
  shortResistanceOhm: number,
): string[] {
  const uf = new UnionFind(nodeCount)
  for (let e = 0; e < elements.length; e++) {
    const element = elements[e]
    if (valid[e] && element.kind === 'resistor' && element.resistanceOhm < shortResistanceOhm) uf.union(element.a, element.b)
  }
  const elementIds: string[] = []
  for (let e = 0; e < elements.length; e++) {
    const element = elements[e]
    if (valid[e] && element.kind === 'vsource' && uf.find(element.pos) === uf.find(element.neg)) elementIds.push(element.id)
  }
  return elementIds
}

/**
 * Sources whose terminal voltage collapsed below `fraction` of their EMF while discharging: the
 * circuit outside joins their terminals by less than Rint·f/(1 − f), a short in any real design
 * (a battery reversed into a bank shows up here too: each is the other's short).
 */
export function findCollapsedSources(
  elements: CircuitElement[],
  active: Uint8Array,
  nodeVoltageV: Float64Array,
  currentA: Float64Array,
  fraction: number,
): string[] {
  const ids: string[] = []
  for (let e = 0; e < elements.length; e++) {
    const element = elements[e]
    if (!active[e] || element.kind !== 'vsource' || element.voltageV === 0) continue
    const terminalV = nodeVoltageV[element.pos] - nodeVoltageV[element.neg]
    const discharging = currentA[e] * element.voltageV > 0
    if (discharging && Math.abs(terminalV) < fraction * Math.abs(element.voltageV)) ids.push(element.id)
  }
  return ids
}

/**
 * Sources that fight: in an island with several voltage sources, one discharges while another is
 * driven backwards (charged against its EMF) by more than the limits. Parallel banks with a small
 * EMF spread circulate a little current and are not reported.
 */
export function findSourceLoops(
  elements: CircuitElement[],
  active: Uint8Array,
  islandOfNode: Int32Array,
  currentA: Float64Array,
  options: SourceCheckOptions,
): SolverProblem[] {
  const byIsland = new Map<number, number[]>()
  for (let e = 0; e < elements.length; e++) {
    const element = elements[e]
    if (!active[e] || element.kind !== 'vsource') continue
    const island = islandOfNode[element.neg]
    const list = byIsland.get(island) ?? []
    list.push(e)
    byIsland.set(island, list)
  }
  const problems: SolverProblem[] = []
  for (const sources of byIsland.values()) {
    if (sources.length < 2) continue
    let largestEmfV = 0
    let anyDischarging = false
    for (const e of sources) {
      const element = elements[e] as Extract<CircuitElement, { kind: 'vsource' }>
      largestEmfV = Math.max(largestEmfV, Math.abs(element.voltageV))
      if (currentA[e] * element.voltageV > 0) anyDischarging = true
    }
    if (!anyDischarging) continue
    const fighting = sources.some((e) => {
      const element = elements[e] as Extract<CircuitElement, { kind: 'vsource' }>
      const drivenBack = element.voltageV === 0 ? currentA[e] !== 0 : currentA[e] * element.voltageV < 0
      if (!drivenBack) return false
      const backA = Math.abs(currentA[e])
      return backA * element.resistanceOhm > options.sourceLoopFraction * largestEmfV || backA > options.sourceLoopLimitA
    })
    if (fighting) problems.push({ kind: 'source-loop', elementIds: sources.map((e) => elements[e].id) })
  }
  return problems
}
