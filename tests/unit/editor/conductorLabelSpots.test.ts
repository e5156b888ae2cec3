// Conductor labels on the canvas: the route read back from the canvas library's path, the label
// widths against those Chromium laid out, and placement that keeps labels off parts and each other.
import { describe, expect, it } from 'vitest'
import { Position, getSmoothStepPath } from '@vue-flow/core'
import type { Rect } from '@shared/export/labelPlacement'
import { CANVAS_LABEL, labelWidthPx, placeCanvasLabels, routeOfStepPath, type LabelEntry } from '@/components/editor/model/conductorLabelSpots'

const step = (sx: number, sy: number, tx: number, ty: number, sourcePosition = Position.Right, targetPosition = Position.Left) =>
  getSmoothStepPath({ sourceX: sx, sourceY: sy, targetX: tx, targetY: ty, sourcePosition, targetPosition, borderRadius: 6, offset: 16 })[0]

const overlap = (a: Rect, b: Rect) => a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h
const labelRect = (x: number, y: number, w: number): Rect => ({ x: x - w / 2, y: y - CANVAS_LABEL.heightPx / 2, w, h: CANVAS_LABEL.heightPx })

describe('route of a drawn conductor', () => {
  it('reads the corners of the library’s orthogonal path, ends included', () => {
    const route = routeOfStepPath(step(100, 40, 300, 120))
    expect(route[0]).toEqual([100, 40])
    expect(route.at(-1)).toEqual([300, 120])
    // Every leg is horizontal or vertical.
    for (let i = 1; i < route.length; i++) expect(route[i][0] === route[i - 1][0] || route[i][1] === route[i - 1][1]).toBe(true)
    expect(route.length).toBeGreaterThanOrEqual(4)
  })

  it('reads a straight run and a run that doubles back', () => {
    expect(routeOfStepPath(step(0, 50, 200, 50))).toEqual([[0, 50], [200, 50]])
    const back = routeOfStepPath(step(300, 40, 100, 200))
    expect(back[0]).toEqual([300, 40])
    expect(back.at(-1)).toEqual([100, 200])
    expect(back.length).toBeGreaterThan(4)
  })

  it('gives nothing for a path of another form', () => {
    expect(routeOfStepPath('')).toEqual([])
    expect(routeOfStepPath('M0 0 C 10 10 20 20 30 30')).toEqual([])
  })
})

describe('label width', () => {
  // Widths Chromium laid out for the demo's labels (10 px text, 1 px border, 5 px padding, 4 px gaps).
  it.each([
    [['0 A', '0 %'], 46],
    [['1.20 A', '0.110 %'], 79],
  ])('estimates %j within a few pixels of %i px, never narrower', (texts, measuredPx) => {
    const w = labelWidthPx(texts, false)
    expect(w).toBeGreaterThanOrEqual(measuredPx)
    expect(w).toBeLessThan(measuredPx + 6)
  })
})

describe('placement', () => {
  // A fuse panel with six ways 32 px apart on its right side, feeding six loads stacked the other
  // way round: all six conductors have the same middle, where their labels would lie on each other.
  const panel: Rect = { x: 0, y: 0, w: 160, h: 224 }
  const loads: Rect[] = [0, 1, 2, 3, 4, 5].map((k) => ({ x: 420, y: 200 - 32 * k - 14, w: 140, h: 28 }))
  const entries = new Map<string, LabelEntry>()
  const order: string[] = []
  const middles: Rect[] = []
  for (let k = 0; k < 6; k++) {
    const id = `way-${k}`
    const [path, midX, midY] = getSmoothStepPath({ sourceX: 160, sourceY: 32 + 32 * k, targetX: 420, targetY: 200 - 32 * k, sourcePosition: Position.Right, targetPosition: Position.Left, borderRadius: 6, offset: 16 })
    order.push(id)
    entries.set(id, { points: routeOfStepPath(path), widthPx: labelWidthPx(['1.61 A', '0.248 %'], false) })
    middles.push(labelRect(midX, midY, entries.get(id)!.widthPx))
  }
  const boxes = [panel, ...loads]
  const spots = placeCanvasLabels(entries, order, boxes)

  it('is needed here: at their middles the labels would cover each other', () => {
    expect(overlap(middles[0], middles[1])).toBe(true)
  })

  it('places every label clear of the parts and of each other', () => {
    expect(spots.size).toBe(6)
    const rects = order.map((id) => labelRect(spots.get(id)!.x, spots.get(id)!.y, entries.get(id)!.widthPx))
    for (const [i, r] of rects.entries()) {
      for (const box of boxes) expect(overlap(r, box), `${order[i]} over a part`).toBe(false)
      for (const other of rects.slice(i + 1)) expect(overlap(r, other), `${order[i]} over another label`).toBe(false)
    }
  })

  it('ties a label moved away from its conductor back to it, and no other', () => {
    for (const id of order) {
      const spot = spots.get(id)!
      if (!spot.leaderTo) continue
      expect(spot.leaderFrom).toBeDefined()
      // The leader ends on the conductor's route.
      const route = entries.get(id)!.points
      const onRoute = route.slice(1).some(([x, y], i) => {
        const [px, py] = route[i]
        return (x === px && x === spot.leaderTo![0] && spot.leaderTo![1] >= Math.min(y, py) && spot.leaderTo![1] <= Math.max(y, py)) ||
          (y === py && y === spot.leaderTo![1] && spot.leaderTo![0] >= Math.min(x, px) && spot.leaderTo![0] <= Math.max(x, px))
      })
      expect(onRoute).toBe(true)
    }
  })

  it('leaves a lone conductor’s label beside its middle and gives the same answer each time', () => {
    const lone = new Map([['w', { points: routeOfStepPath(step(0, 0, 400, 0)), widthPx: 80 }]])
    const spot = placeCanvasLabels(lone, ['w'], [])
    expect(spot.get('w')!.leaderTo).toBeUndefined()
    expect(spot.get('w')!.x).toBeCloseTo(200)
    expect(Math.abs(spot.get('w')!.y)).toBeLessThan(CANVAS_LABEL.heightPx)
    expect(placeCanvasLabels(entries, order, boxes)).toEqual(spots)
  })
})
