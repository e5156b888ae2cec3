// One geometry for the canvas and the export: the exported diagram draws every part with the editor's box
// and terminal offsets (shared/design/nodeGeometry), so parts placed edge to edge on the canvas do not
// overlap on paper, and every text drawn in a part stays inside its box.
import { describe, expect, it } from 'vitest'
import { analyzeDesign } from '../../../shared/analysis'
import { makePart } from '../../../shared/design/builder'
import { createDemoDesign, createEmptyDesign } from '../../../shared/design/demo'
import { GRID_PX, nodeGeometry } from '../../../shared/design/nodeGeometry'
import { PART_TYPES, type Design, type Part } from '../../../shared/design/schema'
import { buildDiagramModel } from '../../../shared/export/diagramModel'
import { fitText, textWidth, wrapTextLines, type Primitive } from '../../../shared/export/diagramPrimitives'
import { partBox } from '../../../shared/export/partGeometry'
import { nodeGeometry as editorNodeGeometry } from '../../../src/components/editor/model/nodeGeometry'

const titleBlock = { project: 'Tight van', client: '', revision: '1', date: '2026-12-02', designer: 'T. Tester' }
const empty = createEmptyDesign({ name: 'tight', nominalVoltageV: 12, profile: 'vehicle' })
const everyType = PART_TYPES.map((type, i) => makePart(empty.settings, type, `p${i}`, `Part ${i}`, { x: 0, y: 0 }))

/** Every part type in a row, each box touching the next (the tightest layout the grid allows). */
function edgeToEdge(labelOf: (type: string, i: number) => string): Design {
  let x = 0
  const parts: Part[] = PART_TYPES.map((type, i) => {
    const part = makePart(empty.settings, type, `p${i}`, labelOf(type, i), { x, y: 0 })
    x += nodeGeometry(part).width
    return part
  })
  return { ...empty, parts }
}

/** Horizontal and vertical extent of a primitive (text by the same width estimate the layout uses). */
function extent(p: Primitive): { left: number; right: number; top: number; bottom: number } {
  switch (p.kind) {
    case 'rect': return { left: p.x, right: p.x + p.w, top: p.y, bottom: p.y + p.h }
    case 'circle': return { left: p.cx - p.r, right: p.cx + p.r, top: p.cy - p.r, bottom: p.cy + p.r }
    case 'line': {
      const xs = p.points.map(([x]) => x), ys = p.points.map(([, y]) => y)
      return { left: Math.min(...xs), right: Math.max(...xs), top: Math.min(...ys), bottom: Math.max(...ys) }
    }
    case 'text': {
      const w = textWidth(p.text, p.size)
      const left = p.anchor === 'middle' ? p.x - w / 2 : p.anchor === 'end' ? p.x - w : p.x
      return { left, right: left + w, top: p.y - p.size * 0.75, bottom: p.y }
    }
  }
}

describe('one part geometry for the editor and the export', () => {
  it('the editor module re-exports the shared one', () => {
    expect(editorNodeGeometry).toBe(nodeGeometry)
  })

  it('the export places each part type with the editor box and terminal offsets (every type, demo parts)', () => {
    for (const part of [...everyType, ...createDemoDesign().parts]) {
      const node = nodeGeometry(part)
      const box = partBox({ ...part, position: { x: 160, y: 48 } })
      expect({ width: box.width, height: box.height }).toEqual({ width: node.width, height: node.height })
      for (const t of node.terminals) expect(box.terminals.get(t.id)).toMatchObject({ x: 160 + t.x, y: 48 + t.y, side: t.side })
    }
  })

  it('puts terminals on the 16 px grid so parts on the grid line up', () => {
    for (const part of everyType) {
      const { width, height, terminals } = nodeGeometry(part)
      expect(width % GRID_PX).toBe(0)
      for (const t of terminals) expect([t.x % GRID_PX, t.y % GRID_PX]).toEqual([0, 0])
      expect(terminals.every((t) => t.x >= 0 && t.x <= width && t.y >= 0 && t.y <= height)).toBe(true)
    }
  })
})

describe('texts inside the exported part boxes', () => {
  const long = 'Starboard engine-room house bank isolation and distribution panel with spare ways'
  const design = edgeToEdge((_type, i) => (i % 2 ? long : `Unbroken${'x'.repeat(40)}`))
  const model = buildDiagramModel(design, analyzeDesign(design), { titleBlock })
  const boxes = model.primitives.filter((p): p is Extract<Primitive, { kind: 'rect' }> => p.kind === 'rect' && p.stroke === '#1f2933' && p.radius === 4)

  it('draws edge-to-edge parts without overlapping boxes', () => {
    expect(boxes).toHaveLength(PART_TYPES.length)
    const sorted = [...boxes].sort((a, b) => a.x - b.x)
    for (let i = 1; i < sorted.length; i++) expect(sorted[i].x).toBeGreaterThanOrEqual(sorted[i - 1].x + sorted[i - 1].w - 1e-9)
  })

  it('keeps every title, rating and terminal label inside its part box', () => {
    const texts = model.primitives.filter((p): p is Extract<Primitive, { kind: 'text' }> => p.kind === 'text')
    for (const box of boxes) {
      const inside = texts.filter((t) => t.x > box.x && t.x < box.x + box.w && t.y > box.y && t.y < box.y + box.h && t.fill !== '#ffffff')
      expect(inside.length).toBeGreaterThanOrEqual(2) // title and rating at least
      for (const t of inside) {
        const e = extent(t)
        expect(e.left, `"${t.text}"`).toBeGreaterThanOrEqual(box.x)
        expect(e.right, `"${t.text}"`).toBeLessThanOrEqual(box.x + box.w)
      }
    }
    const titles = texts.filter((t) => t.bold && t.size === 10.5)
    expect(titles.some((t) => t.text.endsWith('…'))).toBe(true)
  })
})

describe('fitText and wrapTextLines', () => {
  it('keeps text that fits and cuts the rest with an ellipsis', () => {
    expect(fitText('40 A', 9, 100)).toBe('40 A')
    const cut = fitText('LFP 4S2P × 3.2 V 280 Ah and more words', 9, 60) // 60 / (9 × 0.55) ≈ 12 characters
    expect(cut.endsWith('…')).toBe(true)
    expect(textWidth(cut, 9)).toBeLessThanOrEqual(60)
    expect(fitText('abc', 9, 2)).toBe('')
  })

  it('wraps to two lines and marks the cut on the second', () => {
    const lines = wrapTextLines('one two three four five six seven eight nine ten', 10, 60, 2)
    expect(lines).toHaveLength(2)
    // 10 px text at 0.55 em: 5.5 units a character, so 60 units hold 10 characters ("one two three" would be 71.5).
    expect(lines).toEqual(['one two', 'three fou…'])
    for (const line of lines) expect(textWidth(line, 10)).toBeLessThanOrEqual(60)
  })
})
