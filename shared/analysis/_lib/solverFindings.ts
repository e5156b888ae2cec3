import type { SolverProblem } from '../../solver/circuit'
import type { CompileProblem } from '../compileCircuit'
import { makeFinding } from '../findings'
import type { Finding } from '../types'

// Circuits that cannot be solved become findings naming the parts, never exceptions.

/** Element ids are "c:<conductorId>" or "p:<partId>[#role]" (ids never contain ':' or '#'). */
export function ownersOfElementIds(elementIds: readonly string[]): { partIds: string[]; conductorIds: string[] } {
  const partIds = new Set<string>()
  const conductorIds = new Set<string>()
  for (const id of elementIds) {
    if (id.startsWith('c:')) conductorIds.add(id.slice(2))
    else if (id.startsWith('p:')) partIds.add(id.slice(2).split('#')[0])
  }
  return { partIds: [...partIds].sort(), conductorIds: [...conductorIds].sort() }
}

const SOLVER_SOURCE = 'Circuit model (DC nodal analysis); common practice'

export function solverProblemFindings(problems: readonly SolverProblem[], scenarioId: string, scenarioName: string): Finding[] {
  const findings: Finding[] = []
  for (const p of problems) {
    const owners = ownersOfElementIds(p.elementIds)
    const names = [...owners.partIds, ...owners.conductorIds].join(', ')
    switch (p.kind) {
      case 'shorted-source':
        findings.push(makeFinding({ ruleId: 'shorted-source', severity: 'error', title: 'Source shorted', ...owners, source: SOLVER_SOURCE, scenarioId,
          message: `A source is joined across its terminals by (almost) no resistance: ${names}. Check the wiring for a conductor from positive to negative.` }))
        break
      case 'source-loop':
        findings.push(makeFinding({ ruleId: 'source-loop', severity: 'error', title: 'Sources fighting in a loop', ...owners, source: SOLVER_SOURCE, scenarioId,
          message: `In "${scenarioName}" one source drives another backwards: ${names}. Check banks of different voltage wired in parallel.` }))
        break
      case 'not-converged':
        findings.push(makeFinding({ ruleId: 'not-converged', severity: 'error', title: 'Loads cannot be supplied', ...owners, source: SOLVER_SOURCE, scenarioId,
          measured: { value: finite(p.residualA), unit: 'A' },
          message: `In "${scenarioName}" the circuit has no stable operating point for ${names || 'the constant-power loads'}: the supply collapses under their demand (too much resistance in the path, or too little source).` }))
        break
      case 'invalid-element':
        findings.push(makeFinding({ ruleId: 'invalid-element', severity: 'error', title: 'Part left out of the analysis', ...owners, source: SOLVER_SOURCE, scenarioId,
          message: `${names || 'An element'} could not be modelled: ${p.message}` }))
        break
      case 'floating':
        // Unsupplied islands hold only wiring (active parts without a battery are left out when
        // compiling and reported as 'no-supply'): a de-energised branch is normal, not a finding.
        break
    }
  }
  return findings
}

export function compileProblemFindings(problems: readonly CompileProblem[], scenarioId: string): Finding[] {
  return problems.map((p) => {
    const common = { partIds: p.partIds, conductorIds: p.conductorIds, source: SOLVER_SOURCE, scenarioId, message: p.message }
    if (p.kind === 'no-supply') return makeFinding({ ruleId: 'no-supply', severity: 'error', title: 'Part on but not supplied', ...common })
    if (p.kind === 'array-without-controller')
      return makeFinding({ ruleId: 'array-without-controller', severity: 'warning', title: 'Solar array not connected', ...common })
    return makeFinding({ ruleId: 'bad-conductor', severity: 'error', title: 'Conductor left out of the analysis', ...common })
  })
}

function finite(x: number): number {
  return Number.isFinite(x) ? x : 0
}
