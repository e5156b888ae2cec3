import { describe, expect, it } from 'vitest'
import { analyzeDesign } from '../../../shared/analysis/analyzeDesign'
import { createDemoDesign } from '../../../shared/design/demo'
import { parseDesign, type Design } from '../../../shared/design/schema'
import floatingFile from '../../../examples/floating-part.json'
import sailboatFile from '../../../examples/sailboat-24v.json'
import vanFile from '../../../examples/small-van-12v.json'

// The demo and the examples must show what they are labelled to show once analysed. Expected
// figures are worked by hand beside each check.

const load = (file: unknown): Design => {
  const r = parseDesign(file)
  if (!r.ok) throw new Error(JSON.stringify(r.errors))
  return r.design
}

describe('createDemoDesign findings', () => {
  const { findings } = analyzeDesign(createDemoDesign())

  it('flags the long 16 AWG run to the critical radio over the 3 % limit', () => {
    // By hand, the branch alone: 2 × 7 m of 16 AWG tinned copper. NEC Chapter 9 Table 8, coated
    // stranded: 5.29 Ω/kft at 75 °C → 0.01736 Ω/m; at 30 °C ×(1 + 0.00323 × (30 − 75)) = 0.8547
    // → 0.01483 Ω/m; 14 m → 0.208 Ω; × 8 A = 1.66 V = 6.5 % of 25.6 V. The feed to the panel adds more.
    const drop = findings.find((f) => f.ruleId === 'voltage-drop' && f.partIds.includes('radio'))
    expect(drop).toBeDefined()
    expect(drop!.conductorIds.sort()).toEqual(['radio-neg', 'radio-pos'])
    expect(drop!.limit).toEqual({ value: 3, unit: '%' })
    expect(drop!.measured!.value).toBeGreaterThan(6.2)
    expect(drop!.measured!.value).toBeLessThan(10)
  })

  it('flags the 100 A inverter fuse as below 125 % of the inverter draw', () => {
    // By hand: 2000 W ÷ 0.9 = 2222 W from a 24–26.6 V bank → 84–93 A; × 1.25 → 104–116 A > 100 A.
    const fuse = findings.find((f) => f.ruleId === 'device-below-load' && f.partIds.includes('inverter-fuse'))
    expect(fuse).toBeDefined()
    expect(fuse!.measured!.value).toBeGreaterThan(84)
    expect(fuse!.measured!.value).toBeLessThan(93)
    expect(fuse!.limit!.value).toBeGreaterThan(100)
  })

  it('has at least two findings and no NaN anywhere', () => {
    expect(findings.length).toBeGreaterThanOrEqual(2)
    expect(JSON.stringify(findings)).not.toMatch(/NaN|"value":null/)
  })
})

describe('examples analyse as labelled', () => {
  it('small-van-12v.json has no error findings', () => {
    const errors = analyzeDesign(load(vanFile)).findings.filter((f) => f.severity === 'error')
    expect(errors.map((f) => `${f.ruleId}: ${f.message}`)).toEqual([])
  })

  it('sailboat-24v.json flags the windlass run and the bilge-pump drop', () => {
    const findings = analyzeDesign(load(sailboatFile)).findings
    // 6 AWG at 105 °C: 120 A (33 CFR 183.425 Table 5) < the 150 A windlass breaker.
    expect(findings).toContainEqual(expect.objectContaining({ ruleId: 'device-above-ampacity', partIds: ['windlass-breaker'] }))
    // Bilge pump (3 %, ISO 10133): 2 × 8 m × 0.01483 Ω/m × 4 A = 0.95 V = 3.7 % of 25.6 V by the branch alone.
    const bilge = findings.find((f) => f.ruleId === 'voltage-drop' && f.partIds.includes('bilge-pump'))
    expect(bilge?.measured?.value).toBeGreaterThan(3.7)
  })

  it('floating-part.json names the unwired deck light', () => {
    const findings = analyzeDesign(load(floatingFile)).findings
    expect(findings.some((f) => f.partIds.includes('deck-light'))).toBe(true)
  })
})
