// Validation, islands and the unknown set shared by the operating point and the fault analysis.
import type { Circuit, CircuitElement, SolverProblem } from '../circuit'
import { findIslands, type IslandMap } from './islands'
import { firstNode, secondNode, validateElements } from './validateElements'

export interface PreparedNetwork {
  /** 1 for elements that passed validation. */
  valid: Uint8Array
  /** 1 for valid, included elements that can carry current (a current source between islands cannot). */
  used: Uint8Array
  /** 1 for elements that take part: valid, included and inside an island with a voltage source. */
  active: Uint8Array
  islandMap: IslandMap
  /** 1 for nodes whose voltage is solved for (solved islands minus their reference nodes). */
  isUnknown: Uint8Array
  problems: SolverProblem[]
}

/** A circuit whose node count itself is unusable: the message to report, else null. */
export function circuitShapeError(circuit: Circuit): string | null {
  if (!circuit || typeof circuit !== 'object') return 'circuit must be an object'
  if (!Number.isInteger(circuit.nodeCount) || circuit.nodeCount < 0) {
    return `nodeCount must be a whole number ≥ 0 (got ${circuit.nodeCount})`
  }
  if (!Array.isArray(circuit.elements)) return 'elements must be a list'
  return null
}

/**
 * @param include elements to consider at all (the fault analysis leaves loads out)
 */
export function prepareNetwork(circuit: Circuit, include: (element: CircuitElement) => boolean): PreparedNetwork {
  const { elements, nodeCount } = circuit
  const { valid, problems } = validateElements(circuit)
  const used = new Uint8Array(elements.length)
  const conducts = new Uint8Array(elements.length)
  for (let e = 0; e < elements.length; e++) {
    if (!valid[e] || !include(elements[e])) continue
    used[e] = 1
    // A current source, or a 0 W load (I = 0 at any voltage), joins nothing electrically.
    const element = elements[e]
    if (element.kind !== 'isource' && !(element.kind === 'cpower' && element.powerW === 0)) conducts[e] = 1
  }
  const islandMap = findIslands(nodeCount, elements, conducts)
  const { islands, islandOfNode } = islandMap

  // A current source between two islands would have no return path: KCL cannot hold.
  const bridging: string[] = []
  for (let e = 0; e < elements.length; e++) {
    if (!used[e] || conducts[e]) continue
    if (islandOfNode[firstNode(elements[e])] !== islandOfNode[secondNode(elements[e])]) {
      used[e] = 0
      if (elements[e].kind === 'isource') bridging.push(elements[e].id)
    }
  }
  if (bridging.length) {
    problems.push({
      kind: 'invalid-element',
      elementIds: bridging,
      message: 'current source joins two separate islands, so its current has no return path',
    })
  }

  const active = new Uint8Array(elements.length)
  const floatingIds = new Map<number, string[]>()
  for (let e = 0; e < elements.length; e++) {
    if (!used[e]) continue
    const island = islandOfNode[firstNode(elements[e])]
    if (islands[island].hasSource) active[e] = 1
    else {
      const ids = floatingIds.get(island) ?? []
      ids.push(elements[e].id)
      floatingIds.set(island, ids)
    }
  }
  for (const [island, elementIds] of floatingIds) {
    problems.push({ kind: 'floating', nodes: islands[island].nodes.slice(), elementIds })
  }

  const isUnknown = new Uint8Array(nodeCount)
  for (const island of islands) {
    if (!island.hasSource) continue
    for (const node of island.nodes) if (node !== island.referenceNode) isUnknown[node] = 1
  }
  return { valid, used, active, islandMap, isUnknown, problems }
}
