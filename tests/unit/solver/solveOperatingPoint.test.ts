import { describe, expect, it } from 'vitest'
import type { Circuit, SolverProblem } from '../../../shared/solver/circuit'
import { solveOperatingPoint } from '../../../shared/solver/solveOperatingPoint'

// Relative tolerance for hand-worked results: the solver converges to ~1e-12, the hand figures are exact.
const REL = 1e-9
const close = (actual: number, expected: number) => expect(actual).toBeCloseTo(expected, 8)
const problemOf = (problems: SolverProblem[], kind: SolverProblem['kind']) => problems.find((p) => p.kind === kind)

describe('solveOperatingPoint — worked by hand', () => {
  it('resistive divider behind a battery', () => {
    // E = 12 V, Rint = 0.1 Ω, R1 = 5.9 Ω (node 1 → 2), R2 = 6 Ω (node 2 → 0).
    // I = 12 / (0.1 + 5.9 + 6) = 1 A; V1 = 12 − 0.1·1 = 11.9 V; V2 = 6 · 1 = 6 V.
    const circuit: Circuit = {
      nodeCount: 3,
      elements: [
        { kind: 'vsource', id: 'bat', pos: 1, neg: 0, voltageV: 12, resistanceOhm: 0.1 },
        { kind: 'resistor', id: 'r1', a: 1, b: 2, resistanceOhm: 5.9 },
        { kind: 'resistor', id: 'r2', a: 2, b: 0, resistanceOhm: 6 },
      ],
    }
    const op = solveOperatingPoint(circuit)
    expect(op.status).toBe('ok')
    expect(op.problems).toEqual([])
    close(op.nodeVoltageV[1], 11.9)
    close(op.nodeVoltageV[2], 6)
    expect([...op.elementCurrentA].map((i) => Math.round(i * 1e9) / 1e9)).toEqual([1, 1, 1])
    // Powers: battery terminal −11.9 W (delivers), R1 5.9 W, R2 6 W.
    close(op.elementPowerW[0], -11.9)
    close(op.elementPowerW[1], 5.9)
    close(op.elementPowerW[2], 6)
    expect(op.islands).toEqual([{ referenceNode: 0, nodes: [0, 1, 2], hasSource: true }])
  })

  it('two batteries in parallel with different EMF: circulating current', () => {
    // E1 = 13.0 V, R1 = 0.01 Ω; E2 = 12.6 V, R2 = 0.03 Ω; both across nodes 1/0, no load.
    // Loop current I = (13.0 − 12.6) / (0.01 + 0.03) = 10 A, out of bat1 and back into bat2.
    // Terminal voltage V = 13.0 − 0.01 · 10 = 12.9 V.
    const circuit: Circuit = {
      nodeCount: 2,
      elements: [
        { kind: 'vsource', id: 'bat1', pos: 1, neg: 0, voltageV: 13.0, resistanceOhm: 0.01 },
        { kind: 'vsource', id: 'bat2', pos: 1, neg: 0, voltageV: 12.6, resistanceOhm: 0.03 },
      ],
    }
    const op = solveOperatingPoint(circuit)
    close(op.elementCurrentA[0], 10)
    close(op.elementCurrentA[1], -10)
    close(op.nodeVoltageV[1], 12.9)
    // bat2 is driven back by I·R = 0.3 V, 2.3 % of 13 V: a normal bank spread, not a fight.
    expect(op.problems).toEqual([])
  })

  it('parallel batteries sharing a resistive load (Millman)', () => {
    // Same bank plus RL = 1.2 Ω. V = (E1/R1 + E2/R2) / (1/R1 + 1/R2 + 1/RL)
    //   = (1300 + 420) / (100 + 33.3333 + 0.8333) = 1720 / 134.1667 = 12.819876 V.
    // I1 = (13 − V)/0.01 = 18.0124 A; I2 = (12.6 − V)/0.03 = −7.3292 A; IL = V/1.2 = 10.6832 A.
    const op = solveOperatingPoint({
      nodeCount: 2,
      elements: [
        { kind: 'vsource', id: 'bat1', pos: 1, neg: 0, voltageV: 13.0, resistanceOhm: 0.01 },
        { kind: 'vsource', id: 'bat2', pos: 1, neg: 0, voltageV: 12.6, resistanceOhm: 0.03 },
        { kind: 'resistor', id: 'load', a: 1, b: 0, resistanceOhm: 1.2 },
      ],
    })
    const v = 1720 / (100 + 100 / 3 + 1 / 1.2)
    close(op.nodeVoltageV[1], v)
    close(op.elementCurrentA[0], (13 - v) / 0.01)
    close(op.elementCurrentA[1], (12.6 - v) / 0.03)
    close(op.elementCurrentA[2], v / 1.2)
  })

  it('constant-power load on a battery: the high-voltage root of V² − EV + PR = 0', () => {
    // E = 12 V, R = 0.05 Ω, P = 100 W: (E − V)/R = P/V ⇒ V = (E + √(E² − 4PR)) / 2
    //   = (12 + √(144 − 20)) / 2 = (12 + 11.135529) / 2 = 11.567764 V; I = P/V = 8.644713 A.
    const op = solveOperatingPoint({
      nodeCount: 2,
      elements: [
        { kind: 'vsource', id: 'bat', pos: 1, neg: 0, voltageV: 12, resistanceOhm: 0.05 },
        { kind: 'cpower', id: 'inverter', pos: 1, neg: 0, powerW: 100, minVoltageV: 6 },
      ],
    })
    const v = (12 + Math.sqrt(144 - 4 * 100 * 0.05)) / 2
    expect(op.status).toBe('ok')
    expect(Math.abs(op.nodeVoltageV[1] - v) / v).toBeLessThan(REL)
    close(op.elementCurrentA[1], 100 / v)
    close(op.elementPowerW[1], 100)
    expect(op.iterations).toBeGreaterThan(1)
  })

  it('constant-power source (P < 0) charging a battery', () => {
    // E = 13 V, R = 0.02 Ω, charger delivers 50 W: (E − V)/R = −50/V ⇒ V² − EV − 50R = 0
    //   ⇒ V = (13 + √(169 + 4·50·0.02)) / 2 = (13 + 13.152946) / 2 = 13.076473 V.
    const op = solveOperatingPoint({
      nodeCount: 2,
      elements: [
        { kind: 'vsource', id: 'bat', pos: 1, neg: 0, voltageV: 13, resistanceOhm: 0.02 },
        { kind: 'cpower', id: 'charger', pos: 1, neg: 0, powerW: -50, minVoltageV: 10 },
      ],
    })
    const v = (13 + Math.sqrt(169 + 4 * 50 * 0.02)) / 2
    close(op.nodeVoltageV[1], v)
    close(op.elementCurrentA[0], -50 / v) // the battery takes the charge current
    expect(op.status).toBe('ok')
  })

  it('constant-current load', () => {
    // E = 12 V, R = 0.1 Ω, 2 A drawn from node 1 to 0: V = 12 − 0.1 · 2 = 11.8 V.
    const op = solveOperatingPoint({
      nodeCount: 2,
      elements: [
        { kind: 'vsource', id: 'bat', pos: 1, neg: 0, voltageV: 12, resistanceOhm: 0.1 },
        { kind: 'isource', id: 'pump', from: 1, to: 0, currentA: 2 },
      ],
    })
    close(op.nodeVoltageV[1], 11.8)
    close(op.elementCurrentA[1], 2)
    close(op.elementPowerW[1], 23.6)
  })

  it('two separate systems each get their own reference', () => {
    // House bank 12 V / 0.1 Ω into 2.9 Ω (I = 4 A, V = 11.6 V); engine battery 24 V / 0.2 Ω into 3.8 Ω (I = 6 A, V = 22.8 V).
    const op = solveOperatingPoint({
      nodeCount: 4,
      elements: [
        { kind: 'vsource', id: 'house', pos: 1, neg: 0, voltageV: 12, resistanceOhm: 0.1 },
        { kind: 'resistor', id: 'r1', a: 1, b: 0, resistanceOhm: 2.9 },
        { kind: 'vsource', id: 'engine', pos: 3, neg: 2, voltageV: 24, resistanceOhm: 0.2 },
        { kind: 'resistor', id: 'r2', a: 3, b: 2, resistanceOhm: 3.8 },
      ],
    })
    expect(op.islands.map((i) => i.referenceNode)).toEqual([0, 2])
    close(op.nodeVoltageV[1], 11.6)
    close(op.nodeVoltageV[3], 22.8)
    close(op.elementCurrentA[2], 6)
  })
})

describe('solveOperatingPoint — edge cases', () => {
  const battery = { kind: 'vsource', id: 'bat', pos: 1, neg: 0, voltageV: 12, resistanceOhm: 0.1 } as const

  it('empty circuit', () => {
    const op = solveOperatingPoint({ nodeCount: 0, elements: [] })
    expect(op.status).toBe('ok')
    expect(op.nodeVoltageV.length).toBe(0)
    expect(op.problems).toEqual([])
  })

  it('floating island is reported and not solved', () => {
    const op = solveOperatingPoint({
      nodeCount: 4,
      elements: [battery, { kind: 'resistor', id: 'r', a: 1, b: 0, resistanceOhm: 1.1 }, { kind: 'resistor', id: 'loose', a: 2, b: 3, resistanceOhm: 1 }],
    })
    expect(problemOf(op.problems, 'floating')).toEqual({ kind: 'floating', nodes: [2, 3], elementIds: ['loose'] })
    expect(op.nodeVoltageV[2]).toBe(0)
    expect(op.elementCurrentA[2]).toBe(0)
    close(op.elementCurrentA[1], 10) // the rest still solves: 12 / 1.2 Ω
  })

  it('battery shorted through a real cable: terminal voltage collapses below 10 % of EMF', () => {
    // 12 V / 0.1 Ω into 5 mΩ: I = 12 / 0.105 = 114.3 A, terminal V = 0.571 V (4.8 % of EMF).
    const op = solveOperatingPoint({ nodeCount: 2, elements: [battery, { kind: 'resistor', id: 'cable', a: 1, b: 0, resistanceOhm: 0.005 }] })
    expect(problemOf(op.problems, 'shorted-source')?.elementIds).toEqual(['bat'])
    close(op.elementCurrentA[0], 12 / 0.105)
  })

  it('battery shorted by a near-zero conductor: reported, currents finite (E / Rint)', () => {
    const op = solveOperatingPoint({ nodeCount: 2, elements: [battery, { kind: 'resistor', id: 'short', a: 1, b: 0, resistanceOhm: 1e-9 }] })
    expect(problemOf(op.problems, 'shorted-source')).toEqual({ kind: 'shorted-source', elementIds: ['bat'] })
    expect(op.elementCurrentA[0]).toBeCloseTo(12 / (0.1 + 1e-9), 4)
  })

  it('battery wired with both terminals on one node', () => {
    const op = solveOperatingPoint({ nodeCount: 1, elements: [{ ...battery, pos: 0 }] })
    expect(problemOf(op.problems, 'shorted-source')?.elementIds).toEqual(['bat'])
    close(op.elementCurrentA[0], 120)
  })

  it.each([0, -1, Number.NaN, Number.POSITIVE_INFINITY])('resistance %s is an invalid element, left open', (resistanceOhm) => {
    const op = solveOperatingPoint({
      nodeCount: 2,
      elements: [battery, { kind: 'resistor', id: 'bad', a: 1, b: 0, resistanceOhm }, { kind: 'resistor', id: 'ok', a: 1, b: 0, resistanceOhm: 1.1 }],
    })
    const problem = problemOf(op.problems, 'invalid-element')
    expect(problem).toMatchObject({ kind: 'invalid-element', elementIds: ['bad'] })
    expect(op.elementCurrentA[1]).toBe(0)
    close(op.elementCurrentA[2], 10)
  })

  it('invalid source parameters and node numbers', () => {
    const op = solveOperatingPoint({
      nodeCount: 2,
      elements: [
        { ...battery, id: 'noR', resistanceOhm: 0 },
        { kind: 'cpower', id: 'noVmin', pos: 1, neg: 0, powerW: 10, minVoltageV: 0 },
        { kind: 'isource', id: 'nanI', from: 1, to: 0, currentA: Number.NaN },
        { kind: 'resistor', id: 'far', a: 1, b: 7, resistanceOhm: 1 },
      ],
    })
    const ids = op.problems.filter((p) => p.kind === 'invalid-element').flatMap((p) => p.elementIds)
    expect(ids.sort()).toEqual(['far', 'nanI', 'noR', 'noVmin'])
    expect([...op.elementCurrentA].every(Number.isFinite)).toBe(true)
  })

  it('unknown element kind is invalid, not a crash', () => {
    const op = solveOperatingPoint({ nodeCount: 2, elements: [battery, { kind: 'diode', id: 'd', a: 1, b: 0 } as never] })
    expect(op.problems).toContainEqual({ kind: 'invalid-element', elementIds: ['d'], message: 'unknown element kind diode' })
  })

  it('unusable node count does not throw', () => {
    const op = solveOperatingPoint({ nodeCount: Number.NaN, elements: [battery] })
    expect(op.problems[0]).toMatchObject({ kind: 'invalid-element' })
    expect(op.status).toBe('not-converged')
  })

  it('a 12 V and a 24 V battery in parallel fight: source loop', () => {
    // Circulating I = (24 − 12) / (0.1 + 0.1) = 60 A drives the 12 V battery back by 6 V (25 % of 24 V).
    const op = solveOperatingPoint({
      nodeCount: 2,
      elements: [battery, { kind: 'vsource', id: 'bat24', pos: 1, neg: 0, voltageV: 24, resistanceOhm: 0.1 }],
    })
    expect(problemOf(op.problems, 'source-loop')).toEqual({ kind: 'source-loop', elementIds: ['bat', 'bat24'] })
    close(op.elementCurrentA[1], 60)
  })

  it('options: a circulating-current limit in amperes, and the short threshold', () => {
    // The 13.0 V / 12.6 V bank above circulates 10 A: over a 5 A limit it is reported as a source loop.
    const bank: Circuit = {
      nodeCount: 2,
      elements: [
        { kind: 'vsource', id: 'bat1', pos: 1, neg: 0, voltageV: 13.0, resistanceOhm: 0.01 },
        { kind: 'vsource', id: 'bat2', pos: 1, neg: 0, voltageV: 12.6, resistanceOhm: 0.03 },
      ],
    }
    expect(problemOf(solveOperatingPoint(bank, { sourceLoopLimitA: 5 }).problems, 'source-loop')?.elementIds).toEqual(['bat1', 'bat2'])
    expect(problemOf(solveOperatingPoint(bank, { sourceLoopLimitA: 11 }).problems, 'source-loop')).toBeUndefined()
    // A 0.5 Ω link across the terminals is a short only if the threshold says so (terminal voltage stays 10 V).
    const linked: Circuit = { nodeCount: 2, elements: [battery, { kind: 'resistor', id: 'link', a: 1, b: 0, resistanceOhm: 0.5 }] }
    expect(problemOf(solveOperatingPoint(linked).problems, 'shorted-source')).toBeUndefined()
    expect(problemOf(solveOperatingPoint(linked, { shortResistanceOhm: 1 }).problems, 'shorted-source')?.elementIds).toEqual(['bat'])
  })

  it('a battery reversed into a bank: each is the other\'s short', () => {
    // Both discharge I = (12 + 12) / 0.2 = 120 A; terminal voltage 12 − 120 · 0.1 = 0 V for both.
    const op = solveOperatingPoint({
      nodeCount: 2,
      elements: [battery, { kind: 'vsource', id: 'reversed', pos: 0, neg: 1, voltageV: 12, resistanceOhm: 0.1 }],
    })
    expect(problemOf(op.problems, 'shorted-source')?.elementIds.sort()).toEqual(['bat', 'reversed'])
    close(op.elementCurrentA[0], 120)
  })

  it('constant-power load too large to be supplied: not-converged, every output finite', () => {
    // E² − 4PR = 144 − 4·1000·0.05 < 0: no constant-power solution exists.
    const op = solveOperatingPoint({
      nodeCount: 2,
      elements: [{ ...battery, resistanceOhm: 0.05 }, { kind: 'cpower', id: 'big', pos: 1, neg: 0, powerW: 1000, minVoltageV: 6 }],
    })
    expect(op.status).toBe('not-converged')
    const problem = problemOf(op.problems, 'not-converged')
    expect(problem).toMatchObject({ kind: 'not-converged', elementIds: ['big'] })
    expect(Number.isFinite((problem as { residualA: number }).residualA)).toBe(true)
    for (const array of [op.nodeVoltageV, op.elementCurrentA, op.elementPowerW]) expect([...array].every(Number.isFinite)).toBe(true)
  })

  it('voltage collapse: an unsuppliable load with a low minimum voltage settles on its fallback resistance', () => {
    // E = 12 V, R = 0.05 Ω, P = 1000 W, Vmin = 1 V: no constant-power solution (E² < 4PR), fallback
    // resistance Vmin²/P = 1 mΩ, so V = 12 · 0.001 / 0.051 = 0.23529 V (below Vmin, consistent).
    const op = solveOperatingPoint({
      nodeCount: 2,
      elements: [{ ...battery, resistanceOhm: 0.05 }, { kind: 'cpower', id: 'big', pos: 1, neg: 0, powerW: 1000, minVoltageV: 1 }],
    })
    close(op.nodeVoltageV[1], (12 * 0.001) / 0.051)
    expect(problemOf(op.problems, 'not-converged')).toMatchObject({ elementIds: ['big'], cause: 'below-minimum-voltage' })
  })

  it('Newton stopped early reports not-converged with the KCL residual', () => {
    const op = solveOperatingPoint(
      {
        nodeCount: 2,
        elements: [{ ...battery, resistanceOhm: 0.05 }, { kind: 'cpower', id: 'inv', pos: 1, neg: 0, powerW: 100, minVoltageV: 6 }],
      },
      { maxIterations: 1 },
    )
    expect(op.status).toBe('not-converged')
    expect(problemOf(op.problems, 'not-converged')).toMatchObject({ elementIds: ['inv'], cause: 'iterations' })
  })

  it('current source bridging two islands is invalid', () => {
    const op = solveOperatingPoint({
      nodeCount: 4,
      elements: [battery, { kind: 'resistor', id: 'r', a: 1, b: 0, resistanceOhm: 1 }, { kind: 'resistor', id: 'r2', a: 2, b: 3, resistanceOhm: 1 }, { kind: 'isource', id: 'bridge', from: 1, to: 2, currentA: 1 }],
    })
    expect(op.problems.find((p) => p.kind === 'invalid-element')?.elementIds).toEqual(['bridge'])
  })
})
