// Result and finding shapes of the analysis. Every number here is finite (guarded where computed).

export type Severity = 'error' | 'warning' | 'info'

export interface Quantity {
  value: number
  unit: string
}

export interface FindingPatch {
  kind: 'conductor' | 'part'
  id: string
  /** Dotted path inside the conductor or part, e.g. 'sizeId' or 'params.ratingA' or 'params.wayRatingsA.2'. */
  field: string
  value: string | number | boolean
}

export interface Finding {
  /** ruleId + sorted target ids: stable across runs so the editor can keep selection and dismissals. */
  id: string
  ruleId: string
  severity: Severity
  title: string
  message: string
  partIds: string[]
  conductorIds: string[]
  measured?: Quantity
  limit?: Quantity
  /** Published source of the rule (standard + section), or "common practice". */
  source: string
  suggestion?: { text: string; patch?: FindingPatch }
  scenarioId?: string
}

export interface ScenarioConductorResult {
  id: string
  currentA: number
  dropV: number
  dropPercent: number
  fromV: number
  toV: number
}

export interface ScenarioPartResult {
  id: string
  currentA: number
  powerW: number
  voltageV: number
}

export interface ScenarioResult {
  id: string
  name: string
  status: 'ok' | 'not-converged' | 'failed'
  conductors: ScenarioConductorResult[]
  parts: ScenarioPartResult[]
  /** Voltage of every terminal ("partId:terminal") against the negative terminal of the bank in its island. */
  terminals: Record<string, number>
}

export interface ConductorSummary {
  id: string
  maxCurrentA: number
  ampacityA: number
  /** The ampacity table (and factors) the figure comes from. */
  ampacitySource: string
  resistanceOhm: number
  dropPercentMax: number
  protectingDeviceId: string | null
  faultCurrentFarEndA: number
}

export interface DeviceSummary {
  /** The part id, or "panelId#wayN" for a fuse panel's way. */
  id: string
  partId: string
  ratingA: number
  maxCurrentA: number
  faultCurrentA: number
  protectsConductorIds: string[]
}

export interface AnalysisResult {
  scenarios: ScenarioResult[]
  conductors: ConductorSummary[]
  devices: DeviceSummary[]
  findings: Finding[]
}
