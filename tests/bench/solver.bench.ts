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
const cpuMs = () => {
  const usage = process.cpuUsage()
  return (usage.user + usage.system) / 1000
}

/**
 * Median wall time and median CPU time of `runs` calls after `warmUp` calls. CPU time is the
 * fairer figure beside ngspice's rusage on a shared, busy machine (it leaves out time spent
 * waiting for a core); it includes the garbage collector's threads.
 */
function timeMs(fn: () => void, warmUp: number, runs: number): { wallMs: number; cpuMs: number } {
  for (let k = 0; k < warmUp; k++) fn()
  const wall: number[] = []
  const cpu: number[] = []
  for (let k = 0; k < runs; k++) {
    const startedCpu = cpuMs()
    const started = performance.now()
    fn()
    wall.push(performance.now() - started)
    cpu.push(cpuMs() - startedCpu)
  }
  return { wallMs: median(wall), cpuMs: median(cpu) }
}
const both = (t: { wallMs: number; cpuMs: number }) => `${t.wallMs.toFixed(2)} / ${t.cpuMs.toFixed(2)}`

export async function run(): Promise<void> {
  const rows: string[][] = [
    ['loads', 'nodes', 'elements', 'Newton it.', 'our op wall/CPU (ms)', 'faults at every node wall/CPU (ms)', 'µs per fault', 'ngspice analysis (ms)', 'ngspice it.', 'ngspice process wall (ms)'],
  ]
  for (const loads of [100, 1_000, 10_000]) {
    const circuit = radialCircuit({ loads, seed: 7 })
    const op = solveOperatingPoint(circuit)
    const opMs = timeMs(() => solveOperatingPoint(circuit), loads >= 10_000 ? 5 : 30, loads >= 10_000 ? 9 : 21)
    const faults = Array.from({ length: circuit.nodeCount - 1 }, (_, k) => ({ id: `n${k + 1}`, a: k + 1, b: 0 }))
    const faultMs = timeMs(() => faultCurrents(circuit, faults), loads >= 10_000 ? 3 : 10, loads >= 10_000 ? 5 : 11)
    const deck = toSpiceNetlist(circuit, { title: `bench ${loads} loads`, printCurrents: false })
    const spiceRuns = Array.from({ length: 3 }, () => runNgspice(deck))
    const analysisMs = median(spiceRuns.map((r) => (r.analysisTimeS ?? Number.NaN) * 1000))
    rows.push([
      String(loads),
      String(circuit.nodeCount),
      String(circuit.elements.length),
      `${op.iterations} (${op.status})`,
      both(opMs),
      both(faultMs),
      ((faultMs.cpuMs * 1000) / faults.length).toFixed(2),
      analysisMs.toFixed(1),
      String(spiceRuns[0].totalIterations ?? '?'),
      median(spiceRuns.map((r) => r.wallMs)).toFixed(0),
    ])
  }
  const widths = rows[0].map((_, c) => Math.max(...rows.map((r) => r[c].length)))
  for (const row of rows) console.log(row.map((cell, c) => cell.padStart(widths[c])).join('  '))
  console.log(
    'Ours: median over several runs after warm-up, in this process (op = validation, islands, ordering, symbolic and\n' +
      'every Newton iteration). ngspice: its own rusage "Total analysis time" (1 ms resolution), median of 3 runs,\n' +
      'on the exported deck of the same circuit (reltol 1e-9, vntol 1e-9 V, abstol 1e-12 A).',
  )
}
