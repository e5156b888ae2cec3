import type { Design, Part, PartOf } from '../../design/schema'
import type { CircuitElement } from '../../solver/circuit'
import type { CompileProblem, ElementOwner } from '../compileCircuit'
import { conductorOhm } from './conductorFigures'
import type { ProtectiveDevice } from './devices'
import { batteryThevenin } from './sourceModels'
import { nodeAt, type TerminalNodes } from './terminalNodes'
import type { IdLookup } from './idLookup'
import { UnionFind } from './unionFind'

/** The part of the circuit no scenario changes: conductors, closed devices, switches, shunts, banks. */
export interface PassiveCircuit {
  elements: CircuitElement[]
  owners: ElementOwner[]
  /** Conductor id → its resistor, device id → its resistor (closed devices): built on first read from the arrays below. */
  readonly conductorElement: Map<string, number>
  readonly deviceElement: Map<string, number>
  /** By position: per conductor (design order), per part (design order), per device (list order); −1 none. */
  conductorElementAt: Int32Array
  partElementAt: Int32Array
  deviceElementAt: Int32Array
  /** Part id → its position in design.parts (the last, for a repeated id). */
  partIndex: IdLookup<number>
  batteryNegNodes: number[]
  problems: CompileProblem[]
  /** Per node, its group in the wiring + banks graph; hasBattery is indexed by that group. */
  suppliedRoot: Int32Array
  hasBattery: Uint8Array
  arraysOfController: Map<string, PartOf<'pv-array'>[]>
  /** Per part position: the id of the part's own element ("p:<id>") and its owner record, made once and shared by every scenario. */
  ownElementId: (k: number) => string
  ownOwner: (k: number) => ElementOwner
}

export function buildPassiveCircuit(design: Design, nodes: TerminalNodes, devices: ProtectiveDevice[]): PassiveCircuit {
  const elements: CircuitElement[] = []
  const owners: ElementOwner[] = []
  const problems: CompileProblem[] = []
  const batteryNegNodes: number[] = []
  const conductorElementAt = new Int32Array(design.conductors.length).fill(-1)
  const partElementAt = new Int32Array(design.parts.length).fill(-1)
  const deviceElementAt = new Int32Array(devices.length).fill(-1)
  const node = (partId: string, terminal: string) => nodeAt(nodes, partId, terminal)
  const add = (el: CircuitElement, owner: ElementOwner) => {
    elements.push(el)
    owners.push(owner)
    return elements.length - 1
  }

  // Series paths (conductors and closed devices): the positive-path groups find PV arrays' controllers.
  const series = new UnionFind(nodes.nodeCount)
  design.conductors.forEach((c, k) => {
    const a = nodes.conductorFrom[k]
    const b = nodes.conductorTo[k]
    const r = conductorOhm(c, design.settings)
    if (a < 0 || b < 0 || r === null) {
      problems.push({ kind: 'bad-conductor', message: `Conductor ${c.label || c.id} has an unknown terminal or an unusable size/length`, partIds: [], conductorIds: [c.id] })
      return
    }
    const e = add({ kind: 'resistor', id: `c:${c.id}`, a, b, resistanceOhm: r }, { kind: 'conductor', id: c.id, role: 'main' })
    conductorElementAt[k] = e
    series.union(a, b)
  })
  const partIndex: IdLookup<number> = { get: (id) => nodes.byPart.get(id)?.index }
  const setPartElement = (partId: string, e: number) => {
    partElementAt[partIndex.get(partId)!] = e
  }
  devices.forEach((d, k) => {
    const a = node(d.partId, d.lineTerminal)
    const b = node(d.partId, d.loadTerminal)
    if (!d.closed || a === undefined || b === undefined) return
    const role = d.kind === 'panel-way' ? d.id.slice(d.partId.length + 1) : 'main'
    const i = add({ kind: 'resistor', id: `p:${d.id}`, a, b, resistanceOhm: Math.max(d.resistanceOhm, 1e-6) }, { kind: 'part', id: d.partId, role })
    if (role === 'main') setPartElement(d.partId, i)
    deviceElementAt[k] = i
    series.union(a, b)
  })
  const addSeries = (part: Part, ta: string, tb: string, ohm: number) => {
    const a = node(part.id, ta)
    const b = node(part.id, tb)
    if (a === undefined || b === undefined) return
    setPartElement(part.id, add({ kind: 'resistor', id: `p:${part.id}`, a, b, resistanceOhm: Math.max(ohm, 1e-6) }, { kind: 'part', id: part.id, role: 'main' }))
    series.union(a, b)
  }
  for (const part of design.parts) {
    if (part.type === 'battery-switch' && part.params.closed) addSeries(part, 'a', 'b', part.params.resistanceOhm)
    if (part.type === 'shunt') addSeries(part, 'battery', 'system', part.params.resistanceOhm)
  }

  // Batteries, and which nodes a battery can reach (its two terminals joined through the bank).
  const supplied = new UnionFind(nodes.nodeCount)
  for (const el of elements) if (el.kind === 'resistor') supplied.union(el.a, el.b)
  for (const part of design.parts) {
    if (part.type !== 'battery') continue
    const pos = node(part.id, 'pos')
    const neg = node(part.id, 'neg')
    if (pos === undefined || neg === undefined) continue
    const { emfV, resistanceOhm } = batteryThevenin(part.params)
    setPartElement(part.id, add({ kind: 'vsource', id: `p:${part.id}`, pos, neg, voltageV: emfV, resistanceOhm }, { kind: 'part', id: part.id, role: 'main' }))
    supplied.union(pos, neg)
    batteryNegNodes.push(neg)
  }
  const suppliedRoot = new Int32Array(nodes.nodeCount)
  for (let n = 0; n < nodes.nodeCount; n++) suppliedRoot[n] = supplied.find(n)
  const hasBattery = new Uint8Array(nodes.nodeCount)
  for (const n of batteryNegNodes) hasBattery[suppliedRoot[n]] = 1

  const ownIds: string[] = new Array(design.parts.length)
  const ownOwners: ElementOwner[] = new Array(design.parts.length)
  return new PassiveNet({
    elements, owners, conductorElementAt, partElementAt, deviceElementAt, partIndex,
    batteryNegNodes, problems, suppliedRoot, hasBattery,
    arraysOfController: pvArraysByController(design, nodes, series),
    ownElementId: (k: number) => (ownIds[k] ??= `p:${design.parts[k].id}`),
    ownOwner: (k: number) => (ownOwners[k] ??= { kind: 'part', id: design.parts[k].id, role: 'main' }),
  }, design.conductors, devices)
}

/** Map id → element for items in order (−1 left out; the last of a repeated id wins). */
export function elementIdMap(items: readonly { id: string }[], elementAt: Int32Array): Map<string, number> {
  const map = new Map<string, number>()
  for (let k = 0; k < items.length; k++) if (elementAt[k] >= 0) map.set(items[k].id, elementAt[k])
  return map
}

type PassiveFields = Omit<PassiveCircuit, 'conductorElement' | 'deviceElement'>

/**
 * The passive circuit with its id-keyed views (tests, references, tools) built on first read: the
 * analysis reads positions. A class, so every analysis's object has one shape (see TerminalNodeTable).
 */
interface PassiveNet extends PassiveFields {}
class PassiveNet implements PassiveCircuit {
  private byConductor: Map<string, number> | undefined = undefined
  private byDevice: Map<string, number> | undefined = undefined

  constructor(fields: PassiveFields, private readonly conductors: readonly { id: string }[], private readonly devices: readonly { id: string }[]) {
    Object.assign(this, fields) // always the same fields in the same order: one shape
  }

  get conductorElement(): Map<string, number> {
    return (this.byConductor ??= elementIdMap(this.conductors, this.conductorElementAt))
  }

  get deviceElement(): Map<string, number> {
    return (this.byDevice ??= elementIdMap(this.devices, this.deviceElementAt))
  }
}

/** PV arrays whose positive reaches a controller's PV input through conductors and closed devices. */
export function pvArraysByController(design: Design, nodes: TerminalNodes, series: UnionFind): Map<string, PartOf<'pv-array'>[]> {
  const controllerOfGroup = new Map<number, string>()
  for (const part of design.parts) {
    if (part.type !== 'charge-controller') continue
    const pv = nodeAt(nodes, part.id, 'pv-pos')
    if (pv !== undefined && !controllerOfGroup.has(series.find(pv))) controllerOfGroup.set(series.find(pv), part.id)
  }
  const result = new Map<string, PartOf<'pv-array'>[]>()
  for (const part of design.parts) {
    if (part.type !== 'pv-array') continue
    const pos = nodeAt(nodes, part.id, 'pos')
    const controller = pos === undefined ? undefined : controllerOfGroup.get(series.find(pos))
    if (!controller) continue
    const list = result.get(controller) ?? []
    list.push(part)
    result.set(controller, list)
  }
  return result
}

