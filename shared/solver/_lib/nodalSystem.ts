// The sparse nodal matrix of one circuit: unknown numbering (fill-reducing order), the upper
// triangle's CSC pattern, the slots each two-terminal element stamps into, and the LDLᵀ symbolic
// analysis — all built once and reused by every numeric factorisation.
import type { CircuitElement } from '../circuit'
import { createFactor, ldlSymbolic, type LdlFactor } from './ldl'
import { minimumDegreeOrder } from './minimumDegree'
import { firstNode, secondNode } from './validateElements'

export interface NodalSystem {
  /** Number of unknown node voltages. */
  n: number
  /** Position of each node in the permuted unknown vector, -1 for references and unsolved nodes. */
  unknownOfNode: Int32Array
  nodeOfUnknown: Int32Array
  ap: Int32Array
  ai: Int32Array
  ax: Float64Array
  /** Sum of |stamps| on each diagonal: the scale a pivot is judged against. */
  diagAbs: Float64Array
  /** Per element: slots of its pos/pos, neg/neg and pos/neg entries (-1 where a terminal is grounded). */
  slotPP: Int32Array
  slotQQ: Int32Array
  slotPQ: Int32Array
  factor: LdlFactor
}

/**
 * @param stamps  1 for elements that put a conductance into the matrix
 * @param isUnknown 1 for nodes whose voltage is solved for (solved islands, references excluded)
 */
export function buildNodalSystem(
  nodeCount: number,
  elements: CircuitElement[],
  stamps: Uint8Array,
  isUnknown: Uint8Array,
): NodalSystem {
  const natural = new Int32Array(nodeCount).fill(-1)
  let n = 0
  for (let node = 0; node < nodeCount; node++) if (isUnknown[node]) natural[node] = n++
  const m = elements.length
  const termP = new Int32Array(m).fill(-1)
  const termQ = new Int32Array(m).fill(-1)
  for (let e = 0; e < m; e++) {
    if (!stamps[e]) continue
    const p = firstNode(elements[e])
    const q = secondNode(elements[e])
    // An element with both terminals on one node carries no conductance between unknowns.
    if (p === q) continue
    termP[e] = natural[p]
    termQ[e] = natural[q]
  }

  // Graph of the unknowns in CSR form, then the fill-reducing elimination order.
  const ptr = new Int32Array(n + 1)
  for (let e = 0; e < m; e++) {
    if (termP[e] >= 0 && termQ[e] >= 0 && termP[e] !== termQ[e]) {
      ptr[termP[e] + 1]++
      ptr[termQ[e] + 1]++
    }
  }
  for (let i = 0; i < n; i++) ptr[i + 1] += ptr[i]
  const idx = new Int32Array(ptr[n])
  const fill = ptr.slice(0, n)
  for (let e = 0; e < m; e++) {
    const p = termP[e]
    const q = termQ[e]
    if (p >= 0 && q >= 0 && p !== q) {
      idx[fill[p]++] = q
      idx[fill[q]++] = p
    }
  }
  const order = minimumDegreeOrder(n, ptr, idx)
  const pinv = new Int32Array(n)
  for (let k = 0; k < n; k++) pinv[order[k]] = k
  const unknownOfNode = new Int32Array(nodeCount).fill(-1)
  const nodeOfUnknown = new Int32Array(n)
  for (let node = 0; node < nodeCount; node++) {
    if (natural[node] >= 0) {
      unknownOfNode[node] = pinv[natural[node]]
      nodeOfUnknown[pinv[natural[node]]] = node
    }
  }

  // Upper-triangle CSC: every column holds its diagonal plus one slot per distinct neighbour above.
  const colCount = new Int32Array(n + 1)
  const offCol = new Int32Array(m).fill(-1)
  const offRow = new Int32Array(m).fill(-1)
  for (let e = 0; e < m; e++) {
    if (termP[e] < 0 || termQ[e] < 0) continue
    const a = pinv[termP[e]]
    const b = pinv[termQ[e]]
    if (a === b) continue
    offCol[e] = a > b ? a : b
    offRow[e] = a > b ? b : a
    colCount[offCol[e] + 1]++
  }
  for (let c = 0; c < n; c++) colCount[c + 1] += colCount[c]
  const byColumn = new Int32Array(colCount[n])
  const cursor = colCount.slice(0, n)
  for (let e = 0; e < m; e++) if (offCol[e] >= 0) byColumn[cursor[offCol[e]]++] = e
  const ap = new Int32Array(n + 1)
  const rows = new Int32Array(n + colCount[n])
  let used = 0
  const slotOfRow = new Int32Array(n)
  const rowStamp = new Int32Array(n).fill(-1)
  const slotPQ = new Int32Array(m).fill(-1)
  for (let c = 0; c < n; c++) {
    ap[c] = used // the diagonal is each column's first slot
    rows[used++] = c
    rowStamp[c] = c
    for (let k = colCount[c]; k < colCount[c + 1]; k++) {
      const e = byColumn[k]
      const r = offRow[e]
      if (rowStamp[r] !== c) {
        rowStamp[r] = c
        slotOfRow[r] = used
        rows[used++] = r
      }
      slotPQ[e] = slotOfRow[r]
    }
  }
  ap[n] = used
  const ai = rows.slice(0, used)
  const slotPP = new Int32Array(m).fill(-1)
  const slotQQ = new Int32Array(m).fill(-1)
  for (let e = 0; e < m; e++) {
    if (termP[e] >= 0) slotPP[e] = ap[pinv[termP[e]]]
    if (termQ[e] >= 0) slotQQ[e] = ap[pinv[termQ[e]]]
  }
  const factor = createFactor(ldlSymbolic(n, ap, ai))
  return {
    n,
    unknownOfNode,
    nodeOfUnknown,
    ap,
    ai,
    ax: new Float64Array(ai.length),
    diagAbs: new Float64Array(n),
    slotPP,
    slotQQ,
    slotPQ,
    factor,
  }
}

/** Adds conductance g between an element's terminals. */
export function stampConductance(system: NodalSystem, e: number, g: number): void {
  const { ax, slotPP, slotQQ, slotPQ, diagAbs, ai } = system
  const pp = slotPP[e]
  const qq = slotQQ[e]
  const gAbs = g < 0 ? -g : g
  if (pp >= 0) {
    ax[pp] += g
    diagAbs[ai[pp]] += gAbs
  }
  if (qq >= 0) {
    ax[qq] += g
    diagAbs[ai[qq]] += gAbs
  }
  if (slotPQ[e] >= 0) ax[slotPQ[e]] -= g
}

/** Columns up to this length are searched directly; longer ones (a hub node's) through pairSlots. */
const SHORT_COLUMN = 16

/** Slot of every off-diagonal (row, column) pair of a system's pattern, keyed row · n + column. */
const PAIR_SLOTS = new WeakMap<NodalSystem, Map<number, number>>()
function pairSlots(system: NodalSystem): Map<number, number> {
  let slots = PAIR_SLOTS.get(system)
  if (slots) return slots
  slots = new Map()
  const { n, ap, ai } = system
  for (let c = 0; c < n; c++) for (let p = ap[c] + 1; p < ap[c + 1]; p++) slots.set(ai[p] * n + c, p)
  PAIR_SLOTS.set(system, slots)
  return slots
}

/**
 * The same matrix structure for another circuit on the same nodes: when its unknowns are the same and
 * every conductance it stamps falls on a slot of `previous` (loads switched off leave structural zeros,
 * which change no value of the factorisation), the ordering, pattern and symbolic analysis of
 * `previous` are reused and only the element slots are recomputed. Null when the structure differs.
 */
export function reuseNodalSystem(
  previous: NodalSystem,
  nodeCount: number,
  elements: CircuitElement[],
  stamps: Uint8Array,
  isUnknown: Uint8Array,
): NodalSystem | null {
  const { unknownOfNode, n, ap } = previous
  if (unknownOfNode.length !== nodeCount) return null
  for (let node = 0; node < nodeCount; node++) if ((unknownOfNode[node] >= 0) !== (isUnknown[node] === 1)) return null
  const m = elements.length
  const slotPP = new Int32Array(m).fill(-1)
  const slotQQ = new Int32Array(m).fill(-1)
  const slotPQ = new Int32Array(m).fill(-1)
  const { ai } = previous
  let slots: Map<number, number> | undefined // only for long columns (hub nodes), built on first need
  for (let e = 0; e < m; e++) {
    if (!stamps[e]) continue
    const p = firstNode(elements[e])
    const q = secondNode(elements[e])
    if (p === q) continue
    const a = unknownOfNode[p]
    const b = unknownOfNode[q]
    if (a >= 0) slotPP[e] = ap[a]
    if (b >= 0) slotQQ[e] = ap[b]
    if (a >= 0 && b >= 0 && a !== b) {
      // The pair's slot is in column max(a, b), row min(a, b): a short column is scanned in place.
      const row = a < b ? a : b
      const col = a < b ? b : a
      let slot = -1
      if (ap[col + 1] - ap[col] <= SHORT_COLUMN) {
        for (let k = ap[col] + 1; k < ap[col + 1]; k++) if (ai[k] === row) { slot = k; break }
      } else slot = (slots ??= pairSlots(previous)).get(row * n + col) ?? -1
      if (slot < 0) return null
      slotPQ[e] = slot
    }
  }
  return { ...previous, slotPP, slotQQ, slotPQ }
}
