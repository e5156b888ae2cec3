import type {
  AnalysisResult,
  ConductorSummary,
  DeviceSummary,
  Finding,
  ScenarioResult,
  Severity,
} from './analysisTypes'

// Look-up tables over one analysis result, built once per result so that every node and edge on
// the canvas reads its own figures in O(1).

type ScenarioConductor = ScenarioResult['conductors'][number]
type ScenarioPart = ScenarioResult['parts'][number]

export interface AnalysisIndex {
  findingsByPart: Map<string, Finding[]>
  findingsByConductor: Map<string, Finding[]>
  worstByPart: Map<string, Severity>
  worstByConductor: Map<string, Severity>
  conductorSummary: Map<string, ConductorSummary>
  /** Devices by part id (a fuse panel has one per way). */
  devicesByPart: Map<string, DeviceSummary[]>
  /** Results of the scenario shown on the canvas. */
  scenario: ScenarioResult | null
  conductorRun: Map<string, ScenarioConductor>
  partRun: Map<string, ScenarioPart>
  terminals: Record<string, number>
}

export const SEVERITY_RANK: Record<Severity, number> = { error: 0, warning: 1, info: 2 }

const worse = (a: Severity | undefined, b: Severity) => (a === undefined || SEVERITY_RANK[b] < SEVERITY_RANK[a] ? b : a)

function push<K, V>(map: Map<K, V[]>, key: K, value: V) {
  const list = map.get(key)
  if (list) list.push(value)
  else map.set(key, [value])
}

export function indexAnalysis(result: AnalysisResult | null, scenarioId: string | null): AnalysisIndex {
  const index: AnalysisIndex = {
    findingsByPart: new Map(),
    findingsByConductor: new Map(),
    worstByPart: new Map(),
    worstByConductor: new Map(),
    conductorSummary: new Map(),
    devicesByPart: new Map(),
    scenario: null,
    conductorRun: new Map(),
    partRun: new Map(),
    terminals: {},
  }
  if (!result) return index
  for (const finding of result.findings) {
    for (const id of finding.partIds) {
      push(index.findingsByPart, id, finding)
      index.worstByPart.set(id, worse(index.worstByPart.get(id), finding.severity))
    }
    for (const id of finding.conductorIds) {
      push(index.findingsByConductor, id, finding)
      index.worstByConductor.set(id, worse(index.worstByConductor.get(id), finding.severity))
    }
  }
  for (const summary of result.conductors) index.conductorSummary.set(summary.id, summary)
  for (const device of result.devices) push(index.devicesByPart, device.partId ?? device.id, device)
  const scenario = result.scenarios.find((s) => s.id === scenarioId) ?? result.scenarios[0] ?? null
  index.scenario = scenario
  if (scenario) {
    for (const run of scenario.conductors) index.conductorRun.set(run.id, run)
    for (const run of scenario.parts) index.partRun.set(run.id, run)
    index.terminals = scenario.terminals
  }
  return index
}
