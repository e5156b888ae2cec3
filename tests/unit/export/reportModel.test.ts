import { describe, expect, it } from 'vitest'
import { analyzeDesign } from '../../../shared/analysis'
import { createDemoDesign } from '../../../shared/design/demo'
import type { Design } from '../../../shared/design/schema'
import { designCautions, stringVocAtRecordLowV } from '../../../shared/export/cautions'
import { buildReportModel } from '../../../shared/export/reportModel'

const info = { project: 'Truck', client: 'C', revision: '1', date: '2026-12-02', designer: 'D' }

describe('buildReportModel', () => {
  const demo = createDemoDesign()
  const analysis = analyzeDesign(demo)
  const report = buildReportModel(demo, analysis, info)

  it('lists every finding with its rule and source, errors first', () => {
    expect(report.findings).toHaveLength(analysis.findings.length)
    for (const f of analysis.findings) expect(report.findings.some((r) => r.ruleId === f.ruleId && r.title === f.title && r.source === f.source)).toBe(true)
    const ranks = report.findings.map((f) => ({ error: 0, warning: 1, info: 2 })[f.severity])
    expect(ranks).toEqual([...ranks].sort((a, b) => a - b))
  })

  it('schedules every conductor, device and scenario', () => {
    expect(report.conductors.rows).toHaveLength(demo.conductors.length)
    expect(report.devices.rows).toHaveLength(analysis.devices.length)
    expect(report.scenarios.rows.map((r) => r[0])).toEqual(demo.scenarios.map((s) => s.name))
    expect(JSON.stringify(report)).not.toMatch(/NaN|Infinity/)
  })

  it('sums daily load energy by hand: Σ P × h', () => {
    // Demo loads (24 V): fridge 55 W × 10 h, lights 40 × 5, pump 5 A × 24 V × 0.3 h, heater 40 × 8, radio 8 A × 24 V × 2 h, USB 30 × 4
    const wh = 550 + 200 + 36 + 320 + 384 + 120
    expect(report.summary.join(' ')).toContain(`Daily load energy: ${wh} Wh`)
  })
})

describe('designCautions', () => {
  it('adds the high-voltage PV caution when the string Voc at the record low exceeds 60 V (NEC 690.7(A))', () => {
    const demo = createDemoDesign()
    // Demo: 2 × 24.6 V × (1 + (−0.28/100) × (−25 − 25)) = 56.09 V: below 60 V.
    const array = demo.parts.find((p) => p.type === 'pv-array')!
    if (array.type !== 'pv-array') throw new Error('demo has an array')
    expect(stringVocAtRecordLowV(array.params)).toBeCloseTo(56.088, 3)
    expect(designCautions(demo).some((c) => c.startsWith('High-voltage PV'))).toBe(false)
    // Three modules per string: 84.13 V.
    const cold: Design = { ...demo, parts: demo.parts.map((p) => (p.id === array.id ? { ...array, params: { ...array.params, modulesPerString: 3 } } : p)) }
    const cautions = designCautions(cold)
    expect(cautions.find((c) => c.startsWith('High-voltage PV'))).toContain('84 V')
    expect(cautions[0]).toContain('authority having jurisdiction')
  })
})
