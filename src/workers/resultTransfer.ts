// The analysis result on its way back from the worker: only the records that differ from the
// previous result's (compared field by field), so the page copies in a handful of records instead of a
// few thousand, and unchanged findings and figures keep their objects on the page side.
import equal from 'fast-deep-equal'
import type { AnalysisResult, ConductorSummary, DeviceSummary, Finding, ScenarioResult } from '@shared/analysis/types'
import { createListDecoder, createListEncoder, type ListDelta } from './listDelta'

type ScenarioConductor = ScenarioResult['conductors'][number]
type ScenarioPart = ScenarioResult['parts'][number]

interface ScenarioDelta {
  head: Omit<ScenarioResult, 'conductors' | 'parts' | 'terminals'>
  conductors: ListDelta<ScenarioConductor>
  parts: ListDelta<ScenarioPart>
  /** Absent when equal to the previous result's. */
  terminals?: ScenarioResult['terminals']
}

export interface ResultDelta {
  rest: Omit<AnalysisResult, 'scenarios' | 'conductors' | 'devices' | 'findings'>
  scenarios: ScenarioDelta[]
  conductors: ListDelta<ConductorSummary>
  devices: ListDelta<DeviceSummary>
  findings: ListDelta<Finding>
}

// Field by field rather than as JSON: serialising both sides cost the worker 4–5 ms per result
// of 2 300 records and left as many strings for the collector; comparing them costs about 1 ms.
function scenarioEncoder() {
  const conductors = createListEncoder<ScenarioConductor>(equal)
  const parts = createListEncoder<ScenarioPart>(equal)
  let previousTerminals: ScenarioResult['terminals'] | null = null
  return (scenario: ScenarioResult): ScenarioDelta => {
    const { conductors: c, parts: p, terminals, ...head } = scenario
    const delta: ScenarioDelta = { head, conductors: conductors.encode(c), parts: parts.encode(p) }
    if (previousTerminals === null || !equal(previousTerminals, terminals)) delta.terminals = terminals
    previousTerminals = terminals
    return delta
  }
}

function scenarioDecoder() {
  const conductors = createListDecoder<ScenarioConductor>()
  const parts = createListDecoder<ScenarioPart>()
  let terminals: ScenarioResult['terminals'] | null = null
  return (delta: ScenarioDelta): ScenarioResult => {
    terminals = delta.terminals ?? terminals
    if (!terminals) throw new Error(`the first result for scenario "${delta.head.id}" lacks its terminal voltages`)
    return { ...delta.head, conductors: conductors(delta.conductors), parts: parts(delta.parts), terminals }
  }
}

/** Scenario channels by scenario id: one per scenario, dropped with the scenario. */
function perScenario<T>(create: () => T) {
  let byId = new Map<string, T>()
  return (ids: readonly string[]): T[] => {
    const next = new Map<string, T>()
    const list = ids.map((id) => {
      const channel = byId.get(id) ?? next.get(id) ?? create()
      next.set(id, channel)
      return channel
    })
    byId = next
    return list
  }
}

export function createResultEncoder(): (result: AnalysisResult) => ResultDelta {
  const conductors = createListEncoder<ConductorSummary>(equal)
  const devices = createListEncoder<DeviceSummary>(equal)
  const findings = createListEncoder<Finding>(equal)
  const scenarios = perScenario(scenarioEncoder)
  return (result) => {
    const { scenarios: s, conductors: c, devices: d, findings: f, ...rest } = result
    const encoders = scenarios(s.map((scenario) => scenario.id))
    return {
      rest,
      scenarios: s.map((scenario, i) => encoders[i](scenario)),
      conductors: conductors.encode(c),
      devices: devices.encode(d),
      findings: findings.encode(f),
    }
  }
}

export function createResultDecoder(): (delta: ResultDelta) => AnalysisResult {
  const conductors = createListDecoder<ConductorSummary>()
  const devices = createListDecoder<DeviceSummary>()
  const findings = createListDecoder<Finding>()
  const scenarios = perScenario(scenarioDecoder)
  return (delta) => {
    const decoders = scenarios(delta.scenarios.map((scenario) => scenario.head.id))
    return {
      ...delta.rest,
      scenarios: delta.scenarios.map((scenario, i) => decoders[i](scenario)),
      conductors: conductors(delta.conductors),
      devices: devices(delta.devices),
      findings: findings(delta.findings),
    }
  }
}
