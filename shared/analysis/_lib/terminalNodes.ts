import { partTerminals, type TerminalInfo } from '../../design/catalogue'
import type { Conductor, Design, Part } from '../../design/schema'
import { UnionFind } from './unionFind'

/** "partId:terminal", the key of a terminal in the analysis result (ScenarioResult.terminals). */
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

/** The terminals of one part id: their ids and, at the same index, their node numbers; and the catalogue's list. */
interface PartTerminalNodes {
  ids: string[]
  nodes: number[]
  terminals: TerminalInfo[]
  /** Position of the part in design.parts (the last, for a repeated id). */
  index: number
  /** Conductors with an end on the part, design order (a conductor from the part to itself once); undefined: none. */
  conductors: Conductor[] | undefined
}

export interface TerminalNodes {
  nodeCount: number
  /** "partId:terminal" → node number (built on first read: the analysis itself looks terminals up by part). */
  readonly nodeOf: Map<string, number>
  /** Per node, the first terminal key on it (for netlists and messages; built on first read). */
  readonly nodeNames: string[]
  /** Per part, its terminals (with polarity) as the catalogue gives them for this part (built on first read; byPart holds them too). */
  readonly terminalsOf: Map<string, TerminalInfo[]>
  /** Per part id, its terminal ids and their nodes: look-ups without building "partId:terminal" strings. */
  byPart: Map<string, PartTerminalNodes>
  /** Per conductor (design order), the node of its from and to terminal, −1 for an unknown terminal. */
  conductorFrom: Int32Array
  conductorTo: Int32Array
  /** Per conductor (design order), the polarity of its from and to terminal (undefined: unknown terminal). */
  conductorFromPolarity: (TerminalInfo['polarity'] | undefined)[]
  conductorToPolarity: (TerminalInfo['polarity'] | undefined)[]
  /** Conductor id → its position in design.conductors (the last, for a repeated id). */
  conductorIndex: Map<string, number>
}

/** Node of a part's terminal, undefined when the part or the terminal does not exist. */
export function nodeAt(nodes: TerminalNodes, partId: string, terminal: string): number | undefined {
  const part = nodes.byPart.get(partId)
  if (!part) return undefined
  const i = part.ids.indexOf(terminal)
  return i < 0 ? undefined : part.nodes[i]
}

/** Polarity of a part's terminal as the catalogue gives it for this part, undefined when unknown. */
export function polarityAt(nodes: TerminalNodes, partId: string, terminal: string): TerminalInfo['polarity'] | undefined {
  const terminals = nodes.byPart.get(partId)?.terminals
  if (!terminals) return undefined
  for (const t of terminals) if (t.id === terminal) return t.polarity
  return undefined
}

/**
 * The distinct terminal ids of a catalogue list, in order: one shared, read-only array per list (the
 * catalogue hands out the same list for every part of a type, stud count or number of ways).
 */
const IDS_OF_LIST = new WeakMap<TerminalInfo[], string[]>()
const SHARED_IDS = new WeakSet<string[]>()
function distinctIds(terminals: TerminalInfo[]): string[] {
  const known = IDS_OF_LIST.get(terminals)
  if (known) return known
  const ids: string[] = []
  for (const t of terminals) if (!ids.includes(t.id)) ids.push(t.id)
  IDS_OF_LIST.set(terminals, ids)
  SHARED_IDS.add(ids)
  return ids
}

function nodeIn(entry: PartTerminalNodes, terminal: string): number {
  const i = entry.ids.indexOf(terminal)
  return i < 0 ? -1 : entry.nodes[i]
}

function polarityIn(terminals: TerminalInfo[], terminal: string): TerminalInfo['polarity'] | undefined {
  for (const t of terminals) if (t.id === terminal) return t.polarity
  return undefined
}

/** One node per terminal after the internal joins; numbering follows the part order. */
export function buildTerminalNodes(design: Design): TerminalNodes {
  // Terminal slots in part order; a repeated part id shares the slots of its terminal ids.
  const byPart = new Map<string, PartTerminalNodes>()
  const slotPart: string[] = []
  const slotTerminal: string[] = []
  const parts = design.parts
  const entryAt: PartTerminalNodes[] = new Array(parts.length)
  for (let k = 0; k < parts.length; k++) {
    const part = parts[k]
    const terminals = partTerminals(part)
    let entry = byPart.get(part.id)
    if (!entry) {
      // The usual case, a part id seen once: its ids (shared per catalogue list) and one slot each.
      const ids = distinctIds(terminals)
      const slots: number[] = new Array(ids.length)
      for (let i = 0; i < ids.length; i++) {
        slots[i] = slotPart.length // the slot for now; replaced by the node below
        slotPart.push(part.id)
        slotTerminal.push(ids[i])
      }
      byPart.set(part.id, (entry = { ids, nodes: slots, terminals, index: k, conductors: undefined }))
    } else {
      entry.index = k
      entry.terminals = terminals // the last part with an id gives its terminal list
      for (const t of terminals) {
        if (entry.ids.includes(t.id)) continue
        if (SHARED_IDS.has(entry.ids)) entry.ids = [...entry.ids] // own copy before adding to it
        entry.ids.push(t.id)
        entry.nodes.push(slotPart.length)
        slotPart.push(part.id)
        slotTerminal.push(t.id)
      }
    }
    entryAt[k] = entry
  }
  const uf = new UnionFind(slotPart.length)
  for (let k = 0; k < design.parts.length; k++) {
    const part = design.parts[k]
    const entry = entryAt[k]
    for (const group of internalJoins(part, entry.terminals)) {
      let first = -1
      for (const id of group) {
        const i = entry.ids.indexOf(id)
        if (i < 0) continue
        if (first < 0) first = entry.nodes[i]
        else uf.union(first, entry.nodes[i])
      }
    }
  }
  const nodeOfRoot = new Int32Array(slotPart.length).fill(-1)
  const nodeOfSlot = new Int32Array(slotPart.length)
  const firstSlotOfNode: number[] = []
  for (let i = 0; i < slotPart.length; i++) {
    const root = uf.find(i)
    if (nodeOfRoot[root] < 0) {
      nodeOfRoot[root] = firstSlotOfNode.length
      firstSlotOfNode.push(i)
    }
    nodeOfSlot[i] = nodeOfRoot[root]
  }
  for (const entry of byPart.values()) for (let k = 0; k < entry.nodes.length; k++) entry.nodes[k] = nodeOfSlot[entry.nodes[k]]

  const count = design.conductors.length
  const conductorFrom = new Int32Array(count)
  const conductorTo = new Int32Array(count)
  const conductorFromPolarity: (TerminalInfo['polarity'] | undefined)[] = new Array(count)
  const conductorToPolarity: (TerminalInfo['polarity'] | undefined)[] = new Array(count)
  // One part look-up per conductor end gives the node, the polarity and the part's conductor list.
  const conductors = design.conductors
  const conductorIndex = new Map<string, number>()
  for (let i = 0; i < count; i++) {
    const c = conductors[i]
    conductorIndex.set(c.id, i)
    const from = byPart.get(c.from.partId)
    conductorFrom[i] = from ? nodeIn(from, c.from.terminal) : -1
    conductorFromPolarity[i] = from ? polarityIn(from.terminals, c.from.terminal) : undefined
    if (from) (from.conductors ??= []).push(c)
    const to = byPart.get(c.to.partId)
    conductorTo[i] = to ? nodeIn(to, c.to.terminal) : -1
    conductorToPolarity[i] = to ? polarityIn(to.terminals, c.to.terminal) : undefined
    if (to && c.to.partId !== c.from.partId) (to.conductors ??= []).push(c)
  }
  return new TerminalNodeTable(
    { nodeCount: firstSlotOfNode.length, byPart, conductorFrom, conductorTo, conductorFromPolarity, conductorToPolarity, conductorIndex },
    { slotPart, slotTerminal, nodeOfSlot, firstSlotOfNode },
  )
}

/** Terminal slots in numbering order: the part id and terminal id of each, its node, and each node's first slot. */
interface TerminalSlots {
  slotPart: string[]
  slotTerminal: string[]
  nodeOfSlot: Int32Array
  firstSlotOfNode: number[]
}

/**
 * TerminalNodes whose string-keyed views are made on first read. A class, so every analysis's table
 * has the same shape (per-object getters would give each one a shape of its own, and every function
 * reading it would see a new one each time).
 */
interface TerminalNodeTable extends Omit<TerminalNodes, 'nodeNames' | 'nodeOf' | 'terminalsOf'> {}
class TerminalNodeTable implements TerminalNodes {
  private names: string[] | undefined = undefined
  private keyed: Map<string, number> | undefined = undefined
  private lists: Map<string, TerminalInfo[]> | undefined = undefined

  constructor(fields: Omit<TerminalNodes, 'nodeNames' | 'nodeOf' | 'terminalsOf'>, private readonly slots: TerminalSlots) {
    Object.assign(this, fields) // always the same fields in the same order: one shape
  }

  get nodeNames(): string[] {
    const { slotPart, slotTerminal, firstSlotOfNode } = this.slots
    return (this.names ??= firstSlotOfNode.map((i) => terminalKey(slotPart[i], slotTerminal[i])))
  }

  get nodeOf(): Map<string, number> {
    if (!this.keyed) {
      const { slotPart, slotTerminal, nodeOfSlot } = this.slots
      this.keyed = new Map()
      for (let i = 0; i < slotPart.length; i++) this.keyed.set(terminalKey(slotPart[i], slotTerminal[i]), nodeOfSlot[i])
    }
    return this.keyed
  }

  get terminalsOf(): Map<string, TerminalInfo[]> {
    if (!this.lists) {
      this.lists = new Map()
      for (const [id, entry] of this.byPart) this.lists.set(id, entry.terminals)
    }
    return this.lists
  }
}

/** The two terminals whose voltage is a part's own voltage, and across which its own element sits. */
const TWO_TERMINALS: Record<string, [string, string]> = {
  battery: ['pos', 'neg'], load: ['pos', 'neg'], inverter: ['pos', 'neg'], 'pv-array': ['pos', 'neg'],
  'mains-charger': ['bat-pos', 'bat-neg'], 'charge-controller': ['bat-pos', 'bat-neg'], 'dc-dc-charger': ['out-pos', 'out-neg'],
  fuse: ['line', 'load'], breaker: ['line', 'load'], 'battery-switch': ['a', 'b'], shunt: ['battery', 'system'],
  'fuse-panel': ['in-pos', 'in-neg'],
}

/** Per part, the nodes of its two main terminals (−1 when it has none), built once per analysis. */
const PAIR_CACHE = new WeakMap<TerminalNodes, Int32Array>()
export function partPairNodes(design: Design, nodes: TerminalNodes): Int32Array {
  let pairs = PAIR_CACHE.get(nodes)
  if (pairs && pairs.length === 2 * design.parts.length) return pairs
  pairs = new Int32Array(2 * design.parts.length).fill(-1)
  design.parts.forEach((part, i) => {
    const pair = TWO_TERMINALS[part.type]
    if (!pair) return
    pairs![2 * i] = nodeAt(nodes, part.id, pair[0]) ?? -1
    pairs![2 * i + 1] = nodeAt(nodes, part.id, pair[1]) ?? -1
  })
  PAIR_CACHE.set(nodes, pairs)
  return pairs
}
