import { LABEL_RINGS, placeLabel, type LabelMetrics, type Rect } from '@shared/export/labelPlacement'
import type { Point } from '@shared/export/diagramPrimitives'

// Where each conductor's label goes on the canvas: beside its run where it covers no part and no
// other label, else moved out with a leader line, by the same greedy placement as the exported
// drawing. Without it, the labels of conductors leaving neighbouring terminals (the ways of a fuse
// panel, the studs of a bus bar) lie on top of each other.

/** The canvas label: 10 px text in a 1 px border and 1 px padding, centred on its spot. */
export const CANVAS_LABEL: LabelMetrics = { heightPx: 16, ascentPx: 12 }

/** Above this many labels in view the labels stay at their conductors' middles: placing them would
 * cost more per frame than it helps at a zoom where most of them are a few pixels wide anyway. */
export const MAX_PLACED_LABELS = 150

export interface LabelEntry {
  /** The conductor's route on the canvas, corner by corner. */
  points: Point[]
  widthPx: number
}

/** Centre of the label; `leaderFrom`/`leaderTo`: a line from the label's edge back to its conductor. */
export interface CanvasLabelSpot {
  x: number
  y: number
  leaderFrom?: Point
  leaderTo?: Point
}

/** Advance of one character of the 10 px label text, px: measured in Chromium on the demo's labels
 * ("1.20 A" 29 px, "0.110 %" 35 px, "0 A" 15 px: 4.8–5.0 px), rounded up so estimates err wide. */
const CHAR_PX = 5.1
const GAP_PX = 4
/** Padding 5 px and border 1 px on each side. */
const PADDING_PX = 12
const MARK_PX = 13

/** Width of a label showing `texts` side by side, with a finding mark in front when `marked`. */
export function labelWidthPx(texts: readonly string[], marked: boolean): number {
  const chars = texts.reduce((n, t) => n + t.length, 0)
  const items = texts.length + (marked ? 1 : 0)
  return chars * CHAR_PX + (marked ? MARK_PX : 0) + Math.max(items - 1, 0) * GAP_PX + PADDING_PX
}

const NUMBER = String.raw`(-?[\d.]+(?:e-?\d+)?)`
const START = new RegExp(String.raw`^\s*M\s*${NUMBER}[\s,]+${NUMBER}`)
const CORNER = new RegExp(String.raw`Q\s*${NUMBER}[\s,]+${NUMBER}`, 'g')
const END = new RegExp(String.raw`L\s*${NUMBER}[\s,]+${NUMBER}\s*$`)

/**
 * The corners of an orthogonal path as the canvas library draws it ("M x y", then "L … Q cx,cy …"
 * per rounded corner, whose control point is the corner itself, then "L x y"). Empty when the path
 * is not of that form.
 */
export function routeOfStepPath(path: string): Point[] {
  const start = START.exec(path)
  const end = END.exec(path)
  if (!start || !end) return []
  const points: Point[] = [[Number(start[1]), Number(start[2])]]
  for (const corner of path.matchAll(CORNER)) points.push([Number(corner[1]), Number(corner[2])])
  points.push([Number(end[1]), Number(end[2])])
  return points.every(([x, y]) => Number.isFinite(x) && Number.isFinite(y)) ? points : []
}

const intersects = (a: Rect, b: Rect) => a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h

/** The area a label of this entry could end up in: its route grown by the farthest ring. */
function reachOf(entry: LabelEntry): Rect {
  const reach = entry.widthPx + LABEL_RINGS * (CANVAS_LABEL.heightPx + 1)
  const xs = entry.points.map((p) => p[0])
  const ys = entry.points.map((p) => p[1])
  const x = Math.min(...xs) - reach
  const y = Math.min(...ys) - reach
  return { x, y, w: Math.max(...xs) + reach - x, h: Math.max(...ys) + reach - y }
}

/**
 * Places the labels in `order` (the design's conductor order, so the same drawing gives the same
 * result) against the part boxes. Each label is checked only against the boxes and labels within
 * its reach.
 */
export function placeCanvasLabels(entries: ReadonlyMap<string, LabelEntry>, order: readonly string[], boxes: readonly Rect[]): Map<string, CanvasLabelSpot> {
  const spots = new Map<string, CanvasLabelSpot>()
  const taken: Rect[] = []
  for (const id of order) {
    const entry = entries.get(id)
    if (!entry || entry.points.length < 2) continue
    const reach = reachOf(entry)
    const nearTaken = taken.filter((r) => intersects(r, reach))
    const spot = placeLabel(entry.points, entry.widthPx, 0, boxes.filter((b) => intersects(b, reach)), nearTaken, CANVAS_LABEL)
    taken.push(spot.rect)
    const centre: Point = [spot.rect.x + spot.rect.w / 2, spot.rect.y + spot.rect.h / 2]
    if (!spot.leaderTo) {
      spots.set(id, { x: centre[0], y: centre[1] })
      continue
    }
    // From the side of the label facing the conductor.
    const [tx, ty] = spot.leaderTo
    const { rect } = spot
    const from: Point = [Math.min(Math.max(tx, rect.x), rect.x + rect.w), Math.min(Math.max(ty, rect.y), rect.y + rect.h)]
    spots.set(id, { x: centre[0], y: centre[1], leaderFrom: from, leaderTo: spot.leaderTo })
  }
  return spots
}

export function sameSpot(a: CanvasLabelSpot, b: CanvasLabelSpot): boolean {
  return a.x === b.x && a.y === b.y && a.leaderTo?.[0] === b.leaderTo?.[0] && a.leaderTo?.[1] === b.leaderTo?.[1]
}
