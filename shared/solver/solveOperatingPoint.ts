import type { Circuit, OperatingPoint, SolverProblem } from './circuit'
import { buildElementTable, CPOWER, ISOURCE, VSOURCE, reportedCurrent } from './_lib/elementTable'
import { solveNodal } from './_lib/newton'
import { circuitShapeError, prepareNetwork } from './_lib/prepareNetwork'
import { findCollapsedSources, findShortedSources, findSourceLoops } from './_lib/sourceChecks'
import { nodalSystemFor, type SolverCache } from './solverCache'

export type { Circuit, CircuitElement, Island, OperatingPoint, SolverProblem } from './circuit'

export interface OperatingPointOptions {
  /** Newton iterations before giving up (default 100). */
  maxIterations?: number
  /** Largest node-voltage change accepted as converged (default 1e-9 V). */
  toleranceV?: number
  /** Largest KCL residual accepted at a node, on top of a 1e-10 rounding share (default 1e-9 A). */
  toleranceA?: number
  /** Resistors below this count as a short across a source (default 1e-6 Ω). */
  shortResistanceOhm?: number
  /** A discharging source whose terminal voltage is below this share of its EMF is shorted (default 0.1). */
  shortedTerminalFraction?: number
  /** Sources in one island fight when one is driven back by I·R above this share of the largest EMF (default 0.1). */
  sourceLoopFraction?: number
  /** ... or by more than this current (default: no limit). */
  sourceLoopLimitA?: number
  /** Matrix structure shared with earlier solves on the same nodes (createSolverCache). */
  cache?: SolverCache
}

/**
 * DC operating point by nodal analysis: sources as Norton equivalents, a sparse LDLᵀ on a
 * minimum-degree order, damped Newton for constant-power elements. Never throws for a bad
 * circuit: everything wrong is in `problems`, and every number returned is finite.
 *
 * @example
 * // 12 V battery (0.01 Ω) feeding 1.19 Ω: I = 12 / 1.2 = 10 A
 * solveOperatingPoint({ nodeCount: 2, elements: [
 *   { kind: 'vsource', id: 'bat', pos: 1, neg: 0, voltageV: 12, resistanceOhm: 0.01 },
 *   { kind: 'resistor', id: 'load', a: 1, b: 0, resistanceOhm: 1.19 },
 * ] }).elementCurrentA // ≈ Float64Array [10, 10]
 */
export function solveOperatingPoint(circuit: Circuit, options: OperatingPointOptions = {}): OperatingPoint {
  const shapeError = circuitShapeError(circuit)
  if (shapeError !== null) {
    return {
      status: 'not-converged',
      nodeVoltageV: new Float64Array(0),
      elementCurrentA: new Float64Array(Array.isArray(circuit?.elements) ? circuit.elements.length : 0),
      elementPowerW: new Float64Array(Array.isArray(circuit?.elements) ? circuit.elements.length : 0),
      iterations: 0,
      islands: [],
      problems: [{ kind: 'invalid-element', elementIds: [], message: shapeError }],
    }
  }
  const { elements, nodeCount } = circuit
  const prepared = prepareNetwork(circuit, () => true)
  const { active, islandMap, isUnknown } = prepared
  const problems: SolverProblem[] = prepared.problems

  const table = buildElementTable(elements, active)
  const stamps = new Uint8Array(elements.length)
  for (let e = 0; e < elements.length; e++) stamps[e] = active[e] && table.kind[e] !== ISOURCE ? 1 : 0
  const system = nodalSystemFor(options.cache, nodeCount, elements, stamps, isUnknown)
  const nodeVoltageV = new Float64Array(nodeCount)
  const outcome = solveNodal(system, table, nodeVoltageV, {
    maxIterations: Math.max(1, Math.floor(options.maxIterations ?? 100)),
    toleranceV: options.toleranceV ?? 1e-9,
    toleranceA: options.toleranceA ?? 1e-9,
  })
  for (let node = 0; node < nodeCount; node++) if (!Number.isFinite(nodeVoltageV[node])) nodeVoltageV[node] = 0

  const elementCurrentA = new Float64Array(elements.length)
  const elementPowerW = new Float64Array(elements.length)
  for (let e = 0; e < elements.length; e++) {
    if (!active[e]) continue
    const v = nodeVoltageV[table.p[e]] - nodeVoltageV[table.q[e]]
    const current = reportedCurrent(table, e, v)
    elementCurrentA[e] = Number.isFinite(current) ? current : 0
    // Passive convention: a vsource's reported current leaves pos, so its absorbed power is −V·I.
    const power = table.kind[e] === VSOURCE ? -v * current : v * current
    elementPowerW[e] = Number.isFinite(power) ? power : 0
  }

  let status: OperatingPoint['status'] = 'ok'
  if (!outcome.converged) {
    status = 'not-converged'
    const badNodes = new Set(outcome.badNodes)
    const near = elements.filter((el, e) => active[e] && (badNodes.has(table.p[e]) || badNodes.has(table.q[e])))
    const loads = near.filter((el) => el.kind === 'cpower')
    problems.push({
      kind: 'not-converged',
      elementIds: (loads.length ? loads : near).map((el) => el.id),
      residualA: outcome.residualA,
      cause: 'iterations',
    })
  } else {
    // A constant-power element below its minimum voltage is on its resistive fallback: its demand is not met.
    const starved: string[] = []
    let missingA = 0
    for (let e = 0; e < elements.length; e++) {
      if (!active[e] || table.kind[e] !== CPOWER) continue
      const v = nodeVoltageV[table.p[e]] - nodeVoltageV[table.q[e]]
      if (v < table.extra[e] && table.value[e] !== 0) {
        starved.push(elements[e].id)
        const demandA = v > 0 ? table.value[e] / v : table.value[e] / table.extra[e]
        missingA += Math.abs(demandA - elementCurrentA[e])
      }
    }
    if (starved.length) {
      status = 'not-converged'
      problems.push({ kind: 'not-converged', elementIds: starved, residualA: Number.isFinite(missingA) ? missingA : Number.MAX_VALUE,
        cause: 'below-minimum-voltage',
      })
    }
  }
  const shorted = new Set(findShortedSources(elements, prepared.valid, nodeCount, options.shortResistanceOhm ?? 1e-6))
  for (const id of findCollapsedSources(elements, active, nodeVoltageV, elementCurrentA, options.shortedTerminalFraction ?? 0.1)) {
    shorted.add(id)
  }
  if (shorted.size) problems.push({ kind: 'shorted-source', elementIds: [...shorted] })
  problems.push(
    ...findSourceLoops(elements, active, islandMap.islandOfNode, elementCurrentA, {
      sourceLoopFraction: options.sourceLoopFraction ?? 0.1,
      sourceLoopLimitA: options.sourceLoopLimitA ?? Number.POSITIVE_INFINITY,
    }),
  )
  return {
    status,
    nodeVoltageV,
    elementCurrentA,
    elementPowerW,
    iterations: outcome.iterations,
    islands: islandMap.islands,
    problems,
  }
}
