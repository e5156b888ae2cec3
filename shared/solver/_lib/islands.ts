import type { CircuitElement, Island } from '../circuit'
import { firstNode, secondNode } from './validateElements'

export class UnionFind {
  readonly parent: Int32Array
  constructor(size: number) {
    this.parent = new Int32Array(size)
    for (let i = 0; i < size; i++) this.parent[i] = i
  }
  find(x: number): number {
    const parent = this.parent
    let root = x
    while (parent[root] !== root) root = parent[root]
    while (parent[x] !== root) {
      const next = parent[x]
      parent[x] = root
      x = next
    }
    return root
  }
  union(x: number, y: number): void {
    const rx = this.find(x)
    const ry = this.find(y)
    if (rx !== ry) this.parent[ry] = rx
  }
}

export interface IslandMap {
  islands: Island[]
  /** Island index of every node. */
  islandOfNode: Int32Array
}

/**
 * Splits the nodes into islands joined by elements that conduct (`conducts[e] = 1`: resistors,
 * sources, loads). Each island's reference is the neg terminal of its first voltage source.
 */
export function findIslands(nodeCount: number, elements: CircuitElement[], conducts: Uint8Array): IslandMap {
  const uf = new UnionFind(nodeCount)
  for (let e = 0; e < elements.length; e++) {
    if (!conducts[e]) continue
    uf.union(firstNode(elements[e]), secondNode(elements[e]))
  }
  const islandOfRoot = new Int32Array(nodeCount).fill(-1)
  const islandOfNode = new Int32Array(nodeCount)
  const islands: Island[] = []
  for (let node = 0; node < nodeCount; node++) {
    const root = uf.find(node)
    let island = islandOfRoot[root]
    if (island < 0) {
      island = islands.length
      islandOfRoot[root] = island
      islands.push({ referenceNode: node, nodes: [], hasSource: false })
    }
    islandOfNode[node] = island
    islands[island].nodes.push(node)
  }
  for (let e = 0; e < elements.length; e++) {
    const element = elements[e]
    if (!conducts[e] || element.kind !== 'vsource') continue
    const island = islands[islandOfNode[element.neg]]
    if (!island.hasSource) {
      island.hasSource = true
      island.referenceNode = element.neg
    }
  }
  return { islands, islandOfNode }
}
