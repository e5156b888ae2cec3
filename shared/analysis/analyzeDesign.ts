import type { Conductor, Design, PartOf } from '../design/schema'
import { createSolverCache } from '../solver/solverCache'
import type { PreparedDesign } from './compileCircuit'
import { buildPassiveCircuit } from './_lib/passiveCircuit'
import { conductorStats } from './_lib/conductorStats'
import { deviceStats } from './_lib/deviceStats'
import { protectiveDevices } from './_lib/devices'
import { faultStudy } from './_lib/faultStudy'
import { finite } from './_lib/finite'
import { viewByIndex } from './_lib/idLookup'
import { loadDrops } from './_lib/loadDrops'
import { solveScenario, type ScenarioSolve } from './_lib/solveScenario'
import { buildTerminalNodes } from './_lib/terminalNodes'
import { makeFinding, mergeFindings } from './findings'
import { protectionTopology } from './protectionTopology'
import { COORDINATION_RULES, RULES } from './rules'
import type { IdLookup, PvGroup, RuleContext } from './rules/types'
import type { AnalysisResult, Finding } from './types'

export interface AnalyzeOptions {
  /** Only these scenarios (default: all). Unknown ids give a warning finding. */
  scenarioIds?: string[]
  /**
   * Run the time-current checks of shared/protection (motor starts, fault clearing before conductor
   * damage, thermal breakers as sole protection, selectivity, automatic-reset breakers). On by
   * default; `false` leaves them out (e.g. a quick check while a design is still being sketched).
   */
  coordination?: boolean
}

/**
 * Solves every scenario of a design, computes fault currents and runs every rule: one findings list,
 * worst case over the scenarios. Never throws and never returns NaN: a circuit that cannot be
 * solved gives findings naming its parts.
 * @example
 * const { findings } = analyzeDesign(createDemoDesign())
 * findings.filter((f) => f.severity === 'error').map((f) => f.title)
 */
export function analyzeDesign(design: Design, options: AnalyzeOptions = {}): AnalysisResult {
  try {
    return analyze(design, options)
  } catch (error) {
    // A defect of ours, not of the design: say so plainly instead of crashing the editor or the API.
    const message = error instanceof Error ? error.message : String(error)
    return {
      scenarios: [], conductors: [], devices: [],
      findings: [makeFinding({ ruleId: 'analysis-failed', severity: 'error', title: 'Analysis could not finish', partIds: [], conductorIds: [],
        source: 'Ampwright analysis', message: `The analysis stopped on an internal error (${message}). The design was not checked; please report it.` })],
    }
  }
}

function analyze(design: Design, options: AnalyzeOptions): AnalysisResult {
  const nodes = buildTerminalNodes(design)
  const devices = protectiveDevices(design)
  const prepared: PreparedDesign = { nodes, devices, passive: buildPassiveCircuit(design, nodes, devices), solverCache: createSolverCache() }
  const topology = protectionTopology(design, nodes, devices)
  const findings: Finding[] = []

  const wanted = options.scenarioIds ? new Set(options.scenarioIds) : null
  const scenarios = wanted ? design.scenarios.filter((s) => wanted.has(s.id)) : design.scenarios
  for (const id of wanted ?? []) {
    if (!design.scenarios.some((s) => s.id === id))
      findings.push(makeFinding({ ruleId: 'unknown-scenario', severity: 'warning', title: 'Unknown scenario', partIds: [], conductorIds: [],
        source: 'Ampwright analysis', message: `No scenario has the id "${id}"; it was skipped.` }))
  }
  const solves: ScenarioSolve[] = scenarios.map((s) => solveScenario(design, s, prepared))
  for (const s of solves) findings.push(...s.findings)

  const conductorsAt: IdLookup<Conductor[]> = { get: (partId) => nodes.byPart.get(partId)?.conductors }
  const pvGroups = buildPvGroups(design, prepared.passive!.arraysOfController)
  const faults = faultStudy(design, prepared, topology)
  const conductors = conductorStats(design, solves, topology, faults.conductorFarEndA, pvGroups, devices, prepared.passive!)
  const deviceList = deviceStats(design, devices, solves, topology, faults.deviceFaultA, pvGroups, conductorsAt, conductors)
  const partIndex = prepared.passive!.partIndex
  const ctx: RuleContext = {
    design, profile: design.settings.profile, nominalV: design.settings.nominalVoltageV,
    conductors, conductorById: viewByIndex(nodes.conductorIndex, conductors),
    devices: deviceList, deviceById: viewByIndex(topology.deviceIndex, deviceList),
    partById: viewByIndex(partIndex, design.parts),
    conductorsAtPart: conductorsAt,
    loadDrops: loadDrops(design, solves, topology, conductorsAt), pvGroups, nodes, topology,
    partMaxCurrent: partMaxCurrents(design, solves, partIndex),
    loadRunningA: loadRunningCurrents(design, solves, partIndex),
  }
  for (const rule of options.coordination === false ? RULES : [...RULES, ...COORDINATION_RULES]) {
    try {
      findings.push(...rule.run(ctx))
    } catch (error) {
      findings.push(makeFinding({ ruleId: `${rule.id}-failed`, severity: 'warning', title: `Check not run: ${rule.title}`, partIds: [], conductorIds: [],
        source: rule.source, message: `This check stopped on an internal error (${error instanceof Error ? error.message : String(error)}); its result is missing.` }))
    }
  }

  return {
    scenarios: solves.map((s) => s.result),
    conductors: conductors.map((c) => ({
      id: c.conductor.id, maxCurrentA: finite(c.maxCurrentA), ampacityA: finite(c.ampacityA ?? 0), ampacitySource: c.ampacitySource,
      resistanceOhm: finite(c.resistanceOhm), dropPercentMax: finite(c.dropPercentMax),
      protectingDeviceId: c.protection.protectingDeviceId, faultCurrentFarEndA: finite(c.faultFarEndA),
    })),
    devices: deviceList.map((d) => ({
      id: d.device.id, partId: d.device.partId, ratingA: d.device.ratingA, maxCurrentA: finite(d.maxCurrentA),
      faultCurrentA: finite(d.faultCurrentA), protectsConductorIds: d.protectsConductorIds,
    })),
    findings: mergeFindings(findings),
  }
}

/** Each charge controller with the arrays wired to its PV input. */
function buildPvGroups(design: Design, byController: Map<string, PartOf<'pv-array'>[]>): PvGroup[] {
  return design.parts
    .filter((p): p is PartOf<'charge-controller'> => p.type === 'charge-controller')
    .map((controller) => ({ controller, arrays: byController.get(controller.id) ?? [] }))
    .filter((g) => g.arrays.length > 0)
}

/** Highest |current| per part over the scenarios; a bus bar's is the total fed into it. */
function partMaxCurrents(design: Design, solves: ScenarioSolve[], partIndex: IdLookup<number>): IdLookup<{ currentA: number; scenarioId: string }> {
  const { parts, conductors } = design
  // Worst so far per part (design order) and the scenario it came from (index, −1 none).
  const worstA = new Float64Array(parts.length)
  const worstScenario = new Int32Array(parts.length).fill(-1)
  const note = (k: number, currentA: number, scenario: number) => {
    if (currentA > 0 && (worstScenario[k] < 0 || currentA > worstA[k])) { worstA[k] = finite(currentA); worstScenario[k] = scenario }
  }
  // The bus bar at each conductor end (its part position, −1 when the end is on another part).
  const busIndex = new Map<string, number>()
  parts.forEach((p, k) => { if (p.type === 'bus-bar') busIndex.set(p.id, k) })
  const toBus = conductors.map((c) => busIndex.get(c.to.partId) ?? -1)
  const fromBus = conductors.map((c) => busIndex.get(c.from.partId) ?? -1)
  const inflow = new Float64Array(parts.length)
  const fed = new Uint8Array(parts.length)
  solves.forEach((s, scenario) => {
    for (let k = 0; k < parts.length; k++) note(k, Math.abs(s.partCurrentA[k]), scenario)
    inflow.fill(0)
    fed.fill(0)
    for (let i = 0; i < conductors.length; i++) {
      const amps = s.conductorCurrentA[i] // from → to
      if (toBus[i] >= 0 && amps > 0) { inflow[toBus[i]] += amps; fed[toBus[i]] = 1 }
      if (fromBus[i] >= 0 && amps < 0) { inflow[fromBus[i]] -= amps; fed[fromBus[i]] = 1 }
    }
    for (let k = 0; k < parts.length; k++) if (fed[k]) note(k, inflow[k], scenario)
  })
  // Read for the few rated part types only: each record is made when asked for.
  return {
    get: (id) => {
      const k = partIndex.get(id)
      return k === undefined || worstScenario[k] < 0 ? undefined : { currentA: worstA[k], scenarioId: solves[worstScenario[k]].scenario.id }
    },
  }
}

/** Running current per load: the highest outside motor-start scenarios, else its rating at nominal voltage. */
function loadRunningCurrents(design: Design, solves: ScenarioSolve[], partIndex: IdLookup<number>): IdLookup<number> {
  const nominalV = design.settings.nominalVoltageV
  // Read for loads with a start only: worked out when asked for.
  const runningA = (k: number): number | undefined => {
    const part = design.parts[k]
    if (part.type !== 'load') return undefined
    let amps = 0
    for (const s of solves) if (!s.scenario.motorStart) amps = Math.max(amps, Math.abs(s.partCurrentA[k]))
    if (amps === 0) {
      const p = part.params
      amps = p.model === 'current' ? (p.currentA ?? 0) : p.model === 'power' ? (p.powerW ?? 0) / nominalV : nominalV / (p.resistanceOhm ?? Infinity)
    }
    return finite(amps)
  }
  return { get: (id) => { const k = partIndex.get(id); return k === undefined ? undefined : runningA(k) } }
}
