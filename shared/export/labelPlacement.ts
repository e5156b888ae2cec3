import type { Point } from './diagramPrimitives'

/** An axis-aligned rectangle on the drawing. */
export interface Rect {
  x: number
  y: number
  w: number
  h: number
}

/**
 * Where a conductor's label goes: its text baseline centre and the rectangle its backing covers; for a
 * label moved away from its conductor (no room beside it), the point on the conductor a leader line
 * should join it to.
 */
export interface LabelSpot {
  x: number
  y: number
  rect: Rect
  leaderTo?: Point
}

interface Candidate {
  x: number
  y: number
  anchor: Point
  /** 0 beside the conductor, 1… further away (needs a leader line). */
  ring: number
}

/** How far a label may be moved from its conductor, in steps of one label height. */
export const LABEL_RINGS = 8

/** A label's height and how far its backing reaches above the text baseline the spot gives. */
export interface LabelMetrics {
  heightPx: number
  ascentPx: number
}

/** The exported drawing's 9 px labels. */
export const EXPORT_LABEL: LabelMetrics = { heightPx: 11, ascentPx: 8 }
/** Gap kept between a label and a part box or another label. */
const CLEARANCE = 2

const overlaps = (a: Rect, b: Rect) =>
  a.x < b.x + b.w + CLEARANCE && b.x < a.x + a.w + CLEARANCE && a.y < b.y + b.h + CLEARANCE && b.y < a.y + a.h + CLEARANCE

/** Area of `rect` (grown by the clearance) lying over the given rectangles. */
function coveredArea(rect: Rect, others: readonly Rect[]): number {
  let area = 0
  for (const o of others) {
    if (!overlaps(rect, o)) continue
    const w = Math.min(rect.x + rect.w + CLEARANCE, o.x + o.w) - Math.max(rect.x - CLEARANCE, o.x)
    const h = Math.min(rect.y + rect.h + CLEARANCE, o.y + o.h) - Math.max(rect.y - CLEARANCE, o.y)
    area += Math.max(w, 0.01) * Math.max(h, 0.01)
  }
  return area
}

/** The label of width `w` centred on its baseline point (x, y): its backing rectangle. */
function rectAt(x: number, y: number, w: number, extraRight: number, m: LabelMetrics): Rect {
  return { x: x - w / 2, y: y - m.ascentPx, w: w + extraRight, h: m.heightPx }
}

/**
 * Candidate spots along a routed conductor, best first: beside the middle of each segment (longest
 * segment first; above or below a horizontal one, right or left of a vertical one), then a quarter
 * and three quarters along it; then the same moved further out, ring by ring.
 */
function candidates(points: Point[], w: number, m: LabelMetrics): Candidate[] {
  const segments: { x1: number; y1: number; x2: number; y2: number; length: number; index: number }[] = []
  for (let i = 1; i < points.length; i++) {
    const [x1, y1] = points[i - 1]
    const [x2, y2] = points[i]
    const length = Math.hypot(x2 - x1, y2 - y1)
    if (length > 0) segments.push({ x1, y1, x2, y2, length, index: i })
  }
  // Longest first; equal lengths keep route order (deterministic output).
  segments.sort((a, b) => b.length - a.length || a.index - b.index)
  const spots: Candidate[] = []
  // Above a horizontal run the backing ends 1 px over the line; below it, it starts 4 px under it.
  const above = m.heightPx - m.ascentPx + 1
  const below = m.ascentPx + 4
  for (let ring = 0; ring < LABEL_RINGS; ring++) {
    const out = ring * (m.heightPx + 1)
    for (const share of [0.5, 0.25, 0.75]) {
      for (const s of segments) {
        const x = s.x1 + (s.x2 - s.x1) * share
        const y = s.y1 + (s.y2 - s.y1) * share
        const anchor: Point = [x, y]
        if (Math.abs(s.y2 - s.y1) < 1e-6) spots.push({ x, y: y - above - out, anchor, ring }, { x, y: y + below + out, anchor, ring })
        else spots.push({ x: x + w / 2 + 3 + out, y, anchor, ring }, { x: x - w / 2 - 3 - out, y, anchor, ring })
      }
    }
  }
  return spots
}

/**
 * Places one conductor label of width `w` (plus `extraRight` for its finding marks) where it covers
 * no part box and no label placed before it, nearest its conductor first; when every candidate is
 * taken, the one covering the least of parts and other labels. The chosen
 * rectangle is added to `taken`. Greedy, in the order called: the same design gives the same drawing.
 */
export function placeLabel(points: Point[], w: number, extraRight: number, boxes: readonly Rect[], taken: Rect[], metrics: LabelMetrics = EXPORT_LABEL): LabelSpot {
  const spots = candidates(points, w, metrics)
  if (spots.length === 0) spots.push({ x: points[0][0], y: points[0][1] - (metrics.heightPx - metrics.ascentPx + 1), anchor: points[0], ring: 0 })
  // The first free spot; when none is free, the one covering the least, a label over another label
  // (two texts unreadable) counting double a label over a part.
  let chosen = spots[0]
  let best = Infinity
  for (const spot of spots) {
    const rect = rectAt(spot.x, spot.y, w, extraRight, metrics)
    const cost = coveredArea(rect, boxes) + 2 * coveredArea(rect, taken)
    if (cost < best) {
      best = cost
      chosen = spot
      if (cost === 0) break
    }
  }
  const rect = rectAt(chosen.x, chosen.y, w, extraRight, metrics)
  taken.push(rect)
  return chosen.ring > 0 ? { x: chosen.x, y: chosen.y, rect, leaderTo: chosen.anchor } : { x: chosen.x, y: chosen.y, rect }
}
