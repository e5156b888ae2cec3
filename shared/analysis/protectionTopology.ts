import type { Design } from '../design/schema'
import type { ProtectiveDevice } from './_lib/devices'
import { viewByIndex, type IdLookup } from './_lib/idLookup'
import { MinHeap } from './_lib/minHeap'
import { nodeAt, type TerminalNodes } from './_lib/terminalNodes'

export type SupplySide = 'battery' | 'pv' | 'none'

export interface ConductorProtection {
  conductorId: string
  polarity: 'positive' | 'negative'
  /** What feeds the conductor: a battery bank, only a PV array, or nothing found. */
  side: SupplySide
  /** End nearer the source (by conductor length), and the far end. */
  upstreamNode: number
  downstreamNode: number
  /** Device at the conductor's source end: the nearest upstream device, or — for a conductor between
   * the source and its first device — that first device downstream. */
  protectingDeviceId: string | null
  /** 'upstream': the conductor lies below the device; 'downstream': it lies between the source and the
   * device, unprotected for the run given by deviceDistanceM. */
  protectedFrom: 'upstream' | 'downstream' | 'branch' | null
  /** For 'downstream': conductor length from the source terminal to the device, m (the unprotected run). */
  deviceDistanceM: number | null
  /** Every conductor of that unprotected run is sheathed or in conduit for its whole length. */
  runSheathed: boolean
  /** First device below the conductor on every branch (null when some branch has none), and the
   * conductor length from this conductor's upstream end to it: a branch tapped off a bus is protected
   * by its own device when that sits close enough to the bus. */
  downstreamDeviceId: string | null
  downstreamRunM: number | null
  /** The battery (or PV array) whose terminal is nearest. */
  sourcePartId: string | null
}

export interface DeviceTopology {
  deviceId: string
  side: SupplySide
  /** Conductor length between the source terminal and the device, when no device is upstream of it. */
  distanceFromSourceM: number | null
  upstreamDeviceId: string | null
  sourcePartId: string | null
}

export interface ProtectionTopology {
  conductors: IdLookup<ConductorProtection>
  devices: IdLookup<DeviceTopology>
  /** Device id → its position in the devices given (the last, for a repeated id). */
  deviceIndex: Map<string, number>
  /** The same records by position: design.conductors order, and the order of the devices given. */
  conductorList: ConductorProtection[]
  deviceList: DeviceTopology[]
}

interface Graph {
  head: Int32Array
  next: Int32Array
  to: Int32Array
  /** per half-edge: conductor index or −1 */
  conductor: Int32Array
  /** per half-edge: device index or −1 */
  device: Int32Array
}

/**
 * Walks the positive network outward from every battery (then from every PV array, for conductors
 * no battery feeds) along the shortest conductor-length paths, and for each positive conductor finds
 * the protective device at its source end and how far that device sits from the source.
 * Linear-logarithmic: one Dijkstra per side over all sources at once, then one reverse sweep.
 */
export function protectionTopology(design: Design, nodes: TerminalNodes, devices: ProtectiveDevice[]): ProtectionTopology {
  const n = nodes.nodeCount
  const nodeOf = (partId: string, terminal: string) => nodeAt(nodes, partId, terminal)

  // Graph of the positive network: conductors (length) and series parts (0 m). Open devices count:
  // protection is a property of the wiring, not of a switch position.
  const edgeA: number[] = []
  const edgeB: number[] = []
  const edgeLen: number[] = []
  const edgeConductor: number[] = []
  const edgeDevice: number[] = []
  const conductorEnds: { a: number; b: number; positive: boolean }[] = []
  design.conductors.forEach((c, i) => {
    const a = nodes.conductorFrom[i]
    const b = nodes.conductorTo[i]
    const positive = nodes.conductorFromPolarity[i] === 'positive' || nodes.conductorToPolarity[i] === 'positive'
    conductorEnds.push({ a, b, positive })
    if (a < 0 || b < 0 || !positive) return
    edgeA.push(a); edgeB.push(b); edgeLen.push(c.lengthM); edgeConductor.push(i); edgeDevice.push(-1)
  })
  devices.forEach((d, i) => {
    const a = nodeOf(d.partId, d.lineTerminal)
    const b = nodeOf(d.partId, d.loadTerminal)
    if (a === undefined || b === undefined) return
    edgeA.push(a); edgeB.push(b); edgeLen.push(0); edgeConductor.push(-1); edgeDevice.push(i)
  })
  for (const part of design.parts) {
    if (part.type !== 'battery-switch') continue
    const a = nodeOf(part.id, 'a')
    const b = nodeOf(part.id, 'b')
    if (a === undefined || b === undefined) continue
    edgeA.push(a); edgeB.push(b); edgeLen.push(0); edgeConductor.push(-1); edgeDevice.push(-1)
  }
  const graph = buildGraph(n, edgeA, edgeB, edgeConductor, edgeDevice)

  const sheathed = design.conductors.map((c) => c.sheathed)
  const batteries = design.parts.filter((p) => p.type === 'battery')
  const arrays = design.parts.filter((p) => p.type === 'pv-array')
  const fromBattery = walk(graph, n, edgeLen, sheathed, batteries.map((p) => nodeOf(p.id, 'pos')), batteries.map((p) => p.id))
  const fromArray = walk(graph, n, edgeLen, sheathed, arrays.map((p) => nodeOf(p.id, 'pos')), arrays.map((p) => p.id))

  const conductorList: ConductorProtection[] = new Array(design.conductors.length)
  for (let i = 0; i < design.conductors.length; i++) {
    const c = design.conductors[i]
    const ends = conductorEnds[i]
    const w = !ends.positive || ends.a < 0 || ends.b < 0 ? null
      : fromBattery.reached(ends.a) || fromBattery.reached(ends.b) ? fromBattery
        : fromArray.reached(ends.a) || fromArray.reached(ends.b) ? fromArray : null
    const record: ConductorProtection = {
      conductorId: c.id, polarity: ends.positive && ends.a >= 0 && ends.b >= 0 ? 'positive' : 'negative', side: 'none',
      upstreamNode: ends.a, downstreamNode: ends.b, protectingDeviceId: null, protectedFrom: null, deviceDistanceM: null,
      runSheathed: false, downstreamDeviceId: null, downstreamRunM: null, sourcePartId: null,
    }
    conductorList[i] = record
    if (!w) continue
    const u = w.dist[ends.a] <= w.dist[ends.b] ? ends.a : ends.b
    const v = u === ends.a ? ends.b : ends.a
    record.side = w === fromBattery ? 'battery' : 'pv'
    record.upstreamNode = u
    record.downstreamNode = v
    record.sourcePartId = w.sourceId(u)
    const below = w.downDevice[v]
    if (below >= 0) {
      record.downstreamDeviceId = devices[below].id
      record.downstreamRunM = Math.max(0, w.downRunM[v] - w.dist[u])
    }
    const upstream = w.device[u]
    if (upstream >= 0) {
      record.protectingDeviceId = devices[upstream].id
      record.protectedFrom = 'upstream'
    } else if (below >= 0) {
      record.protectingDeviceId = devices[below].id
      record.protectedFrom = 'downstream'
      record.deviceDistanceM = w.downRunM[v]
      record.runSheathed = w.downSheathed[v] === 1
    }
  }

  const deviceList: DeviceTopology[] = new Array(devices.length)
  const deviceIndex = new Map<string, number>()
  const setDevice = (i: number, record: DeviceTopology) => {
    deviceIndex.set(record.deviceId, i)
    deviceList[i] = record
  }
  devices.forEach((d, i) => {
    const line = nodeOf(d.partId, d.lineTerminal)
    const w = line !== undefined && fromBattery.reached(line) ? fromBattery : line !== undefined && fromArray.reached(line) ? fromArray : null
    if (!w || line === undefined) {
      setDevice(i, { deviceId: d.id, side: 'none', distanceFromSourceM: null, upstreamDeviceId: null, sourcePartId: null })
      return
    }
    const up = w.device[line]
    setDevice(i, {
      deviceId: d.id,
      side: w === fromBattery ? 'battery' : 'pv',
      distanceFromSourceM: up >= 0 ? null : (w.firstDeviceRunM[i] ?? w.dist[line]),
      upstreamDeviceId: up >= 0 ? devices[up].id : null,
      sourcePartId: w.sourceId(line),
    })
  })
  return {
    conductors: viewByIndex(nodes.conductorIndex, conductorList), devices: viewByIndex(deviceIndex, deviceList), deviceIndex,
    conductorList, deviceList,
  }
}

function buildGraph(n: number, a: number[], b: number[], conductor: number[], device: number[]): Graph {
  const m = a.length
  const head = new Int32Array(n).fill(-1)
  const next = new Int32Array(2 * m)
  const to = new Int32Array(2 * m)
  const cond = new Int32Array(2 * m)
  const dev = new Int32Array(2 * m)
  for (let e = 0; e < m; e++) {
    for (let side = 0; side < 2; side++) {
      const h = 2 * e + side
      const from = side === 0 ? a[e] : b[e]
      to[h] = side === 0 ? b[e] : a[e]
      cond[h] = conductor[e]
      dev[h] = device[e]
      next[h] = head[from]
      head[from] = h
    }
  }
  return { head, next, to, conductor: cond, device: dev }
}

/** Multi-source Dijkstra by conductor length, then a reverse sweep for the first device downstream. */
function walk(graph: Graph, n: number, edgeLen: number[], sheathed: boolean[], sourceNodes: (number | undefined)[], sourceIds: string[]) {
  const dist = new Float64Array(n).fill(Infinity)
  const source = new Int32Array(n).fill(-1)
  const parentEdge = new Int32Array(n).fill(-1)
  /** nearest upstream device index, −1 none */
  const device = new Int32Array(n).fill(-1)
  /** every conductor from the source to here sheathed (meaningful while no device is upstream) */
  const sheath = new Uint8Array(n)
  const firstDeviceRunM: Record<number, number> = {}
  const firstDeviceSheathed: Record<number, boolean> = {}
  const order: number[] = []
  const done = new Uint8Array(n)
  const heap = new MinHeap(n)
  sourceNodes.forEach((node, i) => {
    if (node === undefined || dist[node] === 0) return
    dist[node] = 0
    source[node] = i
    sheath[node] = 1
    heap.push(0, node)
  })
  while (heap.size > 0) {
    const x = heap.pop()
    if (done[x]) continue
    done[x] = 1
    order.push(x)
    for (let h = graph.head[x]; h >= 0; h = graph.next[h]) {
      const y = graph.to[h]
      if (done[y]) continue
      const ci = graph.conductor[h]
      const d = dist[x] + (ci >= 0 ? edgeLen[h >> 1] : 0)
      if (d >= dist[y]) continue
      dist[y] = d
      source[y] = source[x]
      parentEdge[y] = h
      const di = graph.device[h]
      device[y] = di >= 0 ? di : device[x]
      sheath[y] = sheath[x] && (ci < 0 || sheathed[ci]) ? 1 : 0
      heap.push(d, y)
    }
  }
  for (const y of order) {
    const h = parentEdge[y]
    if (h < 0 || graph.device[h] < 0) continue
    const p = graph.to[h ^ 1]
    if (device[p] >= 0) continue
    firstDeviceRunM[graph.device[h]] = dist[p]
    firstDeviceSheathed[graph.device[h]] = sheath[p] === 1
  }
  // Reverse sweep: for a node still on an unprotected run, the worst first device below it
  // (−2 when some branch below reaches a load or an end with no device at all).
  const downDevice = new Int32Array(n).fill(-1)
  const downRunM = new Float64Array(n)
  const downSheathed = new Uint8Array(n).fill(1)
  const hasChild = new Uint8Array(n)
  for (let k = order.length - 1; k >= 0; k--) {
    const x = order[k]
    if (!hasChild[x]) downDevice[x] = -2
    const h = parentEdge[x]
    if (h < 0) continue
    const p = graph.to[h ^ 1]
    const di = graph.device[h]
    const cand = di >= 0 ? di : downDevice[x]
    const candRun = di >= 0 ? dist[p] : downRunM[x]
    const candSheath = di >= 0 ? sheath[p] : downSheathed[x]
    if (!hasChild[p]) {
      hasChild[p] = 1
      downDevice[p] = cand
      downRunM[p] = candRun
      downSheathed[p] = candSheath
    } else if (downDevice[p] !== -2) {
      if (cand === -2) downDevice[p] = -2
      else if (candRun > downRunM[p]) {
        downDevice[p] = cand
        downRunM[p] = candRun
        downSheathed[p] = candSheath
      }
    }
  }
  return {
    dist, device, downDevice, downRunM, downSheathed, firstDeviceRunM, firstDeviceSheathed,
    reached: (node: number) => Number.isFinite(dist[node]),
    sourceId: (node: number) => (source[node] >= 0 ? sourceIds[source[node]] : null),
  }
}
