// Running ngspice (Debian package, /usr/bin/ngspice) in batch mode and reading its printed vectors.
import { spawnSync } from 'node:child_process'
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'

export interface NgspiceOutput {
  /** Printed `name = value` lines, names in lower case (`n12`, `vb3#branch`, `@r5[i]`). */
  vectors: Map<string, number>
  /** "Total analysis time (seconds)" from `rusage`, when printed. */
  analysisTimeS: number | null
  /** "Total iterations" from `rusage`, when printed. */
  totalIterations: number | null
}

const VECTOR_LINE = /^([^\s=]+)\s*=\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*$/

export function parseNgspiceOutput(text: string): NgspiceOutput {
  const vectors = new Map<string, number>()
  let analysisTimeS: number | null = null
  let totalIterations: number | null = null
  for (const raw of text.split(/\r?\n/)) {
    const line = raw.trim()
    const vector = VECTOR_LINE.exec(line)
    if (vector) {
      vectors.set(vector[1].toLowerCase(), Number(vector[2]))
      continue
    }
    const time = /^Total analysis time \(seconds\)\s*=\s*([-+0-9.eE]+)/.exec(line)
    if (time) analysisTimeS = Number(time[1])
    const iterations = /^Total iterations\s*=\s*(\d+)/.exec(line)
    if (iterations) totalIterations = Number(iterations[1])
  }
  return { vectors, analysisTimeS, totalIterations }
}

export interface NgspiceRun extends NgspiceOutput {
  stdout: string
  wallMs: number
}

/** Runs `ngspice -b` on a deck; throws with ngspice's own messages if it fails. */
export function runNgspice(deck: string, timeoutMs = 300_000): NgspiceRun {
  const dir = mkdtempSync(join(tmpdir(), 'ngspice-'))
  try {
    const file = join(dir, 'deck.cir')
    writeFileSync(file, deck)
    const started = performance.now()
    const run = spawnSync('ngspice', ['-b', file], { encoding: 'utf8', maxBuffer: 1 << 30, timeout: timeoutMs })
    const wallMs = performance.now() - started
    if (run.error) throw run.error
    if (run.status !== 0) throw new Error(`ngspice exited with ${run.status}: ${run.stderr || run.stdout}`)
    if (/singular matrix|no convergence|timestep too small/i.test(run.stdout + run.stderr)) {
      throw new Error(`ngspice did not solve the deck: ${(run.stdout + run.stderr).slice(0, 2000)}`)
    }
    return { ...parseNgspiceOutput(run.stdout), stdout: run.stdout, wallMs }
  } finally {
    rmSync(dir, { recursive: true, force: true })
  }
}
