import type { Design } from '../../design/schema'
import { faultCurrentTable } from '../../solver/theveninResistance'
import { compileCircuit, FAULT_STUDY_SCENARIO, type PreparedDesign } from '../compileCircuit'
import type { ProtectionTopology } from '../protectionTopology'
import { finite } from './finite'
import { nodeAt } from './terminalNodes'

export interface FaultStudy {
  /** Per device (prepared.devices order): bolted fault at its load terminal to the negative of its bank, A. */
  deviceFaultA: Float64Array
  /** Per conductor (design order): bolted fault at the far end of a positive conductor, across the part
   * it feeds (its negative terminal when it has one, else the bank's negative), A; 0 when none. */
  conductorFarEndA: Float64Array
}

/**
 * Prospective short-circuit currents from the batteries alone (loads and chargers off), through
 * each bank's internal resistance and the wiring (standards.md §7: Isc ≈ E / (R_int + R_ext)).
 * The device figure ignores the return path (highest current: the interrupting-rating case); the
 * far-end figure includes it (the current the upstream device must see to clear).
 */
export function faultStudy(design: Design, prepared: PreparedDesign, topology: ProtectionTopology): FaultStudy {
  const compiled = compileCircuit(design, FAULT_STUDY_SCENARIO, prepared)
  const nodes = prepared.nodes
  const bankNeg = new Map<string, number>()
  for (const el of compiled.circuit.elements) if (el.kind === 'vsource') bankNeg.set(el.id.slice(2), el.neg)

  // Faults in the order of their owners: the devices, then the conductors (results come back in that order).
  const faultA: number[] = []
  const faultB: number[] = []
  const faultDevice: number[] = []
  prepared.devices.forEach((d, k) => {
    const t = topology.deviceList[k]
    const a = nodeAt(nodes, d.partId, d.loadTerminal)
    const b = t?.side === 'battery' && t.sourcePartId ? bankNeg.get(t.sourcePartId) : undefined
    if (a !== undefined && b !== undefined) {
      faultA.push(a)
      faultB.push(b)
      faultDevice.push(k)
    }
  })
  const deviceFaults = faultA.length
  const faultConductor: number[] = []
  design.conductors.forEach((c, k) => {
    const t = topology.conductorList[k]
    if (!t || t.side !== 'battery' || !t.sourcePartId) return
    const far = nodes.conductorFrom[k] === t.downstreamNode ? c.from : nodes.conductorTo[k] === t.downstreamNode ? c.to : undefined
    const negTerminal = far ? nodes.byPart.get(far.partId)?.terminals.find((term) => term.polarity === 'negative') : undefined
    const b = (negTerminal && far ? nodeAt(nodes, far.partId, negTerminal.id) : undefined) ?? bankNeg.get(t.sourcePartId)
    if (b !== undefined) {
      faultA.push(t.downstreamNode)
      faultB.push(b)
      faultConductor.push(k)
    }
  })

  const deviceFaultA = new Float64Array(prepared.devices.length)
  const conductorFarEndA = new Float64Array(design.conductors.length)
  const { currentA } = faultCurrentTable(compiled.circuit, Int32Array.from(faultA), Int32Array.from(faultB), { cache: prepared.solverCache })
  for (let k = 0; k < currentA.length; k++) {
    const amps = finite(currentA[k])
    if (k < deviceFaults) deviceFaultA[faultDevice[k]] = amps
    else conductorFarEndA[faultConductor[k - deviceFaults]] = amps
  }
  return { deviceFaultA, conductorFarEndA }
}
