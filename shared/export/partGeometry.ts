import type { TerminalInfo } from '../design/catalogue'
import { nodeGeometry } from '../design/nodeGeometry'
import type { Part } from '../design/schema'

// Boxes and terminal positions of parts on the exported diagram: the editor's own geometry
// (shared/design/nodeGeometry) placed at the part's editor position, so the export matches the canvas.

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

export function partBox(part: Part): PartBox {
  const { width, height, terminals } = nodeGeometry(part)
  const { x, y } = part.position
  const placed = new Map<string, PlacedTerminal>(terminals.map((t) => [t.id, { ...t, x: x + t.x, y: y + t.y }]))
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
