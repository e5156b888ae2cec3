import { pathToFileURL } from 'node:url'
import type { Design, Scenario } from '../../shared/design/schema'
import { analyzeDesign } from '../../shared/analysis/analyzeDesign'
import type { AnalysisResult } from '../../shared/analysis/types'
import { ANALYZE_USAGE, parseAnalyzeArgs } from './args'
import { readDesignFile } from './readDesignFile'
import { formatReport, reportAsJson } from './report'

// `npm run analyze -- <design.json> [--scenario NAME] [--json]`: check a design file from the
// command line. Exit 0 when there are no error findings, 1 when there are, 2 for invalid input.

export const EXIT_OK = 0
export const EXIT_FINDINGS = 1
export const EXIT_INVALID = 2

export interface CliIo {
  out: (text: string) => void
  err: (text: string) => void
}

/** A scenario by id, else by name (ignoring case and surrounding spaces). */
export function findScenario(design: Design, wanted: string): Scenario | undefined {
  const key = wanted.trim().toLowerCase()
  return design.scenarios.find((s) => s.id === wanted) ?? design.scenarios.find((s) => s.name.trim().toLowerCase() === key)
}

export async function runAnalyzeCli(argv: readonly string[], io: CliIo): Promise<number> {
  const parsed = parseAnalyzeArgs(argv)
  if (!parsed.ok) {
    io.err(`${parsed.message}\n\n${ANALYZE_USAGE}`)
    return EXIT_INVALID
  }
  if (parsed.help) {
    io.out(ANALYZE_USAGE)
    return EXIT_OK
  }
  const { file, scenario: wanted, json } = parsed.args

  const read = await readDesignFile(file)
  if (!read.ok) {
    const details = read.reason === 'invalid' ? read.errors.map((e) => `  ${e.path || '(document)'}: ${e.message}`) : []
    io.err([read.message, ...details].join('\n'))
    return EXIT_INVALID
  }
  const design = read.design
  if (read.migratedFrom !== undefined) io.err(`Note: ${file} uses format version ${read.migratedFrom}; it was upgraded in memory.`)

  let scenarioIds: string[] | undefined
  if (wanted !== undefined) {
    const scenario = findScenario(design, wanted)
    if (!scenario) {
      const names = design.scenarios.map((s) => `  ${s.name} (id ${s.id})`).join('\n')
      io.err(`No scenario "${wanted}" in ${file}. Scenarios:\n${names}`)
      return EXIT_INVALID
    }
    scenarioIds = [scenario.id]
  }

  let result: AnalysisResult
  try {
    result = analyzeDesign(design, scenarioIds ? { scenarioIds } : undefined)
  } catch (error) {
    io.err(`The analysis stopped unexpectedly on ${file}: ${(error as Error).message ?? String(error)}`)
    return EXIT_INVALID
  }
  if (scenarioIds) {
    const only = new Set(scenarioIds)
    result = { ...result, scenarios: result.scenarios.filter((s) => only.has(s.id)),
      findings: result.findings.filter((f) => f.scenarioId === undefined || only.has(f.scenarioId)) }
  }

  io.out(json ? JSON.stringify(reportAsJson(design, result, file), null, 2) : formatReport(design, result, file))
  return result.findings.some((f) => f.severity === 'error') ? EXIT_FINDINGS : EXIT_OK
}

const isEntryPoint = process.argv[1] !== undefined && import.meta.url === pathToFileURL(process.argv[1]).href
if (isEntryPoint) {
  const code = await runAnalyzeCli(process.argv.slice(2), {
    out: (text) => process.stdout.write(`${text}\n`),
    err: (text) => process.stderr.write(`${text}\n`),
  })
  process.exitCode = code
}
