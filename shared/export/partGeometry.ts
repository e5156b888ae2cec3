import { partTerminals, type TerminalInfo } from '../design/catalogue'
import type { Part, PartType } from '../design/schema'

// Boxes and terminal positions of parts on the exported diagram: terminals spread along the side the
// catalogue gives them, one pitch apart, so a part drawn at its editor position keeps its wiring.

const PITCH = 32
const MIN_HEIGHT = 80
const MIN_WIDTH = 144

export interface PlacedTerminal extends TerminalInfo {
  /** Absolute drawing coordinates. */
  x: number
  y: number
}

export interface PartBox {
  part: Part
  x: number
  y: number
  width: number
  height: number
  terminals: Map<string, PlacedTerminal>
}

function spread(count: number, length: number): number[] {
  const start = (length - (count - 1) * PITCH) / 2
  return Array.from({ length: count }, (_, i) => start + i * PITCH)
}

export function partBox(part: Part): PartBox {
  const terminals = partTerminals(part as { type: PartType; params: unknown })
  const sides: Record<TerminalInfo['side'], TerminalInfo[]> = { left: [], right: [], top: [], bottom: [] }
  for (const t of terminals) sides[t.side].push(t)
  const width = Math.max(MIN_WIDTH, (Math.max(sides.top.length, sides.bottom.length) + 1) * PITCH)
  const height = Math.max(MIN_HEIGHT, (Math.max(sides.left.length, sides.right.length) + 1) * PITCH)
  const { x, y } = part.position
  const placed = new Map<string, PlacedTerminal>()
  sides.left.forEach((t, i) => placed.set(t.id, { ...t, x, y: y + spread(sides.left.length, height)[i] }))
  sides.right.forEach((t, i) => placed.set(t.id, { ...t, x: x + width, y: y + spread(sides.right.length, height)[i] }))
  sides.top.forEach((t, i) => placed.set(t.id, { ...t, x: x + spread(sides.top.length, width)[i], y }))
  sides.bottom.forEach((t, i) => placed.set(t.id, { ...t, x: x + spread(sides.bottom.length, width)[i], y: y + height }))
  return { part, x, y, width, height, terminals: placed }
}

/** One step out of the box from a terminal, in the direction of its side. */
export function stubOf(t: PlacedTerminal, length = 16): [number, number] {
  switch (t.side) {
    case 'left':
      return [t.x - length, t.y]
    case 'right':
      return [t.x + length, t.y]
    case 'top':
      return [t.x, t.y - length]
    case 'bottom':
      return [t.x, t.y + length]
  }
}
