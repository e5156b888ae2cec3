import { execFile } from 'node:child_process'
import { describe, expect, it } from 'vitest'

// End to end: the real command as a user runs it (npx tsx server/cli/analyze.ts), checking exit
// codes and what reaches stdout and stderr.

function cli(...args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  return new Promise((resolve) => {
    execFile('npx', ['tsx', 'server/cli/analyze.ts', ...args], { cwd: process.cwd(), timeout: 60_000 }, (error, stdout, stderr) => {
      const code = error ? (typeof error.code === 'number' ? error.code : -1) : 0
      resolve({ code, stdout, stderr })
    })
  })
}

describe('npx tsx server/cli/analyze.ts', () => {
  it('exits 0 for the clean van', async () => {
    const r = await cli('examples/small-van-12v.json')
    expect(r.code).toBe(0)
    expect(r.stdout).toContain('Small camper van, 12 V')
    expect(r.stdout).toContain('authority having jurisdiction')
  }, 60_000)

  it('exits 1 for the sailboat and prints its rule ids', async () => {
    const r = await cli('examples/sailboat-24v.json')
    expect(r.code).toBe(1)
    for (const rule of ['voltage-drop', 'device-above-ampacity']) expect(r.stdout).toContain(rule)
  }, 60_000)

  it('exits 2 for the invalid design, with field paths on stderr', async () => {
    const r = await cli('examples/bad-design.json')
    expect(r.code).toBe(2)
    expect(r.stdout).toBe('')
    expect(r.stderr).toContain('settings.nominalVoltageV: Choose a system voltage of 12, 24 or 48 V')
    expect(r.stderr).toContain('conductors[0].lengthM: Length must be more than 0 m')
  }, 60_000)

  it('exits 2 for a missing file and for an unknown scenario', async () => {
    const [missing, unknown] = await Promise.all([
      cli('examples/no-such-design.json'),
      cli('examples/small-van-12v.json', '--scenario', 'Hurricane'),
    ])
    expect(missing.code).toBe(2)
    expect(missing.stderr).toContain('no such file')
    expect(unknown.code).toBe(2)
    expect(unknown.stderr).toContain('Evening, all loads (id evening)')
  }, 60_000)

  it('prints parseable JSON with --json', async () => {
    const r = await cli('examples/demo-expedition-truck.json', '--json')
    expect(r.code).toBe(1)
    const report = JSON.parse(r.stdout)
    expect(report.findings.map((f: { ruleId: string }) => f.ruleId)).toEqual(expect.arrayContaining(['voltage-drop', 'device-below-load']))
  }, 60_000)
})
