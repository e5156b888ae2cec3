import { describe, expect, it } from 'vitest'
import { compileCircuit, FAULT_STUDY_SCENARIO } from '../../../shared/analysis'
import { solveOperatingPoint } from '../../../shared/solver/solveOperatingPoint'
import { createSolverCache } from '../../../shared/solver/solverCache'
import { faultCurrents } from '../../../shared/solver/theveninResistance'
import { generatedDesign } from '../../helpers/generatedDesign'

// One matrix structure for every scenario of a design: results must be those of a fresh solve
// (relative 1e-9: only the rounding of a different elimination order may differ).

const close = (a: Float64Array, b: Float64Array) => {
  expect(a.length).toBe(b.length)
  for (let i = 0; i < a.length; i++) expect(Math.abs(a[i] - b[i])).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(b[i])))
}

describe('createSolverCache (structure reused across scenarios and the fault study)', () => {
  const design = generatedDesign(300)
  const circuits = design.scenarios.map((s) => compileCircuit(design, s).circuit)

  it('gives the fresh results for every scenario, building the structure once', () => {
    const cache = createSolverCache()
    for (const circuit of circuits) {
      const cached = solveOperatingPoint(circuit, { cache })
      const fresh = solveOperatingPoint(circuit)
      expect(cached.status).toBe(fresh.status)
      close(cached.elementCurrentA, fresh.elementCurrentA)
      close(cached.nodeVoltageV, fresh.nodeVoltageV)
    }
    // "All on" first: the half-load night and the motor start have the same or fewer conductances.
    expect(cache).toMatchObject({ built: 1, reused: circuits.length - 1 })
  })

  it('serves the fault study (no loads) from the scenarios\' structure, with the fresh fault currents', () => {
    const cache = createSolverCache()
    solveOperatingPoint(circuits[0], { cache })
    const fault = compileCircuit(design, FAULT_STUDY_SCENARIO).circuit
    const locations = [5, 50, 150].map((a, i) => ({ id: `f${i}`, a, b: 0 }))
    const cached = faultCurrents(fault, locations, { cache })
    const fresh = faultCurrents(fault, locations)
    expect(cache.reused).toBe(1)
    cached.forEach((f, i) => expect(f.currentA).toBeCloseTo(fresh[i].currentA, 6))
  })

  it('builds anew when a circuit stamps a conductance the kept structure lacks', () => {
    const cache = createSolverCache()
    const twoNodes = { nodeCount: 3, elements: [
      { kind: 'vsource' as const, id: 'bat', pos: 1, neg: 0, voltageV: 12, resistanceOhm: 0.01 },
      { kind: 'resistor' as const, id: 'r1', a: 1, b: 2, resistanceOhm: 1 },
      { kind: 'resistor' as const, id: 'r2', a: 2, b: 0, resistanceOhm: 1 },
    ] }
    solveOperatingPoint(twoNodes, { cache })
    // 1 → 0 directly: no slot between unknown 1 and the reference is needed, so it is reused...
    const shunt = { ...twoNodes, elements: [...twoNodes.elements, { kind: 'resistor' as const, id: 'r3', a: 1, b: 0, resistanceOhm: 2 }] }
    solveOperatingPoint(shunt, { cache })
    expect(cache).toMatchObject({ built: 1, reused: 1 })
    // ...while a new island layout (node 2 cut off) needs its own structure.
    const cut = { ...twoNodes, elements: twoNodes.elements.slice(0, 1) }
    const op = solveOperatingPoint(cut, { cache })
    expect(cache.built).toBe(2)
    expect(op.nodeVoltageV[1]).toBeCloseTo(12, 9)
  })
})
