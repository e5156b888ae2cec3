import { partTerminals, type TerminalInfo } from './catalogue'
import type { Part, PartType } from './schema'

// Where each terminal sits on a part's box — the one source of truth for the editor's canvas and the
// exported diagram, so a layout that is tidy in the editor is tidy on paper. Sizes are in canvas
// pixels on a 16 px grid so that terminals of parts placed on the grid line up and conductors run straight.

export const GRID_PX = 16
const PITCH_PX = 32
const MIN_HEIGHT_PX = 80
const NODE_WIDTH_PX = 144
/** Width of one character of a 9.5 px terminal label, px (generous). */
const LABEL_CHAR_PX = 6
/** Room between the left and right terminal labels for the symbol and the rating, px. */
const BODY_WIDTH_PX = 96

export interface PlacedTerminal extends TerminalInfo {
  /** Offset from the node's top-left corner, px. */
  x: number
  y: number
}

export interface NodeGeometry {
  width: number
  height: number
  terminals: PlacedTerminal[]
}

type Side = TerminalInfo['side']

function spread(count: number, length: number): number[] {
  // Centre the row of terminals on the side, one pitch apart, on the grid.
  const span = (count - 1) * PITCH_PX
  const start = Math.round((length - span) / 2 / GRID_PX) * GRID_PX
  return Array.from({ length: count }, (_, i) => start + i * PITCH_PX)
}

/**
 * The box of a part and its terminals (offsets from the box's top-left corner).
 * @example nodeGeometry({ type: 'fuse', params }) // { width: 144, height: 80, terminals: [{ id: 'in', side: 'left', x: 0, y: 32, … }, …] }
 */
export function nodeGeometry(part: Pick<Part, 'type' | 'params'>): NodeGeometry {
  const terminals = partTerminals(part as { type: PartType; params: unknown })
  const bySide: Record<Side, TerminalInfo[]> = { left: [], right: [], top: [], bottom: [] }
  for (const term of terminals) bySide[term.side].push(term)
  const vertical = Math.max(bySide.left.length, bySide.right.length)
  const horizontal = Math.max(bySide.top.length, bySide.bottom.length)
  // Room for the longest terminal labels on both sides plus the symbol and rating between them.
  const longest = (list: TerminalInfo[]) => Math.max(0, ...list.map((t) => t.label.length))
  const labelled = (longest(bySide.left) + longest(bySide.right)) * LABEL_CHAR_PX + BODY_WIDTH_PX
  const width = Math.ceil(Math.max(NODE_WIDTH_PX, (horizontal + 1) * PITCH_PX, labelled) / GRID_PX) * GRID_PX
  // Terminals on the top or bottom edge carry labels inside the box: leave a row for them.
  const height = Math.max(MIN_HEIGHT_PX + (horizontal > 0 ? GRID_PX : 0), (vertical + 1) * PITCH_PX)
  const placed: PlacedTerminal[] = []
  const ys = (list: TerminalInfo[]) => spread(list.length, height)
  const xs = (list: TerminalInfo[]) => spread(list.length, width)
  bySide.left.forEach((t, i) => placed.push({ ...t, x: 0, y: ys(bySide.left)[i] }))
  bySide.right.forEach((t, i) => placed.push({ ...t, x: width, y: ys(bySide.right)[i] }))
  bySide.top.forEach((t, i) => placed.push({ ...t, x: xs(bySide.top)[i], y: 0 }))
  bySide.bottom.forEach((t, i) => placed.push({ ...t, x: xs(bySide.bottom)[i], y: height }))
  return { width, height, terminals: placed }
}
