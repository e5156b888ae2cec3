// Cross-check of solveOperatingPoint against ngspice (an independent SPICE simulator, Debian
// package, /usr/bin/ngspice) on the exported deck of the same circuit. Every element current must
// agree within 0.1 % (absolute floor 1 µA for tiny currents in meshed returns) and every node
// voltage within 0.1 % (floor 1 µV).
import { describe, expect, it } from 'vitest'
import type { Circuit } from '../../../shared/solver/circuit'
import { solveOperatingPoint } from '../../../shared/solver/solveOperatingPoint'
import { spiceCurrentProbe, spiceNodeName, toSpiceNetlist } from '../../../shared/spice/toSpiceNetlist'
import { runNgspice } from '../../helpers/ngspice'
import { radialCircuit } from '../../helpers/radialCircuit'

const REL = 1e-3
const FLOOR_A = 1e-6
const FLOOR_V = 1e-6

function compareWithNgspice(circuit: Circuit, status: 'ok' | 'not-converged' = 'ok'): { currentRel: number; voltageRel: number } {
  const op = solveOperatingPoint(circuit)
  expect(op.status).toBe(status)
  const spice = runNgspice(toSpiceNetlist(circuit, { title: 'cross-check' }))
  let currentRel = 0
  circuit.elements.forEach((element, e) => {
    const probe = spiceCurrentProbe(element, e)
    const printed = spice.vectors.get(probe.vector)
    expect(printed, probe.vector).toBeDefined()
    const reference = probe.sign * (printed as number)
    const error = Math.abs(op.elementCurrentA[e] - reference)
    expect(error, `${element.id} (${probe.vector})`).toBeLessThanOrEqual(Math.max(REL * Math.abs(reference), FLOOR_A))
    currentRel = Math.max(currentRel, error / Math.max(Math.abs(reference), FLOOR_A))
  })
  let voltageRel = 0
  for (const island of op.islands) {
    if (!island.hasSource) continue
    for (const node of island.nodes) {
      // ngspice measures from ground, where each island's reference is tied.
      const printed = node === island.referenceNode ? 0 : spice.vectors.get(spiceNodeName(node))
      expect(printed, spiceNodeName(node)).toBeDefined()
      const error = Math.abs(op.nodeVoltageV[node] - (printed as number))
      expect(error, spiceNodeName(node)).toBeLessThanOrEqual(Math.max(REL * Math.abs(printed as number), FLOOR_V))
      voltageRel = Math.max(voltageRel, error / Math.max(Math.abs(printed as number), FLOOR_V))
    }
  }
  return { currentRel, voltageRel }
}

describe('operating point vs ngspice', () => {
  it('hand circuits: divider, parallel bank with a constant-power load, constant-current load, two islands', () => {
    const circuit: Circuit = {
      nodeCount: 7,
      elements: [
        { kind: 'vsource', id: 'b1', pos: 1, neg: 0, voltageV: 13, resistanceOhm: 0.01 },
        { kind: 'vsource', id: 'b2', pos: 1, neg: 0, voltageV: 12.6, resistanceOhm: 0.03 },
        { kind: 'resistor', id: 'r1', a: 1, b: 2, resistanceOhm: 5.9 },
        { kind: 'resistor', id: 'r2', a: 2, b: 0, resistanceOhm: 6 },
        { kind: 'cpower', id: 'inverter', pos: 1, neg: 0, powerW: 300, minVoltageV: 10 },
        { kind: 'isource', id: 'pump', from: 2, to: 0, currentA: 0.3 },
        { kind: 'vsource', id: 'engine', pos: 4, neg: 3, voltageV: 25.6, resistanceOhm: 0.02 },
        { kind: 'resistor', id: 'lamp', a: 4, b: 5, resistanceOhm: 1.2 },
        { kind: 'cpower', id: 'fan', pos: 5, neg: 3, powerW: 20, minVoltageV: 18 },
        { kind: 'resistor', id: 'lonely', a: 6, b: 6, resistanceOhm: 1 },
      ],
    }
    const { currentRel } = compareWithNgspice(circuit)
    expect(currentRel).toBeLessThan(REL)
  })

  it('a starved constant-power load lands on the same resistive fallback in both', () => {
    // 20 W through 12 Ω from 25.6 V: at most 25.6² / (4 · 12.02) = 13.6 W can reach it, so it sits below
    // its 18 V minimum and draws V · P / Vmin² — the same law the exported B source uses.
    const circuit: Circuit = {
      nodeCount: 3,
      elements: [
        { kind: 'vsource', id: 'bat', pos: 1, neg: 0, voltageV: 25.6, resistanceOhm: 0.02 },
        { kind: 'resistor', id: 'thin', a: 1, b: 2, resistanceOhm: 12 },
        { kind: 'cpower', id: 'fan', pos: 2, neg: 0, powerW: 20, minVoltageV: 18 },
      ],
    }
    expect(solveOperatingPoint(circuit).problems).toContainEqual(expect.objectContaining({ kind: 'not-converged', cause: 'below-minimum-voltage', elementIds: ['fan'] }))
    compareWithNgspice(circuit, 'not-converged')
  })

  it.each([
    { loads: 20, seed: 11 },
    { loads: 60, seed: 12 },
    { loads: 150, seed: 13 },
    { loads: 400, seed: 14 },
    { loads: 1000, seed: 7 }, // the 1 000-load benchmark circuit (2 056 nodes)
  ])('generated radial system with $loads loads (seed $seed)', ({ loads, seed }) => {
    const circuit = radialCircuit({ loads, seed })
    const { currentRel, voltageRel } = compareWithNgspice(circuit)
    console.log(`radial ${loads} loads, ${circuit.nodeCount} nodes, ${circuit.elements.length} elements: ` +
      `max relative error vs ngspice: current ${currentRel.toExponential(2)}, voltage ${voltageRel.toExponential(2)}`)
    if (loads === 400) expect(circuit.nodeCount).toBeGreaterThan(500) // the "several hundred nodes" case
  })
})
