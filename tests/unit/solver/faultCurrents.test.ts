import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import type { Circuit, CircuitElement } from '../../../shared/solver/circuit'
import { solveOperatingPoint } from '../../../shared/solver/solveOperatingPoint'
import { faultCurrents } from '../../../shared/solver/theveninResistance'

const close = (actual: number, expected: number) => expect(actual).toBeCloseTo(expected, 8)

describe('faultCurrents — worked by hand', () => {
  // Battery 12 V / 0.01 Ω; positive cable 0.02 Ω to node 2; negative return 0.02 Ω from node 3;
  // a 100 W load between 2 and 3 that a bolted fault bypasses (loads are removed).
  const circuit: Circuit = {
    nodeCount: 4,
    elements: [
      { kind: 'vsource', id: 'bat', pos: 1, neg: 0, voltageV: 12, resistanceOhm: 0.01 },
      { kind: 'resistor', id: 'pos', a: 1, b: 2, resistanceOhm: 0.02 },
      { kind: 'resistor', id: 'neg', a: 3, b: 0, resistanceOhm: 0.02 },
      { kind: 'cpower', id: 'load', pos: 2, neg: 3, powerW: 100, minVoltageV: 9 },
      { kind: 'isource', id: 'pump', from: 2, to: 3, currentA: 3 },
    ],
  }

  it('at the load terminals: Rth = 0.01 + 0.02 + 0.02 = 0.05 Ω, I = 12 / 0.05 = 240 A', () => {
    const [f] = faultCurrents(circuit, [{ id: 'load', a: 2, b: 3 }])
    close(f.resistanceOhm, 0.05)
    close(f.openCircuitV, 12)
    close(f.currentA, 240)
  })

  it('positive conductor to battery negative: Rth = 0.03 Ω, I = 400 A; reversed pair gives −Voc, same current', () => {
    const [f, g] = faultCurrents(circuit, [{ id: 'a', a: 2, b: 0 }, { id: 'b', a: 0, b: 2 }])
    close(f.currentA, 400)
    close(g.openCircuitV, -12)
    close(g.currentA, 400)
  })

  it('parallel bank: Norton sum E1/R1 + E2/R2', () => {
    // 13 V / 0.01 Ω ∥ 12.6 V / 0.03 Ω: Rth = 0.0075 Ω, Voc = 12.9 V (circulating 10 A), I = 1300 + 420 = 1720 A.
    const [f] = faultCurrents(
      {
        nodeCount: 2,
        elements: [
          { kind: 'vsource', id: 'b1', pos: 1, neg: 0, voltageV: 13, resistanceOhm: 0.01 },
          { kind: 'vsource', id: 'b2', pos: 1, neg: 0, voltageV: 12.6, resistanceOhm: 0.03 },
        ],
      },
      [{ id: 'terminals', a: 1, b: 0 }],
    )
    close(f.resistanceOhm, 0.0075)
    close(f.openCircuitV, 12.9)
    close(f.currentA, 1720)
  })

  it('meshed feed and a resistive load that stays in the network', () => {
    // Battery 12 V / 0.025 Ω; two cables 0.1 Ω and 0.3 Ω in parallel to node 2 (0.075 Ω); heater 11.9 Ω at node 2.
    // Without the heater: Rth = 0.1 Ω. With it: Rth = 0.1 ∥ 11.9 = 0.09917 Ω, Voc = 12·11.9/12 = 11.9 V,
    // I = 11.9 / 0.09917 = 120 A (= E / 0.1 Ω: the heater does not change the Norton current).
    const [f] = faultCurrents(
      {
        nodeCount: 3,
        elements: [
          { kind: 'vsource', id: 'bat', pos: 1, neg: 0, voltageV: 12, resistanceOhm: 0.025 },
          { kind: 'resistor', id: 'c1', a: 1, b: 2, resistanceOhm: 0.1 },
          { kind: 'resistor', id: 'c2', a: 1, b: 2, resistanceOhm: 0.3 },
          { kind: 'resistor', id: 'heater', a: 2, b: 0, resistanceOhm: 11.9 },
        ],
      },
      [{ id: 'end', a: 2, b: 0 }],
    )
    close(f.resistanceOhm, (0.1 * 11.9) / 12)
    close(f.openCircuitV, 11.9)
    close(f.currentA, 120)
  })
})

describe('faultCurrents — edge cases', () => {
  const base: CircuitElement[] = [
    { kind: 'vsource', id: 'bat', pos: 1, neg: 0, voltageV: 12, resistanceOhm: 0.01 },
    { kind: 'resistor', id: 'loose', a: 2, b: 3, resistanceOhm: 1 },
    { kind: 'cpower', id: 'onlyViaLoad', pos: 1, neg: 4, powerW: 10, minVoltageV: 9 },
  ]
  const circuit: Circuit = { nodeCount: 5, elements: base }

  it('no source can feed a floating part, another island, or a node reached only through a load', () => {
    const results = faultCurrents(circuit, [
      { id: 'floating', a: 2, b: 3 },
      { id: 'across', a: 1, b: 2 },
      { id: 'behindLoad', a: 4, b: 0 },
    ])
    for (const r of results) expect(r).toMatchObject({ resistanceOhm: Number.POSITIVE_INFINITY, currentA: 0 })
  })

  it('same node twice, bad node numbers, empty circuit and an unusable node count', () => {
    const [same, bad] = faultCurrents(circuit, [{ id: 'same', a: 1, b: 1 }, { id: 'bad', a: 1, b: 99 }])
    expect(same).toEqual({ id: 'same', resistanceOhm: 0, openCircuitV: 0, currentA: 0 })
    expect(bad.currentA).toBe(0)
    expect(faultCurrents({ nodeCount: 0, elements: [] }, [])).toEqual([])
    expect(faultCurrents({ nodeCount: -1, elements: [] }, [{ id: 'x', a: 0, b: 0 }])[0].currentA).toBe(0)
  })
})

describe('faultCurrents — properties', () => {
  // Random meshed resistor networks fed by one or two batteries.
  const networkArb = fc.integer({ min: 3, max: 12 }).chain((nodeCount) =>
    fc
      .array(
        fc.record({ a: fc.integer({ min: 0, max: nodeCount - 1 }), b: fc.integer({ min: 0, max: nodeCount - 1 }), resistanceOhm: fc.double({ min: 1e-3, max: 10, noNaN: true }) }),
        { minLength: nodeCount, maxLength: 3 * nodeCount },
      )
      .map((wires): Circuit => ({
        nodeCount,
        elements: [
          { kind: 'vsource', id: 'b1', pos: 1, neg: 0, voltageV: 12.8, resistanceOhm: 0.004 },
          { kind: 'vsource', id: 'b2', pos: 2, neg: 0, voltageV: 12.7, resistanceOhm: 0.006 },
          ...wires.map((w, k) => ({ kind: 'resistor' as const, id: `w${k}`, ...w })),
        ],
      })),
  )

  it('Rth equals the voltage a 1 A test current produces with every EMF set to 0 (full solve)', () => {
    fc.assert(
      fc.property(networkArb, fc.nat(), fc.nat(), (circuit, i, j) => {
        const a = i % circuit.nodeCount
        const b = j % circuit.nodeCount
        const [fault] = faultCurrents(circuit, [{ id: 'f', a, b }])
        const dead = circuit.elements.map((el) => (el.kind === 'vsource' ? { ...el, voltageV: 0 } : el))
        const op = solveOperatingPoint({ nodeCount: circuit.nodeCount, elements: [...dead, { kind: 'isource', id: 'test', from: b, to: a, currentA: 1 }] })
        if (!Number.isFinite(fault.resistanceOhm)) {
          // No path: the test source is then rejected as bridging two islands, or one side floats.
          expect(op.problems.some((p) => p.kind === 'invalid-element' || p.kind === 'floating')).toBe(true)
          return
        }
        const testV = op.nodeVoltageV[a] - op.nodeVoltageV[b]
        expect(Math.abs(fault.resistanceOhm - testV)).toBeLessThanOrEqual(1e-9 * Math.max(1, testV))
      }),
      { numRuns: 300 },
    )
  })

  it('Rth is symmetric and obeys the triangle inequality (effective resistance is a metric)', () => {
    fc.assert(
      fc.property(networkArb, fc.nat(), fc.nat(), fc.nat(), (circuit, i, j, k) => {
        const [a, b, c] = [i, j, k].map((x) => x % circuit.nodeCount)
        const [ab, ba, ac, cb] = faultCurrents(circuit, [
          { id: 'ab', a, b },
          { id: 'ba', a: b, b: a },
          { id: 'ac', a, b: c },
          { id: 'cb', a: c, b },
        ]).map((f) => f.resistanceOhm)
        expect(ab).toBeCloseTo(ba, 12)
        if (Number.isFinite(ac + cb)) expect(ab).toBeLessThanOrEqual((ac + cb) * (1 + 1e-12) + 1e-15)
      }),
      { numRuns: 300 },
    )
  })
})
