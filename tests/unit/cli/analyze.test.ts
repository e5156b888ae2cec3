import { mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { runAnalyzeCli } from '../../../server/cli/analyze'
import { BAD_DESIGN_EXPECTED_PATHS } from '../../../server/cli/examples/faulty'
import { CAUTION } from '../../../server/cli/report'

// The command line in-process (fast, many cases); analyze.spawn.test.ts runs the real command.

async function run(...argv: string[]) {
  let out = ''
  let err = ''
  const code = await runAnalyzeCli(argv, { out: (t) => (out += `${t}\n`), err: (t) => (err += `${t}\n`) })
  return { code, out, err }
}

const scratch = mkdtempSync(join(tmpdir(), 'ampwright-cli-'))
const writeScratch = (name: string, text: string) => {
  const path = join(scratch, name)
  writeFileSync(path, text)
  return path
}

describe('analyze CLI, input errors (exit 2)', () => {
  it('names a missing file', async () => {
    const r = await run(join(scratch, 'nope.json'))
    expect(r).toMatchObject({ code: 2, out: '' })
    expect(r.err).toContain('nope.json: no such file')
  })

  it('names a folder given as the file', async () => {
    expect((await run(scratch)).err).toContain('it is a folder')
  })

  it('reports broken JSON without a stack trace', async () => {
    const r = await run(writeScratch('broken.json', '{"format": "ampwright.design", '))
    expect(r.code).toBe(2)
    expect(r.err).toMatch(/broken\.json is not valid JSON: /)
    expect(r.err).not.toMatch(/\n\s+at /)
  })

  it('prints every field path of an invalid design', async () => {
    const r = await run('examples/bad-design.json')
    expect(r.code).toBe(2)
    expect(r.err).toContain('examples/bad-design.json is not a valid design (9 problems):')
    expect(r.err).toContain('  parts[0].params.capacityAh: Capacity per battery must be at least 1 Ah')
    expect(r.err).toContain('  conductors[0].sizeId: Choose a conductor size such as awg-10 or mm2-16')
    expect(r.err).toContain('  scenarios: Add at least one scenario')
    for (const path of BAD_DESIGN_EXPECTED_PATHS) expect(r.err).toContain(`\n  ${path}: `)
  })

  it('shows "(document)" for an error about the whole document', async () => {
    const r = await run(writeScratch('array.json', '[1, 2]'))
    expect(r.err).toContain('  (document): A design must be a JSON object')
  })

  it('lists the scenario names when --scenario matches none', async () => {
    const r = await run('examples/demo-expedition-truck.json', '--scenario', 'Midnight snack')
    expect(r.code).toBe(2)
    expect(r.err).toContain('No scenario "Midnight snack"')
    for (const name of ['Night, all loads (id night-all-loads)', 'Noon, charging (id noon-charging)', 'Pump start (id pump-start)']) {
      expect(r.err).toContain(name)
    }
  })

  it('prints usage for bad arguments', async () => {
    const r = await run('--frobnicate')
    expect(r.code).toBe(2)
    expect(r.err).toContain('Unknown option --frobnicate')
    expect(r.err).toContain('Usage: npm run analyze --')
  })
})

describe('analyze CLI, results', () => {
  it('passes the clean van with exit 0 and no findings', async () => {
    const r = await run('examples/small-van-12v.json')
    expect(r.code).toBe(0)
    expect(r.out).toContain('Findings: 0 errors, 0 warnings, 0 info')
    expect(r.out).toContain(CAUTION)
  })

  it('exits 1 on the demo and shows its intended findings in the table', async () => {
    const r = await run('examples/demo-expedition-truck.json')
    expect(r.code).toBe(1)
    expect(r.out).toMatch(/^SEVERITY\s+RULE\s+FINDING\s+PARTS\s+MEASURED\s+LIMIT\s+SCENARIO\s+SOURCE\s+SUGGESTION$/m)
    expect(r.out).toMatch(/^error\s+voltage-drop\s+/m)
    expect(r.out).toMatch(/^warning\s+device-below-load\s+/m)
    // The parts cell may wrap onto a second line.
    for (const id of ['radio', 'radio-neg', 'radio-pos', 'inverter-fuse']) expect(r.out).toContain(id)
    expect(r.out).toMatch(/^Night, all loads\s+ok\s+/m)
  })

  it('accepts a scenario by name, ignoring case, and reports only that scenario', async () => {
    const r = await run('examples/demo-expedition-truck.json', '--scenario', 'noon, CHARGING', '--json')
    const report = JSON.parse(r.out)
    expect(report.scenarios.map((s: { id: string }) => s.id)).toEqual(['noon-charging'])
    for (const f of report.findings) expect([undefined, 'noon-charging']).toContain(f.scenarioId)
  })

  it('accepts a scenario by id', async () => {
    const r = await run('examples/demo-expedition-truck.json', '--scenario=pump-start', '--json')
    expect(JSON.parse(r.out).scenarios).toEqual([expect.objectContaining({ id: 'pump-start', name: 'Pump start' })])
  })

  it('gives JSON with counts that match the findings and the caution', async () => {
    const r = await run('examples/sailboat-24v.json', '--json')
    expect(r.code).toBe(1)
    const report = JSON.parse(r.out)
    const errors = report.findings.filter((f: { severity: string }) => f.severity === 'error').length
    expect(report.counts.error).toBe(errors)
    expect(errors).toBeGreaterThan(0)
    expect(report.caution).toBe(CAUTION)
    expect(report.design).toEqual({ id: 'sailboat-24v', name: 'Cruising sailboat, 24 V', nominalVoltageV: 24 })
  })

  it('names the unwired part in the floating-part example', async () => {
    const r = await run('examples/floating-part.json', '--json')
    expect(r.code).toBe(1)
    const report = JSON.parse(r.out)
    const aboutDeckLight = report.findings.filter((f: { partIds: string[] }) => f.partIds.includes('deck-light'))
    expect(aboutDeckLight.length).toBeGreaterThan(0)
    expect(JSON.stringify(report)).not.toMatch(/NaN|Infinity/)
  })

  it('notes when a file was upgraded from an older format', async () => {
    const v0 = { version: 0, name: 'Old', systemVoltage: 12, components: [], wires: [] }
    const r = await run(writeScratch('v0.json', JSON.stringify(v0)))
    expect(r.err).toContain('uses format version 0; it was upgraded in memory')
    expect(r.code).toBe(0)
  })
})
