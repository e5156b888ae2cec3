// Conductor labels on the exported drawing: placed where they cover no part (terminal names are
// drawn inside the part boxes) and no other label, moved out with a leader line when a run is
// too short to carry its label beside it.
import { describe, expect, it } from 'vitest'
import { analyzeDesign } from '../../../shared/analysis'
import { makeConductor, makePart } from '../../../shared/design/builder'
import { createDemoDesign, createEmptyDesign } from '../../../shared/design/demo'
import type { Design } from '../../../shared/design/schema'
import { buildDiagramModel } from '../../../shared/export/diagramModel'
import type { Primitive } from '../../../shared/export/diagramPrimitives'
import { placeLabel, type Rect } from '../../../shared/export/labelPlacement'

const titleBlock = { project: 'Label check', client: 'Test', revision: 'A', date: '2026-12-02', designer: 'Test' }
type RectPrimitive = Extract<Primitive, { kind: 'rect' }>
const isRect = (p: Primitive): p is RectPrimitive => p.kind === 'rect'
const overlap = (a: Rect, b: Rect) => a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h

/** Part boxes (rounded, outlined) and label backings (white, no outline) of a design's drawing. */
function drawing(design: Design) {
  const model = buildDiagramModel(design, analyzeDesign(design), { titleBlock })
  const rects = model.primitives.filter(isRect)
  return {
    model,
    boxes: rects.filter((r) => r.radius === 4),
    labels: rects.filter((r) => r.strokeWidth === 0 && r.fill === '#ffffff'),
  }
}

describe('conductor label placement on the exported drawing', () => {
  it('demo design: no label covers a part or another label', () => {
    const demo = createDemoDesign()
    const { boxes, labels } = drawing(demo)
    expect(labels).toHaveLength(demo.conductors.length)
    for (const [i, label] of labels.entries()) {
      for (const box of boxes) expect(overlap(label, box), `label ${i} over a part box`).toBe(false)
      for (const other of labels.slice(i + 1)) expect(overlap(label, other), `label ${i} over another label`).toBe(false)
    }
  })

  it('a run too short for its label: the label moves clear of both parts, with a leader back to the run', () => {
    const empty = createEmptyDesign({ name: 'short run', nominalVoltageV: 12, profile: 'vehicle' })
    // Fuse and switch side by side, 40 px apart: the 0.1 m link between them cannot hold "2/0 AWG · 0.1 m".
    const design: Design = {
      ...empty,
      parts: [
        makePart(empty.settings, 'battery', 'bank', 'Bank', { x: 0, y: 200 }),
        makePart(empty.settings, 'fuse', 'f', 'Main fuse', { x: 0, y: 0 }, { family: 'class-t', ratingA: 200, interruptingRatingA: 20000, dcVoltageRatingV: 125 }),
        makePart(empty.settings, 'battery-switch', 's', 'Switch', { x: 200, y: 0 }),
      ],
      conductors: [makeConductor('link', 'Link', 'f.load', 's.a', 'awg-2/0', 0.1)],
    }
    const { model, boxes, labels } = drawing(design)
    expect(labels).toHaveLength(1)
    for (const box of boxes) expect(overlap(labels[0], box)).toBe(false)
    const leaders = model.primitives.filter((p) => p.kind === 'line' && p.strokeWidth === 0.6)
    expect(leaders).toHaveLength(1)
  })

  it('placeLabel: beside the middle of the longest segment when it is free, and records what it took', () => {
    const taken: Rect[] = []
    // An L-shaped run: 100 px across, then 300 px down; the label goes right of the long vertical leg.
    const spot = placeLabel([[0, 0], [100, 0], [100, 300]], 60, 0, [], taken)
    expect(spot).toMatchObject({ x: 100 + 30 + 3, y: 150 })
    expect(spot.leaderTo).toBeUndefined()
    expect(taken).toEqual([spot.rect])
    // The same run again: that spot is taken, so the second label goes left of the leg.
    const second = placeLabel([[0, 0], [100, 0], [100, 300]], 60, 0, [], taken)
    expect(second).toMatchObject({ x: 100 - 30 - 3, y: 150 })
  })
})
