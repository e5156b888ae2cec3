import { partTerminals, type TerminalInfo } from '../../design/catalogue'
import type { Design, Part } from '../../design/schema'
import { UnionFind } from './unionFind'

/** "partId:terminal", the key of a terminal everywhere in the analysis. */
export const terminalKey = (partId: string, terminal: string) => `${partId}:${terminal}`

/**
 * Terminals a part joins internally with no resistance: every stud of a bus bar, the two negatives of
 * a fuse panel, and the common negative of a charge controller or DC-DC charger (non-isolated units,
 * the usual build — common practice; an isolated unit would need its own negative wiring).
 */
function internalJoins(part: Part, terminals: TerminalInfo[]): string[][] {
  switch (part.type) {
    case 'bus-bar':
      return [terminals.map((t) => t.id)]
    case 'fuse-panel':
      return [['in-neg', 'neg']]
    case 'charge-controller':
      return [['pv-neg', 'bat-neg']]
    case 'dc-dc-charger':
      return [['in-neg', 'out-neg']]
    default:
      return []
  }
}

export interface TerminalNodes {
  nodeCount: number
  /** "partId:terminal" → node number */
  nodeOf: Map<string, number>
  /** Per node, the first terminal key on it (for netlists and messages). */
  nodeNames: string[]
  /** Per part, its terminals (with polarity) as the catalogue gives them for this part. */
  terminalsOf: Map<string, TerminalInfo[]>
}

/** One node per terminal after the internal joins; numbering follows the part order. */
export function buildTerminalNodes(design: Design): TerminalNodes {
  const keys: string[] = []
  const indexOf = new Map<string, number>()
  const terminalsOf = new Map<string, TerminalInfo[]>()
  for (const part of design.parts) {
    const terminals = partTerminals(part)
    terminalsOf.set(part.id, terminals)
    for (const t of terminals) {
      const key = terminalKey(part.id, t.id)
      if (!indexOf.has(key)) {
        indexOf.set(key, keys.length)
        keys.push(key)
      }
    }
  }
  const uf = new UnionFind(keys.length)
  for (const part of design.parts) {
    const terminals = terminalsOf.get(part.id) ?? []
    for (const group of internalJoins(part, terminals)) {
      const present = group.map((id) => indexOf.get(terminalKey(part.id, id))).filter((i): i is number => i !== undefined)
      for (let i = 1; i < present.length; i++) uf.union(present[0], present[i])
    }
  }
  const nodeOfRoot = new Map<number, number>()
  const nodeOf = new Map<string, number>()
  const nodeNames: string[] = []
  for (let i = 0; i < keys.length; i++) {
    const root = uf.find(i)
    let node = nodeOfRoot.get(root)
    if (node === undefined) {
      node = nodeNames.length
      nodeOfRoot.set(root, node)
      nodeNames.push(keys[i])
    }
    nodeOf.set(keys[i], node)
  }
  return { nodeCount: nodeNames.length, nodeOf, nodeNames, terminalsOf }
}
