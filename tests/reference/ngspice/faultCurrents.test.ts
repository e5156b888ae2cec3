// Prospective fault currents against ngspice: a 1 µΩ bolted fault across a–b in the loads-removed
// deck, whose current must equal |Voc| / (Rth + 1 µΩ); and Rth itself as the voltage a 1 A test
// current produces with every EMF set to 0. Both within 0.1 %.
import { describe, expect, it } from 'vitest'
import type { Circuit } from '../../../shared/solver/circuit'
import { faultCurrents } from '../../../shared/solver/theveninResistance'
import { spiceCurrentProbe, spiceNodeName, toSpiceNetlist } from '../../../shared/spice/toSpiceNetlist'
import { runNgspice } from '../../helpers/ngspice'
import { radialCircuit, seededRandom } from '../../helpers/radialCircuit'

const REL = 1e-3
const BOLT_OHM = 1e-6

const withoutLoads = (circuit: Circuit): Circuit => ({
  nodeCount: circuit.nodeCount,
  elements: circuit.elements.filter((el) => el.kind === 'resistor' || el.kind === 'vsource'),
})

function pickFaults(circuit: Circuit, count: number, seed: number) {
  const random = seededRandom(seed)
  return Array.from({ length: count }, (_, k) => {
    const a = 1 + Math.floor(random() * (circuit.nodeCount - 1))
    // Half the faults go to the battery negative, half across two random nodes (e.g. pos to a load negative).
    const b = k % 2 === 0 ? 0 : Math.floor(random() * circuit.nodeCount)
    return { id: `f${k}`, a, b: b === a ? 0 : b }
  })
}

describe('fault currents vs ngspice', () => {
  it.each([
    { loads: 15, seed: 21 },
    { loads: 80, seed: 22 },
    { loads: 250, seed: 23 },
  ])('bolted faults on a radial system with $loads loads', ({ loads, seed }) => {
    const circuit = radialCircuit({ loads, seed })
    const faults = pickFaults(circuit, 6, seed)
    const ours = faultCurrents(circuit, faults)
    let worst = 0
    faults.forEach((fault, k) => {
      const bolted = withoutLoads(circuit)
      bolted.elements.push({ kind: 'resistor', id: 'fault', a: fault.a, b: fault.b, resistanceOhm: BOLT_OHM })
      const index = bolted.elements.length - 1
      const spice = runNgspice(toSpiceNetlist(bolted, { title: `fault ${fault.id}` }))
      const probe = spiceCurrentProbe(bolted.elements[index], index)
      const reference = Math.abs(spice.vectors.get(probe.vector) as number)
      const expected = Math.abs(ours[k].openCircuitV) / (ours[k].resistanceOhm + BOLT_OHM)
      const error = Math.abs(expected - reference) / reference
      expect(error, `${fault.id} ${fault.a}→${fault.b}`).toBeLessThan(REL)
      worst = Math.max(worst, error)
    })
    console.log(`faults on radial ${loads} loads: max relative error of the fault current vs ngspice ${worst.toExponential(2)}`)
  })

  it('Rth from a 1 A test current with dead sources', () => {
    const circuit = radialCircuit({ loads: 120, seed: 24 })
    const faults = pickFaults(circuit, 5, 24)
    const ours = faultCurrents(circuit, faults)
    faults.forEach((fault, k) => {
      const dead = withoutLoads(circuit)
      dead.elements = dead.elements.map((el) => (el.kind === 'vsource' ? { ...el, voltageV: 0 } : el))
      dead.elements.push({ kind: 'isource', id: 'test', from: fault.b, to: fault.a, currentA: 1 })
      const spice = runNgspice(toSpiceNetlist(dead, { title: `Rth ${fault.id}`, printCurrents: false }))
      const va = fault.a === 0 ? 0 : (spice.vectors.get(spiceNodeName(fault.a)) as number)
      const vb = fault.b === 0 ? 0 : (spice.vectors.get(spiceNodeName(fault.b)) as number)
      expect(Math.abs(ours[k].resistanceOhm - (va - vb)) / (va - vb)).toBeLessThan(REL)
    })
  })
})
