import type { Design, PartType } from '@shared/design/schema'
import { GRID_PX, nodeGeometry } from './nodeGeometry'

// Auto-arrange and align. Auto-arrange is a simple layered layout by topology: energy comes in on
// the left (array, chargers), the bank sits in the middle, distribution and loads run to the right.

type Position = { x: number; y: number }

const UPSTREAM: ReadonlySet<PartType> = new Set(['pv-array', 'charge-controller', 'dc-dc-charger', 'mains-charger'])
const COLUMN_GAP_PX = 96
const ROW_GAP_PX = 32

const snap = (value: number) => Math.round(value / GRID_PX) * GRID_PX

export function autoArrange(design: Design): Record<string, Position> {
  const neighbours = new Map<string, Set<string>>(design.parts.map((p) => [p.id, new Set<string>()]))
  for (const c of design.conductors) {
    if (c.from.partId === c.to.partId) continue
    neighbours.get(c.from.partId)?.add(c.to.partId)
    neighbours.get(c.to.partId)?.add(c.from.partId)
  }
  const typeOf = new Map(design.parts.map((p) => [p.id, p.type]))

  // Hop distance from the nearest battery; parts that bring energy in go to the bank's left.
  const layer = new Map<string, number>()
  const queue = design.parts.filter((p) => p.type === 'battery').map((p) => p.id)
  for (const id of queue) layer.set(id, 0)
  for (let i = 0; i < queue.length; i++) {
    const id = queue[i]
    const here = layer.get(id) ?? 0
    for (const next of neighbours.get(id) ?? []) {
      if (layer.has(next)) continue
      const upstream = UPSTREAM.has(typeOf.get(next)!) || here < 0
      layer.set(next, upstream ? -(Math.abs(here) + 1) : here + 1)
      queue.push(next)
    }
  }
  // Parts not connected to any bank: a column of their own on the far right.
  const maxLayer = Math.max(0, ...layer.values())
  for (const part of design.parts) if (!layer.has(part.id)) layer.set(part.id, maxLayer + 1)

  const columns = new Map<number, string[]>()
  for (const part of design.parts) {
    const l = layer.get(part.id)!
    columns.set(l, [...(columns.get(l) ?? []), part.id])
  }
  const sortedLayers = [...columns.keys()].sort((a, b) => a - b)
  const positions: Record<string, Position> = {}
  const byId = new Map(design.parts.map((p) => [p.id, p]))
  const rowOf = new Map<string, number>()
  let x = 0
  for (const l of sortedLayers) {
    const ids = columns.get(l)!
    // Order each column by the mean row of its already-placed neighbours (one barycentre pass).
    const key = (id: string) => {
      const placed = [...(neighbours.get(id) ?? [])].filter((n) => rowOf.has(n)).map((n) => rowOf.get(n)!)
      return placed.length ? placed.reduce((a, b) => a + b, 0) / placed.length : Number.MAX_SAFE_INTEGER
    }
    ids.sort((a, b) => key(a) - key(b) || a.localeCompare(b))
    let y = 0
    let width = 0
    for (const id of ids) {
      const geometry = nodeGeometry(byId.get(id)!)
      positions[id] = { x: snap(x), y: snap(y) }
      rowOf.set(id, y + geometry.height / 2)
      y += geometry.height + ROW_GAP_PX
      width = Math.max(width, geometry.width)
    }
    x += width + COLUMN_GAP_PX
  }
  return positions
}

export type AlignMode = 'left' | 'centre' | 'right' | 'top' | 'middle' | 'bottom' | 'spread-x' | 'spread-y'

interface Box {
  id: string
  x: number
  y: number
  width: number
  height: number
}

export function align(design: Design, ids: readonly string[], mode: AlignMode): Record<string, Position> {
  const wanted = new Set(ids)
  const boxes: Box[] = design.parts
    .filter((p) => wanted.has(p.id))
    .map((p) => ({ id: p.id, ...p.position, ...nodeGeometry(p) }))
  if (boxes.length < 2) return {}
  const minX = Math.min(...boxes.map((b) => b.x))
  const maxX = Math.max(...boxes.map((b) => b.x + b.width))
  const minY = Math.min(...boxes.map((b) => b.y))
  const maxY = Math.max(...boxes.map((b) => b.y + b.height))
  const out: Record<string, Position> = {}
  const put = (b: Box, x: number, y: number) => (out[b.id] = { x: snap(x), y: snap(y) })
  if (mode === 'spread-x' || mode === 'spread-y') {
    const horizontal = mode === 'spread-x'
    const sorted = [...boxes].sort((a, b) => (horizontal ? a.x - b.x : a.y - b.y))
    const total = sorted.reduce((sum, b) => sum + (horizontal ? b.width : b.height), 0)
    const gap = ((horizontal ? maxX - minX : maxY - minY) - total) / (sorted.length - 1)
    let cursor = horizontal ? minX : minY
    for (const b of sorted) {
      if (horizontal) put(b, cursor, b.y)
      else put(b, b.x, cursor)
      cursor += (horizontal ? b.width : b.height) + Math.max(gap, GRID_PX)
    }
    return out
  }
  for (const b of boxes) {
    if (mode === 'left') put(b, minX, b.y)
    else if (mode === 'right') put(b, maxX - b.width, b.y)
    else if (mode === 'centre') put(b, (minX + maxX) / 2 - b.width / 2, b.y)
    else if (mode === 'top') put(b, b.x, minY)
    else if (mode === 'bottom') put(b, b.x, maxY - b.height)
    else put(b, b.x, (minY + maxY) / 2 - b.height / 2)
  }
  return out
}
