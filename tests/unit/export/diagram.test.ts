import { describe, expect, it } from 'vitest'
import { analyzeDesign } from '../../../shared/analysis'
import { makeConductor, makePart } from '../../../shared/design/builder'
import { createDemoDesign, createEmptyDesign } from '../../../shared/design/demo'
import type { Design } from '../../../shared/design/schema'
import { GENERAL_CAUTION, LITHIUM_CAUTION } from '../../../shared/export/cautions'
import { escapeXml, renderDiagramSvg } from '../../../shared/export/renderDiagramSvg'
import { xmlWellFormedError } from '../../../shared/export/xmlWellFormed'

const titleBlock = { project: 'Expedition truck', client: 'R. Example', revision: 'Rev 4 — as built', date: '2026-12-02', designer: 'Dana Designer' }
const textOf = (svg: string) => [...svg.matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((m) => m[1])

describe('renderDiagramSvg', () => {
  const demo = createDemoDesign()
  const analysis = analyzeDesign(demo)
  const svg = renderDiagramSvg(demo, analysis, { titleBlock })

  it('is a well-formed SVG document (XML 1.0 §2.1)', () => {
    expect(xmlWellFormedError(svg)).toBeNull()
    expect(svg).toMatch(/<svg xmlns="http:\/\/www.w3.org\/2000\/svg" width="\d+" height="\d+"/)
  })

  it('draws every part with its label and every conductor with its size and length', () => {
    const texts = textOf(svg).join('\n')
    // Labels may wrap onto two lines: check word by word.
    for (const part of demo.parts) for (const word of part.label.split(' ')) expect(texts).toContain(escapeXml(word))
    expect(svg.match(/<polyline /g)!.length).toBeGreaterThanOrEqual(demo.conductors.length)
    expect(texts).toContain('16 AWG · 7 m') // the radio run of the demo
    expect(texts).toContain('2/0 AWG · 0.2 m')
  })

  it('numbers every finding on the drawing and in the key', () => {
    const texts = textOf(svg)
    analysis.findings.forEach((finding, i) => {
      expect(texts.some((t) => t.startsWith(`${i + 1}. [`) && t.includes(escapeXml(finding.title)))).toBe(true)
    })
  })

  it('carries the title block and the cautions (lithium: the demo bank is LFP)', () => {
    const joined = textOf(svg).join(' ')
    for (const value of Object.values(titleBlock)) expect(joined).toContain(escapeXml(value))
    expect(joined).toContain('Caution: these results are design aids.')
    expect(joined).toContain('authority having')
    expect(joined).toContain('Lithium batteries')
    expect(GENERAL_CAUTION).toContain('licensed practice prevail')
    expect(LITHIUM_CAUTION).toContain('Lithium')
  })

  it('escapes hostile text and still renders an empty design', () => {
    const empty = createEmptyDesign({ name: 'x', nominalVoltageV: 12, profile: 'marine' })
    const hostile: Design = {
      ...empty,
      parts: [makePart(empty.settings, 'load', 'l1', '<script>alert("&")</script>', { x: 0, y: 0 })],
    }
    const out = renderDiagramSvg(hostile, analyzeDesign(hostile), { titleBlock: { ...titleBlock, client: 'A & B <Ltd>' } })
    expect(xmlWellFormedError(out)).toBeNull()
    expect(out).not.toContain('<script>')
    const blank = renderDiagramSvg(empty, analyzeDesign(empty), { titleBlock })
    expect(xmlWellFormedError(blank)).toBeNull()
    expect(blank).toContain('This design has no parts yet.')
  })

  it('draws a conductor between the terminals it names', () => {
    const empty = createEmptyDesign({ name: 'two parts', nominalVoltageV: 12, profile: 'vehicle' })
    const design: Design = {
      ...empty,
      parts: [makePart(empty.settings, 'battery', 'b', 'Bank', { x: 0, y: 0 }), makePart(empty.settings, 'load', 'l', 'Lamp', { x: 400, y: 0 })],
      conductors: [makeConductor('c1', 'feed', 'b.pos', 'l.pos', 'awg-10', 3), makeConductor('c2', 'return', 'l.neg', 'b.neg', 'awg-10', 3)],
    }
    const out = renderDiagramSvg(design, analyzeDesign(design), { titleBlock })
    const lines = [...out.matchAll(/<polyline points="([^"]+)"[^>]*stroke="(#[0-9a-f]+)"/g)]
    expect(lines.length).toBeGreaterThanOrEqual(2)
    // Positive run red, negative run dark (dashed).
    expect(lines.some((l) => l[2] === '#c62828')).toBe(true)
    expect(out).toContain('stroke-dasharray')
    expect(textOf(out)).toContain('10 AWG · 3 m')
  })
})
