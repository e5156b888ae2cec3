// Property tests (fast-check): Kirchhoff's current law at every node, Tellegen's power balance
// (Σ absorbed power = 0 over the circuit) and finite outputs for any generated valid circuit.
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import type { Circuit, CircuitElement } from '../../../shared/solver/circuit'
import { solveOperatingPoint } from '../../../shared/solver/solveOperatingPoint'

const node = (nodeCount: number) => fc.integer({ min: 0, max: nodeCount - 1 })

function elementArb(nodeCount: number): fc.Arbitrary<CircuitElement> {
  const n = node(nodeCount)
  return fc.oneof(
    { weight: 5, arbitrary: fc.record({ kind: fc.constant('resistor' as const), id: fc.constant(''), a: n, b: n, resistanceOhm: fc.double({ min: 1e-3, max: 100, noNaN: true }) }) },
    { weight: 1, arbitrary: fc.record({ kind: fc.constant('vsource' as const), id: fc.constant(''), pos: n, neg: n, voltageV: fc.double({ min: 11, max: 14, noNaN: true }), resistanceOhm: fc.double({ min: 1e-3, max: 0.1, noNaN: true }) }) },
    { weight: 1, arbitrary: fc.record({ kind: fc.constant('isource' as const), id: fc.constant(''), from: n, to: n, currentA: fc.double({ min: -1, max: 1, noNaN: true }) }) },
    { weight: 2, arbitrary: fc.record({ kind: fc.constant('cpower' as const), id: fc.constant(''), pos: n, neg: n, powerW: fc.double({ min: -5, max: 5, noNaN: true }), minVoltageV: fc.double({ min: 1, max: 10, noNaN: true }) }) },
  )
}

const circuitArb: fc.Arbitrary<Circuit> = fc.integer({ min: 2, max: 10 }).chain((nodeCount) =>
  fc.array(elementArb(nodeCount), { minLength: 1, maxLength: 25 }).map((elements) => ({
    nodeCount,
    // One battery always sits across nodes 1/0 so most circuits have something to solve.
    elements: [{ kind: 'vsource' as const, id: '', pos: 1, neg: 0, voltageV: 12.8, resistanceOhm: 0.01 }, ...elements].map((el, k) => ({ ...el, id: `e${k}` })),
  })),
)

/** Current leaving each terminal node through the element, from the reported current. */
function leaving(element: CircuitElement, currentA: number): [number, number, number] {
  switch (element.kind) {
    case 'resistor':
      return [element.a, element.b, currentA]
    case 'vsource':
      return [element.pos, element.neg, -currentA]
    case 'isource':
      return [element.from, element.to, currentA]
    case 'cpower':
      return [element.pos, element.neg, currentA]
  }
}

describe('solveOperatingPoint — properties', () => {
  it('every output is finite, for any generated circuit', () => {
    fc.assert(
      fc.property(circuitArb, (circuit) => {
        const op = solveOperatingPoint(circuit)
        for (const array of [op.nodeVoltageV, op.elementCurrentA, op.elementPowerW]) expect([...array].every(Number.isFinite)).toBe(true)
        for (const problem of op.problems) if (problem.kind === 'not-converged') expect(Number.isFinite(problem.residualA)).toBe(true)
      }),
      { numRuns: 300 },
    )
  })

  it('KCL holds at every node and absorbed power sums to zero when converged', () => {
    let converged = 0
    fc.assert(
      fc.property(circuitArb, (circuit) => {
        const op = solveOperatingPoint(circuit)
        // Starved loads (resistive fallback) still satisfy KCL; only an iteration-limit stop may not.
        if (op.problems.some((p) => p.kind === 'not-converged' && p.cause === 'iterations')) return
        converged++
        const sum = new Float64Array(circuit.nodeCount)
        const scale = new Float64Array(circuit.nodeCount)
        circuit.elements.forEach((element, e) => {
          const [p, q, flow] = leaving(element, op.elementCurrentA[e])
          sum[p] += flow
          sum[q] -= flow
          scale[p] += Math.abs(flow)
          scale[q] += Math.abs(flow)
        })
        for (let k = 0; k < circuit.nodeCount; k++) expect(Math.abs(sum[k])).toBeLessThanOrEqual(1e-8 + 1e-9 * scale[k])
        const totalW = op.elementPowerW.reduce((a, b) => a + b, 0)
        const grossW = op.elementPowerW.reduce((a, b) => a + Math.abs(b), 0)
        // Allowed imbalance: rounding on the gross power plus the KCL tolerance (1e-9 A a node) times the voltages.
        const voltageSum = op.nodeVoltageV.reduce((a, b) => a + Math.abs(b), 0)
        expect(Math.abs(totalW)).toBeLessThanOrEqual(1e-9 * grossW + 2e-9 * voltageSum + 1e-12)
      }),
      { numRuns: 300 },
    )
    expect(converged).toBeGreaterThan(250) // the property must not be vacuous
  })

  it('sources deliver what loads and conductors absorb (Σ sources = Σ loads)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 30 }), fc.integer({ min: 0, max: 2 ** 31 }), (loads, seed) => {
        // A battery feeding a chain of cables with a load at every joint.
        let s = seed
        const next = () => ((s = (s * 1103515245 + 12345) % 2 ** 31) / 2 ** 31)
        const elements: CircuitElement[] = [{ kind: 'vsource', id: 'bat', pos: 1, neg: 0, voltageV: 12.8, resistanceOhm: 0.005 }]
        for (let k = 0; k < loads; k++) {
          elements.push({ kind: 'resistor', id: `w${k}`, a: k + 1, b: k + 2, resistanceOhm: 0.001 + 0.01 * next() })
          elements.push({ kind: 'cpower', id: `p${k}`, pos: k + 2, neg: 0, powerW: 5 * next(), minVoltageV: 9 })
        }
        const op = solveOperatingPoint({ nodeCount: loads + 2, elements })
        expect(op.status).toBe('ok')
        const deliveredW = -op.elementPowerW[0]
        const absorbedW = op.elementPowerW.slice(1).reduce((a, b) => a + b, 0)
        expect(Math.abs(deliveredW - absorbedW)).toBeLessThanOrEqual(1e-9 * Math.max(1, deliveredW))
      }),
      { numRuns: 200 },
    )
  })
})
