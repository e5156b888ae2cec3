// The editor's view of the analysis contract (one source: shared/analysis/types.ts).
export type {
  AnalysisResult,
  ConductorSummary,
  DeviceSummary,
  Finding,
  FindingPatch,
  ScenarioResult,
  Severity,
} from '@shared/analysis/types'
