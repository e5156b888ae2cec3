// Whole-analysis benchmark on generated designs of about 100, 1 000 and 10 000 parts, laid out like
// real systems: bank → Class T main fuse → main bus → feeder fuses → chains of distribution buses →
// branch fuses → loads; returns on negative buses, every seventh load straight back to the bank
// (meshed negatives). Three scenarios (all on, half load at night, motor start) and every rule.
// Prints milliseconds per design (wall and CPU, median after warm-up) and the operating-point share.
import { analyzeDesign, compileCircuit } from '../../shared/analysis'
import { generatedDesign } from '../helpers/generatedDesign'
import { solveOperatingPoint } from '../../shared/solver/solveOperatingPoint'

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]
const cpuMs = () => {
  const u = process.cpuUsage()
  return (u.user + u.system) / 1000
}
function timeMs(fn: () => void, warmUp: number, runs: number): { wallMs: number; cpuMs: number; cpuMinMs: number } {
  // At least `warmUp` calls and at least 0.5 s of them, so small designs are timed with optimised code too.
  const warmUntil = performance.now() + 500
  for (let k = 0; k < warmUp || performance.now() < warmUntil; k++) fn()
  const wall: number[] = []
  const cpu: number[] = []
  for (let k = 0; k < runs; k++) {
    const c0 = cpuMs()
    const t0 = performance.now()
    fn()
    wall.push(performance.now() - t0)
    cpu.push(cpuMs() - c0)
  }
  return { wallMs: median(wall), cpuMs: median(cpu), cpuMinMs: Math.min(...cpu) }
}

/** CPU ms for 10⁷ multiply-adds: a yardstick of how fast (or how shared) this machine is right now. */
function yardstickMs(): number {
  const c0 = cpuMs()
  let sum = 0
  for (let i = 0; i < 1e7; i++) sum += i * 0.5
  return sum > 0 ? cpuMs() - c0 : 0
}

export async function run(): Promise<void> {
  console.log(`machine yardstick: 10^7 multiply-adds in ${yardstickMs().toFixed(1)} ms CPU (an idle modern core: ~10 ms)`)
  const rows: string[][] = [['parts', 'conductors', 'scenarios', 'analysis wall/CPU (ms)', 'CPU min (ms)', 'op solves wall/CPU (ms)', 'op CPU share', 'findings']]
  for (const target of [100, 1_000, 10_000]) {
    const design = generatedDesign(target)
    const big = target >= 10_000
    const whole = timeMs(() => analyzeDesign(design), big ? 3 : 10, big ? 15 : 21)
    const circuits = design.scenarios.map((s) => compileCircuit(design, s).circuit)
    const op = timeMs(() => { for (const c of circuits) solveOperatingPoint(c) }, big ? 3 : 10, big ? 15 : 21)
    const result = analyzeDesign(design)
    rows.push([
      String(design.parts.length), String(design.conductors.length), String(design.scenarios.length),
      `${whole.wallMs.toFixed(1)} / ${whole.cpuMs.toFixed(1)}`, whole.cpuMinMs.toFixed(1), `${op.wallMs.toFixed(1)} / ${op.cpuMs.toFixed(1)}`, `${((100 * op.cpuMs) / whole.cpuMs).toFixed(0)} %`,
      String(result.findings.length),
    ])
  }
  const widths = rows[0].map((_, c) => Math.max(...rows.map((r) => r[c].length)))
  for (const row of rows) console.log(row.map((cell, c) => cell.padStart(widths[c])).join('  '))
  console.log('Median after warm-up (≥ 0.5 s), in this process; analysis = every scenario compiled and solved, fault study, every rule')
  console.log('(time-current checks included: they are on by default). CPU = process.cpuUsage, all threads (GC helpers too);')
  console.log('CPU min = the quickest timed run, the figure least disturbed by other work on a shared machine.')
}
