
import type { Design, Part, PartOf, Scenario } from '../design/schema'
import type { Circuit, CircuitElement } from '../solver/circuit'
import type { SolverCache } from '../solver/solverCache'
import { protectiveDevices, type ProtectiveDevice } from './_lib/devices'
import { finite } from './_lib/finite'
import { buildPassiveCircuit, elementIdMap, type PassiveCircuit } from './_lib/passiveCircuit'
import { buildTerminalNodes, nodeAt, partPairNodes, type TerminalNodes } from './_lib/terminalNodes'

/** Who an element stands for: a part (and which of its elements) or a conductor. */
export interface ElementOwner {
  kind: 'part' | 'conductor'
  id: string
  /** 'main', 'way3' (fuse-panel way), 'pv-input' (controller), 'input' (DC-DC charger) */
  role: string
}

export interface CompileProblem {
  kind: 'bad-conductor' | 'no-supply' | 'array-without-controller'
  message: string
  partIds: string[]
  conductorIds: string[]
}

export interface CompiledCircuit {
  circuit: Circuit
  nodes: TerminalNodes
  /** Per element, who it stands for (same order as circuit.elements). */
  owners: ElementOwner[]
  conductorElement: Map<string, number>
  /** The element that carries a part's own current (battery source, load, device, converter output). */
  partElement: Map<string, number>
  /** Protective device id → its resistor (closed devices only). */
  deviceElement: Map<string, number>
  /** The same three by position: per conductor and per part (design order), per device (protectiveDevices order); −1 none. */
  conductorElementAt: Int32Array
  partElementAt: Int32Array
  deviceElementAt: Int32Array
  /** Negative terminal node of every battery, in part order. */
  batteryNegNodes: number[]
  problems: CompileProblem[]
}

/** Scenario-independent pieces, computed once per analysis and shared by every scenario's compile. */
export interface PreparedDesign {
  nodes: TerminalNodes
  devices: ProtectiveDevice[]
  passive?: PassiveCircuit
  /** Matrix structure shared by every scenario's solve and the fault study (same nodes, loads differ). */
  solverCache?: SolverCache
}

/** A scenario with nothing running and no charging: the circuit of batteries and wiring only. */
export const FAULT_STUDY_SCENARIO: Scenario = { id: '__fault__', name: 'Fault study', sunOn: false, chargerOn: false, loads: {} }

/**
 * Turns a design and one scenario into the solver's circuit (nodes and four element kinds).
 * - Every terminal is a node; bus studs, a panel's negatives and converters' common negatives are one node.
 * - Conductors, closed fuses/breakers/switches/panel ways and shunts are resistors; open ones are absent.
 * - A battery is a Thevenin source; loads are constant power, current or resistance at their scenario level.
 * - Sun on: a PV array is a current source of Imp × strings and its controller input the resistance that
 *   holds the array at Vmp (V/I), so the PV conductors carry the array current; the controller output
 *   delivers min(P·η, rated current × nominal V) as negative constant power into its battery side.
 * - Chargers deliver their rated current (a bulk-stage current source); a DC-DC charger draws the
 *   matching power ÷ η from its input.
 * - Active elements whose terminals cannot reach a battery are left out (reported as 'no-supply'),
 *   so a disconnected corner never makes the whole solve singular.
 * Never throws for a design that passed parseDesign.
 * @example const { circuit } = compileCircuit(design, design.scenarios[0])
 */
export function compileCircuit(design: Design, scenario: Scenario, prepared?: PreparedDesign): CompiledCircuit {
  const nodes = prepared?.nodes ?? buildTerminalNodes(design)
  const devices = prepared?.devices ?? protectiveDevices(design)
  const base = prepared?.passive ?? buildPassiveCircuit(design, nodes, devices)
  const nominalV = design.settings.nominalVoltageV
  const minVoltageV = 0.5 * nominalV // constant-power loads turn resistive below half voltage (ZIP-load practice)
  // The wiring, devices and banks are the same in every scenario: what runs is collected apart and
  // appended once at the end (one copy of the big arrays per scenario, not a copy and a regrowth).
  const added: CircuitElement[] = []
  const addedOwners: ElementOwner[] = []
  const partElementAt = base.partElementAt.slice()
  const problems: CompileProblem[] = base.problems.slice()
  const { conductorElementAt, deviceElementAt, batteryNegNodes, arraysOfController } = base
  const node = (partId: string, terminal: string) => nodeAt(nodes, partId, terminal)
  const add = (el: CircuitElement, owner: ElementOwner) => {
    added.push(el)
    addedOwners.push(owner)
    return base.elements.length + added.length - 1
  }
  const sameSupply = (a: number, b: number) => base.suppliedRoot[a] === base.suppliedRoot[b]
  const canSupply = (...ns: (number | undefined)[]) => ns.every((n) => n !== undefined && base.hasBattery[base.suppliedRoot[n]] === 1)
  const noSupply = (part: Part) =>
    problems.push({ kind: 'no-supply', message: `${part.label || part.id} is on in this scenario but no battery can supply it`, partIds: [part.id], conductorIds: [] })

  const loadSetting = (id: string) => {
    const s = scenario.loads[id]
    return s && s.on && s.level > 0 ? s.level : 0
  }

  const setOwn = (partId: string, e: number) => {
    const k = base.partIndex.get(partId)
    if (k !== undefined) partElementAt[k] = e
  }
  // A load's, an inverter's and a mains charger's element sits across its two main terminals.
  const pairs = partPairNodes(design, nodes)
  const pairNode = (k: number, second: 0 | 1) => (pairs[2 * k + second] >= 0 ? pairs[2 * k + second] : undefined)
  for (let k = 0; k < design.parts.length; k++) {
    const part = design.parts[k]
    switch (part.type) {
      case 'load': {
        const level = loadSetting(part.id)
        if (level === 0) break
        const pos = pairNode(k, 0)
        const neg = pairNode(k, 1)
        if (!canSupply(pos, neg)) { noSupply(part); break }
        const p = part.params
        const inrush = scenario.motorStart && p.start ? p.start.inrushMultiple : 1
        const id = base.ownElementId(k)
        const el: CircuitElement =
          p.model === 'current'
            ? { kind: 'isource', id, from: pos!, to: neg!, currentA: finite((p.currentA ?? 0) * level * inrush) }
            : p.model === 'resistance'
              ? { kind: 'resistor', id, a: pos!, b: neg!, resistanceOhm: finite((p.resistanceOhm ?? 1e6) / level / inrush, 1e6) }
              : { kind: 'cpower', id, pos: pos!, neg: neg!, powerW: finite((p.powerW ?? 0) * level * inrush), minVoltageV }
        setOwn(part.id, add(el, base.ownOwner(k)))
        break
      }
      case 'inverter': {
        const level = loadSetting(part.id)
        if (level === 0) break
        const pos = pairNode(k, 0)
        const neg = pairNode(k, 1)
        if (!canSupply(pos, neg)) { noSupply(part); break }
        const acW = scenario.motorStart ? part.params.surgeW : part.params.continuousW * level
        setOwn(part.id, add({ kind: 'cpower', id: `p:${part.id}`, pos: pos!, neg: neg!, powerW: finite(acW / part.params.efficiency), minVoltageV }, { kind: 'part', id: part.id, role: 'main' }))
        break
      }
      case 'mains-charger': {
        if (!(scenario.chargerOn || loadSetting(part.id) > 0)) break
        const pos = pairNode(k, 0)
        const neg = pairNode(k, 1)
        if (!canSupply(pos, neg)) { noSupply(part); break }
        setOwn(part.id, add({ kind: 'isource', id: `p:${part.id}`, from: neg!, to: pos!, currentA: part.params.outputCurrentA }, { kind: 'part', id: part.id, role: 'main' }))
        break
      }
      case 'dc-dc-charger': {
        const level = loadSetting(part.id) || (scenario.chargerOn ? 1 : 0)
        if (level === 0) break
        const ns = ['in-pos', 'in-neg', 'out-pos', 'out-neg'].map((t) => node(part.id, t))
        if (!canSupply(...ns)) { noSupply(part); break }
        const outA = part.params.outputCurrentA * level
        add({ kind: 'cpower', id: `p:${part.id}#in`, pos: ns[0]!, neg: ns[1]!, powerW: finite((outA * nominalV) / part.params.efficiency), minVoltageV: part.params.inputMinV }, { kind: 'part', id: part.id, role: 'input' })
        setOwn(part.id, add({ kind: 'isource', id: `p:${part.id}`, from: ns[3]!, to: ns[2]!, currentA: finite(outA) }, { kind: 'part', id: part.id, role: 'main' }))
        break
      }
      case 'charge-controller': {
        if (!scenario.sunOn) break
        const arrays = arraysOfController.get(part.id) ?? []
        const ns = ['pv-pos', 'pv-neg', 'bat-pos', 'bat-neg'].map((t) => node(part.id, t))
        const wired = arrays.filter((a) => { const neg = node(a.id, 'neg'); return neg !== undefined && ns[1] !== undefined && sameSupply(neg, ns[1]) })
        if (wired.length === 0) break
        // The PV input is fed by the arrays; the battery side (and the common negative) needs a bank.
        if (!canSupply(ns[1], ns[2], ns[3])) { noSupply(part); break }
        addController(part, wired, ns as number[])
        break
      }
    }
  }
  for (const a of design.parts) {
    if (a.type === 'pv-array' && scenario.sunOn && !(partElementAt[base.partIndex.get(a.id) ?? -1] >= 0) && ![...arraysOfController.values()].some((list) => list.includes(a)))
      problems.push({ kind: 'array-without-controller', message: `${a.label || a.id} is not wired to a charge controller's PV input`, partIds: [a.id], conductorIds: [] })
  }

  function addController(part: PartOf<'charge-controller'>, arrays: PartOf<'pv-array'>[], ns: number[]) {
    const p = part.params
    const totalImpA = arrays.reduce((s, a) => s + a.params.moduleImpA * a.params.strings, 0)
    // MPPT holds the array at Vmp; a PWM controller ties it to the battery (nominal voltage here).
    const operatingV = p.mppt ? Math.min(...arrays.map((a) => a.params.moduleVmpV * a.params.modulesPerString)) : nominalV
    const availableW = operatingV * Math.min(totalImpA, p.maxPvCurrentA) * p.efficiency
    const outW = Math.min(availableW, p.outputCurrentA * nominalV)
    // The controller backs the array off when it clips: scale every array's current by the same share.
    const share = totalImpA > 0 ? outW / (operatingV * totalImpA * p.efficiency) : 0
    if (!(share > 0)) return
    for (const a of arrays) {
      const pos = node(a.id, 'pos')
      const neg = node(a.id, 'neg')
      if (pos === undefined || neg === undefined) continue
      setOwn(a.id, add({ kind: 'isource', id: `p:${a.id}`, from: neg, to: pos, currentA: finite(a.params.moduleImpA * a.params.strings * share) }, { kind: 'part', id: a.id, role: 'main' }))
    }
    add({ kind: 'resistor', id: `p:${part.id}#pv`, a: ns[0], b: ns[1], resistanceOhm: finite(operatingV / (totalImpA * share), 1e6) }, { kind: 'part', id: part.id, role: 'pv-input' })
    setOwn(part.id, add({ kind: 'cpower', id: `p:${part.id}`, pos: ns[2], neg: ns[3], powerW: -finite(outW), minVoltageV }, { kind: 'part', id: part.id, role: 'main' }))
  }

  const elements = base.elements.concat(added)
  const owners = base.owners.concat(addedOwners)
  return new CompiledScenario(
    { circuit: new ScenarioCircuit(nodes, elements), nodes, owners, conductorElementAt, partElementAt, deviceElementAt, batteryNegNodes, problems },
    base, design.parts,
  )
}

/** A scenario's circuit whose node names (for netlists and messages) are made when first read: the analysis never reads them. */
class ScenarioCircuit implements Circuit {
  readonly nodeCount: number

  constructor(private readonly nodes: TerminalNodes, readonly elements: CircuitElement[]) {
    this.nodeCount = nodes.nodeCount
  }

  get nodeNames(): string[] {
    return this.nodes.nodeNames
  }
}

type CompiledFields = Omit<CompiledCircuit, 'partElement' | 'conductorElement' | 'deviceElement'>

/**
 * A compiled scenario whose id-keyed maps are built on first read (the analysis reads positions only).
 * Classes, not per-object getters: every scenario's objects then share one shape (see TerminalNodeTable).
 */
interface CompiledScenario extends CompiledFields {}
class CompiledScenario implements CompiledCircuit {
  private byPart: Map<string, number> | undefined = undefined

  constructor(fields: CompiledFields, private readonly passive: PassiveCircuit, private readonly parts: readonly { id: string }[]) {
    Object.assign(this, fields) // always the same fields in the same order: one shape
  }

  get conductorElement(): Map<string, number> {
    return this.passive.conductorElement
  }

  get deviceElement(): Map<string, number> {
    return this.passive.deviceElement
  }

  get partElement(): Map<string, number> {
    return (this.byPart ??= elementIdMap(this.parts, this.partElementAt))
  }
}

export { pvArraysByController } from './_lib/passiveCircuit'
