// SPICE deck of a solver circuit, for checking our operating point with an independent simulator
// (ngspice) and for users who want to run their design elsewhere. Node i is named `n<i>`;
// elements are named after their index, with the circuit's own id in a comment beside them.
import type { Circuit, CircuitElement } from '../solver/circuit'
import { prepareNetwork } from '../solver/_lib/prepareNetwork'

export interface SpiceNetlistOptions {
  title: string
  /** Print every element current (default true). Large benchmark decks may leave them out. */
  printCurrents?: boolean
  /** Convergence tolerances for the simulator (defaults reltol 1e-9, vntol 1e-9 V, abstol 1e-12 A). */
  reltol?: number
  vntolV?: number
  abstolA?: number
}

/** How to read an element's current in our sign convention from the simulator's printed vectors. */
export interface SpiceCurrentProbe {
  vector: string
  sign: 1 | -1
}

export const spiceNodeName = (node: number): string => `n${node}`

/** Vector holding element `index`'s current, lower case as ngspice prints it; null if not exported. */
export function spiceCurrentProbe(element: CircuitElement, index: number): SpiceCurrentProbe {
  switch (element.kind) {
    case 'resistor':
      return { vector: `@r${index}[i]`, sign: 1 }
    case 'vsource':
      // A SPICE V source reports current entering its + terminal; ours leaves pos.
      return { vector: `vb${index}#branch`, sign: -1 }
    case 'isource':
      return { vector: `@i${index}[current]`, sign: 1 }
    case 'cpower':
      return { vector: `@b${index}[i]`, sign: 1 }
  }
}

const num = (x: number): string => (x < 0 ? `(${String(x)})` : String(x))
const comment = (text: string): string => text.replace(/[^\x20-\x7e]/g, '?')

function elementLines(element: CircuitElement, e: number): string[] {
  const lines = [`* ${comment(element.id)}`]
  switch (element.kind) {
    case 'resistor':
      lines.push(`R${e} ${spiceNodeName(element.a)} ${spiceNodeName(element.b)} ${element.resistanceOhm}`)
      break
    case 'vsource':
      // Battery: EMF between neg and an internal node, internal resistance from there to pos.
      lines.push(`VB${e} xb${e} ${spiceNodeName(element.neg)} DC ${element.voltageV}`)
      lines.push(`RB${e} ${spiceNodeName(element.pos)} xb${e} ${element.resistanceOhm}`)
      break
    case 'isource':
      lines.push(`I${e} ${spiceNodeName(element.from)} ${spiceNodeName(element.to)} DC ${element.currentA}`)
      break
    case 'cpower': {
      const v = `V(${spiceNodeName(element.pos)},${spiceNodeName(element.neg)})`
      const p = num(element.powerW)
      const vMin2 = element.minVoltageV * element.minVoltageV
      lines.push(`B${e} ${spiceNodeName(element.pos)} ${spiceNodeName(element.neg)} I = ${v} >= ${element.minVoltageV} ? ${p}/${v} : ${v}*${p}/${vMin2}`)
      break
    }
  }
  return lines
}

/**
 * ngspice deck: R for resistors, a battery as V plus series R through an internal node, I for
 * current sources, a behavioural B source for constant power (I = P/V above Vmin, V·P/Vmin²
 * below). Every island's reference is tied to ground by a 0 V source so floating parts do not
 * make the matrix singular. The control block runs `op`, prints all node voltages and element
 * currents at 12 digits and the analysis time (`rusage`), then `quit 0`.
 *
 * @example
 * toSpiceNetlist({ nodeCount: 2, elements: [{ kind: 'resistor', id: 'r', a: 1, b: 0, resistanceOhm: 2 }] }, { title: 'demo' })
 */
export function toSpiceNetlist(circuit: Circuit, options: SpiceNetlistOptions): string {
  const prepared = prepareNetwork(circuit, () => true)
  const { islands, islandOfNode } = prepared.islandMap
  const lines = [`* ${comment(options.title.split(/\r?\n/)[0] ?? '')}`]
  const tied = new Uint8Array(islands.length)
  const probes: string[] = []
  for (let e = 0; e < circuit.elements.length; e++) {
    const element = circuit.elements[e]
    if (!prepared.used[e]) {
      lines.push(`* left out (invalid, or no current can flow): ${comment(String(element?.id))}`)
      continue
    }
    lines.push(...elementLines(element, e))
    probes.push(spiceCurrentProbe(element, e).vector)
    const node = element.kind === 'resistor' ? element.a : element.kind === 'isource' ? element.from : element.pos
    tied[islandOfNode[node]] = 1
  }
  circuit.nodeNames?.forEach((name, node) => {
    if (node < circuit.nodeCount && name) lines.push(`* node ${spiceNodeName(node)}: ${comment(name)}`)
  })
  lines.push('* island references tied to ground')
  islands.forEach((island, k) => {
    if (tied[k]) lines.push(`VGND${k} ${spiceNodeName(island.referenceNode)} 0 DC 0`)
  })
  lines.push(`.options reltol=${options.reltol ?? 1e-9} vntol=${options.vntolV ?? 1e-9} abstol=${options.abstolA ?? 1e-12}`)
  lines.push('.control', 'set numdgt=12', 'op', 'print all')
  if (options.printCurrents ?? true) {
    for (let k = 0; k < probes.length; k += 8) lines.push(`print ${probes.slice(k, k + 8).join(' ')}`)
  }
  lines.push('rusage all', 'quit 0', '.endc', '.end', '')
  return lines.join('\n')
}
