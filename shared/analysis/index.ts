// Public API of the analysis: compile a design into a circuit, analyse every scenario, findings.
export { analyzeDesign, type AnalyzeOptions } from './analyzeDesign'
export { compileCircuit, FAULT_STUDY_SCENARIO, type CompiledCircuit, type ElementOwner } from './compileCircuit'
export { protectionTopology, type ProtectionTopology, type ConductorProtection } from './protectionTopology'
export { RULES } from './rules'
export type * from './types'
