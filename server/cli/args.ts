// Command-line arguments of `npm run analyze -- <design.json> [--scenario NAME] [--json]`.

export const ANALYZE_USAGE = `Usage: npm run analyze -- <design.json> [--scenario NAME] [--json]

  <design.json>      an Ampwright design file
  --scenario NAME    analyse one scenario, by id or name (default: all)
  --json             print the result as JSON instead of a table
  -h, --help         show this help

Exit status: 0 no error findings, 1 error findings, 2 invalid input.`

export interface AnalyzeArgs {
  file: string
  scenario?: string
  json: boolean
}

export type ParsedArgs = { ok: true; help: true } | { ok: true; help: false; args: AnalyzeArgs } | { ok: false; message: string }

export function parseAnalyzeArgs(argv: readonly string[]): ParsedArgs {
  const files: string[] = []
  let scenario: string | undefined
  let json = false
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i]
    if (arg === '-h' || arg === '--help') return { ok: true, help: true }
    if (arg === '--json') json = true
    else if (arg === '--scenario' || arg.startsWith('--scenario=')) {
      const value = arg === '--scenario' ? argv[++i] : arg.slice('--scenario='.length)
      if (value === undefined || value.trim() === '') return { ok: false, message: '--scenario needs a scenario id or name' }
      if (scenario !== undefined) return { ok: false, message: '--scenario may be given once' }
      scenario = value
    } else if (arg === '--') continue
    else if (arg.startsWith('-') && arg !== '-') return { ok: false, message: `Unknown option ${arg}` }
    else files.push(arg)
  }
  if (files.length === 0) return { ok: false, message: 'Give the design file to analyse' }
  if (files.length > 1) return { ok: false, message: `Give one design file (got ${files.length}: ${files.join(', ')})` }
  return { ok: true, help: false, args: { file: files[0], scenario, json } }
}
