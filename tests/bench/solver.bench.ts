// DC solver benchmark on generated radial systems (tests/helpers/radialCircuit.ts) with 100,
// 1 000 and 10 000 loads: our operating point (median of several runs after warm-up), fault
// currents at every node, and ngspice's own "Total analysis time" (rusage) for the exported deck
// of the same circuit. Prints figures only.
import { solveOperatingPoint } from '../../shared/solver/solveOperatingPoint'
import { faultCurrents } from '../../shared/solver/theveninResistance'
import { toSpiceNetlist } from '../../shared/spice/toSpiceNetlist'
import { runNgspice } from '../helpers/ngspice'
import { radialCircuit } from '../helpers/radialCircuit'

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]

function timeMs(fn: () => void, warmUp: number, runs: number): number {
  for (let k = 0; k < warmUp; k++) fn()
  const samples: number[] = []
  for (let k = 0; k < runs; k++) {
    const started = performance.now()
    fn()
    samples.push(performance.now() - started)
  }
  return median(samples)
}

export async function run(): Promise<void> {
  const rows: string[][] = [['loads', 'nodes', 'elements', 'Newton it.', 'our op (ms)', 'faults at every node (ms)', 'ngspice analysis (ms)', 'ngspice it.', 'ngspice wall (ms)']]
  for (const loads of [100, 1_000, 10_000]) {
    const circuit = radialCircuit({ loads, seed: 7 })
    const op = solveOperatingPoint(circuit)
    const opMs = timeMs(() => solveOperatingPoint(circuit), 3, loads >= 10_000 ? 7 : 11)
    const faults = Array.from({ length: circuit.nodeCount - 1 }, (_, k) => ({ id: `n${k + 1}`, a: k + 1, b: 0 }))
    const faultMs = timeMs(() => faultCurrents(circuit, faults), 2, 5)
    const deck = toSpiceNetlist(circuit, { title: `bench ${loads} loads`, printCurrents: false })
    const spiceRuns = Array.from({ length: 3 }, () => runNgspice(deck))
    const analysisMs = median(spiceRuns.map((r) => (r.analysisTimeS ?? Number.NaN) * 1000))
    rows.push([
      String(loads),
      String(circuit.nodeCount),
      String(circuit.elements.length),
      `${op.iterations} (${op.status})`,
      opMs.toFixed(2),
      faultMs.toFixed(2),
      analysisMs.toFixed(1),
      String(spiceRuns[0].totalIterations ?? '?'),
      median(spiceRuns.map((r) => r.wallMs)).toFixed(0),
    ])
  }
  const widths = rows[0].map((_, c) => Math.max(...rows.map((r) => r[c].length)))
  for (const row of rows) console.log(row.map((cell, c) => cell.padStart(widths[c])).join('  '))
  console.log('ngspice analysis time is its own rusage figure (1 ms resolution); our figures are the median wall time in this process.')
}
