import type { Design, Scenario } from '../../design/schema'
import { solveOperatingPoint } from '../../solver/solveOperatingPoint'
import type { OperatingPoint } from '../../solver/circuit'
import { compileCircuit, type CompiledCircuit, type PreparedDesign } from '../compileCircuit'
import type { Finding, ScenarioConductorResult, ScenarioPartResult, ScenarioResult } from '../types'
import { finite } from './finite'
import { nodeAt, partPairNodes, type TerminalNodes } from './terminalNodes'
import { compileProblemFindings, solverProblemFindings } from './solverFindings'

export interface ScenarioSolve {
  scenario: Scenario
  compiled: CompiledCircuit
  op: OperatingPoint
  result: ScenarioResult
  /** Per conductor (design order): current, A (from → to) */
  conductorCurrentA: Float64Array
  /** Per conductor (design order): drop as a share of the nominal voltage, % */
  conductorDropPercent: Float64Array
  /** Per device (protectiveDevices order): |current|, A */
  deviceCurrentA: Float64Array
  /** Per part (design order): the current of its own element (a fuse panel: the sum of its ways; else 0) */
  partCurrentA: Float64Array
  /** Voltage between the two terminals of a part: V(a) − V(b) */
  voltageAcross: (partId: string, a: string, b: string) => number | null
  findings: Finding[]
}

/** Compile, solve and read back one scenario. Never throws for a parsed design. */
export function solveScenario(design: Design, scenario: Scenario, prepared: PreparedDesign): ScenarioSolve {
  const compiled = compileCircuit(design, scenario, prepared)
  const op = solveOperatingPoint(compiled.circuit, { cache: prepared.solverCache })
  const v = op.nodeVoltageV
  const nodeV = (n: number | undefined) => (n === undefined || n >= v.length ? null : finite(v[n]))
  const nominalV = design.settings.nominalVoltageV
  const elements = compiled.circuit.elements
  const elementCurrentA = op.elementCurrentA

  // Report terminal voltages against the negative of a bank in the same island.
  const islandOf = new Int32Array(compiled.circuit.nodeCount).fill(-1)
  op.islands.forEach((island, k) => { for (const n of island.nodes) islandOf[n] = k })
  const refV = new Float64Array(op.islands.length)
  const refSet = new Uint8Array(op.islands.length)
  for (const neg of compiled.batteryNegNodes) {
    const k = islandOf[neg]
    if (k >= 0 && !refSet[k]) { refV[k] = finite(v[neg] ?? 0); refSet[k] = 1 }
  }
  const referenced = (n: number | undefined) => (n === undefined ? 0 : finite((v[n] ?? 0) - (islandOf[n] >= 0 ? refV[islandOf[n]] : 0)))

  const conductorCurrentA = new Float64Array(design.conductors.length)
  const conductorDropPercent = new Float64Array(design.conductors.length)
  const conductorAt = compiled.conductorElementAt
  for (let i = 0; i < design.conductors.length; i++) {
    const e = conductorAt[i]
    if (e < 0) continue
    const el = elements[e]
    const currentA = finite(elementCurrentA[e])
    conductorCurrentA[i] = currentA
    conductorDropPercent[i] = finite((100 * (el.kind === 'resistor' ? Math.abs(currentA) * el.resistanceOhm : 0)) / nominalV)
  }
  const ids = idLists(design, compiled.nodes)
  // The per-conductor records of the result, from the same figures (built when first read, see scenarioResult).
  const conductorRecords = (): ScenarioConductorResult[] => ids.conductors.map((id, i) => {
    const e = conductorAt[i]
    if (e < 0) return { id, currentA: 0, dropV: 0, dropPercent: 0, fromV: 0, toV: 0 }
    const el = elements[e]
    const currentA = conductorCurrentA[i]
    const dropV = el.kind === 'resistor' ? Math.abs(currentA) * el.resistanceOhm : 0
    return {
      id, currentA, dropV: finite(dropV), dropPercent: conductorDropPercent[i],
      fromV: referenced(el.kind === 'resistor' ? el.a : undefined), toV: referenced(el.kind === 'resistor' ? el.b : undefined),
    }
  })

  const deviceAt = compiled.deviceElementAt
  const deviceCurrentA = new Float64Array(deviceAt.length)
  // A fuse panel's own current is the sum of its ways' (its ways are the devices after "panelId#").
  const panelCurrent = new Map<string, number>()
  prepared.devices.forEach((d, k) => {
    const e = deviceAt[k]
    if (e < 0) return
    const amps = Math.abs(finite(elementCurrentA[e]))
    deviceCurrentA[k] = amps
    const hash = d.id.indexOf('#')
    if (hash > 0) panelCurrent.set(d.id.slice(0, hash), (panelCurrent.get(d.id.slice(0, hash)) ?? 0) + amps)
  })
  const voltageAcross = (partId: string, a: string, b: string) => {
    const va = nodeV(nodeAt(compiled.nodes, partId, a))
    const vb = nodeV(nodeAt(compiled.nodes, partId, b))
    return va === null || vb === null ? null : va - vb
  }
  const pairs = partPairNodes(design, compiled.nodes)
  const partAt = compiled.partElementAt
  const partCurrentA = new Float64Array(design.parts.length)
  for (let i = 0; i < design.parts.length; i++) {
    const e = partAt[i]
    if (e >= 0) partCurrentA[i] = finite(elementCurrentA[e])
  }
  // Fuse panels (parts without an element of their own): only when the design has any.
  if (panelCurrent.size > 0) {
    for (let i = 0; i < design.parts.length; i++) if (partAt[i] < 0) partCurrentA[i] = panelCurrent.get(design.parts[i].id) ?? 0
  }
  const partRecords = (): ScenarioPartResult[] => ids.parts.map((id, i) => {
    const e = partAt[i]
    const a = pairs[2 * i]
    const b = pairs[2 * i + 1]
    const voltageV = a >= 0 && b >= 0 && a < v.length && b < v.length ? finite(v[a]) - finite(v[b]) : 0
    return { id, currentA: partCurrentA[i], powerW: e >= 0 ? finite(op.elementPowerW[e]) : 0, voltageV }
  })

  // A shorted source: name the conductors joined straight across it as well as the source.
  const problems = op.problems.map((p) => {
    if (p.kind !== 'shorted-source') return p
    const across = new Set<string>()
    for (const id of p.elementIds) {
      const source = compiled.circuit.elements.find((el) => el.id === id)
      if (source?.kind !== 'vsource') continue
      for (const el of compiled.circuit.elements) {
        if (el.kind === 'resistor' && ((el.a === source.pos && el.b === source.neg) || (el.a === source.neg && el.b === source.pos))) across.add(el.id)
      }
    }
    return { ...p, elementIds: [...p.elementIds, ...across] }
  })
  // Appended, not spread into a literal: two lists of different element kinds made the engine drop this function's code.
  const findings = solverProblemFindings(problems, scenario.id, scenario.name)
  for (const f of compileProblemFindings(compiled.problems, scenario.id)) findings.push(f)
  const broken = op.problems.some((p) => p.kind === 'shorted-source' || p.kind === 'source-loop' || p.kind === 'invalid-element')
  const status: ScenarioResult['status'] = op.status !== 'ok' ? 'not-converged' : broken ? 'failed' : 'ok'
  return {
    scenario, compiled, op, conductorCurrentA, conductorDropPercent, deviceCurrentA, partCurrentA, voltageAcross, findings,
    result: scenarioResult({ id: scenario.id, name: scenario.name, status }, {
      conductors: conductorRecords,
      parts: partRecords,
      // One key per terminal.
      terminals: () => {
        const terminals: Record<string, number> = {}
        for (const [key, n] of compiled.nodes.nodeOf) terminals[key] = referenced(n)
        return terminals
      },
    }),
  }
}

type LazyFields = Pick<ScenarioResult, 'conductors' | 'parts' | 'terminals'>

/**
 * A scenario result whose per-conductor, per-part and per-terminal records are enumerable properties
 * computed once, when first read: the editor, JSON and postMessage read them (for the scenario on
 * show), the rules never do — they read the same figures from the solve's arrays.
 */
function scenarioResult(base: Omit<ScenarioResult, keyof LazyFields>, build: { [K in keyof LazyFields]: () => LazyFields[K] }): ScenarioResult {
  for (const key of ['conductors', 'parts', 'terminals'] as const) {
    let value: LazyFields[typeof key] | undefined
    Object.defineProperty(base, key, {
      enumerable: true,
      configurable: true,
      get: () => (value ??= build[key]()),
      set: (next: LazyFields[typeof key]) => { value = next },
    })
  }
  return base as ScenarioResult
}

/** Conductor and part ids in design order, taken once per analysis (the records above may be built later). */
const ID_CACHE = new WeakMap<TerminalNodes, { conductors: string[]; parts: string[] }>()
function idLists(design: Design, nodes: TerminalNodes): { conductors: string[]; parts: string[] } {
  let ids = ID_CACHE.get(nodes)
  if (!ids || ids.conductors.length !== design.conductors.length || ids.parts.length !== design.parts.length) {
    ids = { conductors: design.conductors.map((c) => c.id), parts: design.parts.map((p) => p.id) }
    ID_CACHE.set(nodes, ids)
  }
  return ids
}
