import { readFileSync } from 'node:fs'
import { describe, expect, it } from 'vitest'
import { runAnalyzeCli } from '../../../server/cli/analyze'
import { EXAMPLE_FILES, TIME_CURRENT_EXAMPLE_RULES } from '../../../server/cli/examples'
import { analyzeDesign } from '../../../shared/analysis'
import { parseDesign, type Design } from '../../../shared/design/schema'

// The files in examples/ are generated from server/cli/examples/*.ts and must show what they are
// labelled to show: the van passes everything (time-current checks included, on by default), and
// each time-current example triggers the rule it is named after. Hand figures are in the builders.

const read = (name: string): unknown => JSON.parse(readFileSync(`examples/${name}`, 'utf8'))
const load = (name: string): Design => {
  const r = parseDesign(read(name))
  if (!r.ok) throw new Error(`${name}: ${JSON.stringify(r.errors)}`)
  return r.design
}

describe('examples/ files', () => {
  it('are exactly what server/cli/write-examples.ts writes (no drift)', () => {
    for (const [name, build] of Object.entries(EXAMPLE_FILES)) {
      expect(readFileSync(`examples/${name}`, 'utf8'), name).toBe(`${JSON.stringify(build(), null, 2)}\n`)
    }
  })

  it('small-van-12v.json has no error or warning finding, with every time-current check on', () => {
    const { findings, scenarios } = analyzeDesign(load('small-van-12v.json'))
    expect(findings.filter((f) => f.severity !== 'info').map((f) => `${f.ruleId}: ${f.message}`)).toEqual([])
    expect(scenarios.map((s) => s.status)).toEqual(['ok', 'ok', 'ok'])
  })

  for (const [name, ruleId] of Object.entries(TIME_CURRENT_EXAMPLE_RULES)) {
    it(`${name} triggers ${ruleId}, and not when the time-current checks are off`, () => {
      const design = load(name)
      const on = analyzeDesign(design).findings
      const hit = on.filter((f) => f.ruleId === ruleId)
      expect(hit.length, on.map((f) => f.ruleId).join(', ')).toBeGreaterThan(0)
      expect(hit[0].partIds).toContain('branch-device')
      // The file's one mistake is in time-current behaviour: the static checks find nothing to report.
      const off = analyzeDesign(design, { coordination: false }).findings.filter((f) => f.severity !== 'info')
      expect(off.map((f) => `${f.ruleId}: ${f.message}`)).toEqual([])
    })
  }

  it('motor-start-nuisance.json: 48 A start for 0.5 s against a 15 A blade that may open after ≈ 90 ms', () => {
    // 6 × 8 A = 48 A = 3.2 × 15 A; blade minimum melting between 2 × (0.15 s) and 3.5 × (0.08 s),
    // log–log: 0.15 · (3.2 / 2)^(ln(0.08/0.15) / ln(1.75)) = 0.15 · 1.6^−1.1233 ≈ 0.088 s (ISO 8820-3, recalled).
    const f = analyzeDesign(load('motor-start-nuisance.json')).findings.find((x) => x.ruleId === 'motor-start-nuisance-open')!
    expect(f.measured).toEqual({ value: 0.5, unit: 's' })
    expect(f.limit!.value).toBeCloseTo(0.088, 3)
  })

  it('not-selective.json: the 80 A strip fuse may outlast the 100 A Class T melting time', () => {
    const f = analyzeDesign(load('not-selective.json')).findings.find((x) => x.ruleId === 'not-selective')!
    expect(f.severity).toBe('warning')
    expect(f.partIds.sort()).toEqual(['branch-device', 'main-fuse'])
    expect(f.measured!.value).toBeGreaterThan(f.limit!.value)
  })

  it('the CLI exits 1 on every time-current example with an error finding, 0 on the van', async () => {
    const code = async (name: string) => runAnalyzeCli([`examples/${name}`], { out: () => {}, err: () => {} })
    expect(await code('small-van-12v.json')).toBe(0)
    for (const name of ['slow-fault-clearing.json', 'thermal-breaker-only.json', 'auto-reset-breaker.json']) expect(await code(name), name).toBe(1)
    // Warnings only (a start that may open, a selectivity loss): exit 0.
    for (const name of ['motor-start-nuisance.json', 'not-selective.json']) expect(await code(name), name).toBe(0)
  })
  it('library-device-pump.json: the library fuse (2.5 s at 48 A, its own point) rides through the start the blade band opens on', async () => {
    const design = load('library-device-pump.json')
    const device = design.parts.find((p) => p.id === 'branch-device')
    expect(device?.type === 'fuse' && device.params.customDevice?.name).toBe('Workshop time-delay fuse 15 A')
    expect(analyzeDesign(design).findings.filter((f) => f.severity !== 'info').map((f) => `${f.ruleId}: ${f.message}`)).toEqual([])
    // The same file without the embedded device falls back to the regular blade family: the ≈ 88 ms finding above.
    if (device?.type === 'fuse') delete device.params.customDevice
    const f = analyzeDesign(design).findings.find((x) => x.ruleId === 'motor-start-nuisance-open')!
    expect(f.limit!.value).toBeCloseTo(0.088, 3)
    // Far-end short of the 12 AWG run: cleared by the library band at 0.03 · (300 / I)² s, inside the ICEA withstand.
    const farEndA = analyzeDesign(load('library-device-pump.json')).conductors.find((c) => c.id === 'load-pos')!.faultCurrentFarEndA
    expect(0.03 * (300 / farEndA) ** 2).toBeLessThan(0.001607 * (6530 / farEndA) ** 2)
    expect(await runAnalyzeCli(['examples/library-device-pump.json'], { out: () => {}, err: () => {} })).toBe(0)
  })
})
