import type { Design, Part, PartOf } from '../../design/schema'
import type { CircuitElement } from '../../solver/circuit'
import type { CompileProblem, ElementOwner } from '../compileCircuit'
import { conductorOhm } from './conductorFigures'
import type { ProtectiveDevice } from './devices'
import { batteryThevenin } from './sourceModels'
import { terminalKey, type TerminalNodes } from './terminalNodes'
import { UnionFind } from './unionFind'

/** The part of the circuit no scenario changes: conductors, closed devices, switches, shunts, banks. */
export interface PassiveCircuit {
  elements: CircuitElement[]
  owners: ElementOwner[]
  conductorElement: Map<string, number>
  partElement: Map<string, number>
  deviceElement: Map<string, number>
  batteryNegNodes: number[]
  problems: CompileProblem[]
  /** Per node, its group in the wiring + banks graph; hasBattery is indexed by that group. */
  suppliedRoot: Int32Array
  hasBattery: Uint8Array
  arraysOfController: Map<string, PartOf<'pv-array'>[]>
}

export function buildPassiveCircuit(design: Design, nodes: TerminalNodes, devices: ProtectiveDevice[]): PassiveCircuit {
  const elements: CircuitElement[] = []
  const owners: ElementOwner[] = []
  const conductorElement = new Map<string, number>()
  const partElement = new Map<string, number>()
  const deviceElement = new Map<string, number>()
  const problems: CompileProblem[] = []
  const batteryNegNodes: number[] = []
  const node = (partId: string, terminal: string) => nodes.nodeOf.get(terminalKey(partId, terminal))
  const add = (el: CircuitElement, owner: ElementOwner) => {
    elements.push(el)
    owners.push(owner)
    return elements.length - 1
  }

  // Series paths (conductors and closed devices): the positive-path groups find PV arrays' controllers.
  const series = new UnionFind(nodes.nodeCount)
  for (const c of design.conductors) {
    const a = node(c.from.partId, c.from.terminal)
    const b = node(c.to.partId, c.to.terminal)
    const r = conductorOhm(c, design.settings)
    if (a === undefined || b === undefined || r === null) {
      problems.push({ kind: 'bad-conductor', message: `Conductor ${c.label || c.id} has an unknown terminal or an unusable size/length`, partIds: [], conductorIds: [c.id] })
      continue
    }
    conductorElement.set(c.id, add({ kind: 'resistor', id: `c:${c.id}`, a, b, resistanceOhm: r }, { kind: 'conductor', id: c.id, role: 'main' }))
    series.union(a, b)
  }
  for (const d of devices) {
    const a = node(d.partId, d.lineTerminal)
    const b = node(d.partId, d.loadTerminal)
    if (!d.closed || a === undefined || b === undefined) continue
    const role = d.kind === 'panel-way' ? d.id.slice(d.partId.length + 1) : 'main'
    const i = add({ kind: 'resistor', id: `p:${d.id}`, a, b, resistanceOhm: Math.max(d.resistanceOhm, 1e-6) }, { kind: 'part', id: d.partId, role })
    if (role === 'main') partElement.set(d.partId, i)
    deviceElement.set(d.id, i)
    series.union(a, b)
  }
  const addSeries = (part: Part, ta: string, tb: string, ohm: number) => {
    const a = node(part.id, ta)
    const b = node(part.id, tb)
    if (a === undefined || b === undefined) return
    partElement.set(part.id, add({ kind: 'resistor', id: `p:${part.id}`, a, b, resistanceOhm: Math.max(ohm, 1e-6) }, { kind: 'part', id: part.id, role: 'main' }))
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
    partElement.set(part.id, add({ kind: 'vsource', id: `p:${part.id}`, pos, neg, voltageV: emfV, resistanceOhm }, { kind: 'part', id: part.id, role: 'main' }))
    supplied.union(pos, neg)
    batteryNegNodes.push(neg)
  }
  const suppliedRoot = new Int32Array(nodes.nodeCount)
  for (let n = 0; n < nodes.nodeCount; n++) suppliedRoot[n] = supplied.find(n)
  const hasBattery = new Uint8Array(nodes.nodeCount)
  for (const n of batteryNegNodes) hasBattery[suppliedRoot[n]] = 1

  return {
    elements, owners, conductorElement, partElement, deviceElement, batteryNegNodes, problems, suppliedRoot, hasBattery,
    arraysOfController: pvArraysByController(design, nodes, series),
  }
}

/** PV arrays whose positive reaches a controller's PV input through conductors and closed devices. */
export function pvArraysByController(design: Design, nodes: TerminalNodes, series: UnionFind): Map<string, PartOf<'pv-array'>[]> {
  const controllerOfGroup = new Map<number, string>()
  for (const part of design.parts) {
    if (part.type !== 'charge-controller') continue
    const pv = nodes.nodeOf.get(terminalKey(part.id, 'pv-pos'))
    if (pv !== undefined && !controllerOfGroup.has(series.find(pv))) controllerOfGroup.set(series.find(pv), part.id)
  }
  const result = new Map<string, PartOf<'pv-array'>[]>()
  for (const part of design.parts) {
    if (part.type !== 'pv-array') continue
    const pos = nodes.nodeOf.get(terminalKey(part.id, 'pos'))
    const controller = pos === undefined ? undefined : controllerOfGroup.get(series.find(pos))
    if (!controller) continue
    const list = result.get(controller) ?? []
    list.push(part)
    result.set(controller, list)
  }
  return result
}

