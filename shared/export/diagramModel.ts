import type { AnalysisResult, Finding, Severity } from '../analysis/types'
import { getConductorSize } from '../conductors/sizes'
import type { Conductor, Design } from '../design/schema'
import { designCautions } from './cautions'
import { fitText, INK, MUTED, NEGATIVE, POSITIVE, SEVERITY_COLOURS, textWidth, wrapText, wrapTextLines, type DiagramModel, type Point, type Primitive } from './diagramPrimitives'
import { placeLabel, type Rect } from './labelPlacement'
import { partBox, stubOf, type PartBox, type PlacedTerminal } from './partGeometry'
import { partRatingText, partSymbol } from './partSymbols'
import { titleBlock, titleBlockHeight, TITLE_BLOCK_WIDTH, type TitleBlockInfo } from './titleBlock'

// The whole exported diagram as primitives: parts at their editor positions, conductors routed
// orthogonally between terminals with size and length labels, numbered finding marks, a findings key
// and the title block. renderDiagramSvg and the PDF export both draw this.

const MARGIN = 48
const SEVERITY_RANK: Record<Severity, number> = { error: 0, warning: 1, info: 2 }

export interface DiagramOptions {
  titleBlock: TitleBlockInfo
  /** Defaults to designCautions(design). */
  cautions?: string[]
}

function formatLengthM(lengthM: number): string {
  return `${Number(lengthM.toFixed(2))} m`
}

function route(from: ReturnType<PartBox['terminals']['get']>, to: ReturnType<PartBox['terminals']['get']>): Point[] {
  if (!from || !to) return []
  const a: Point = [from.x, from.y]
  const b: Point = [to.x, to.y]
  const sa = stubOf(from)
  const sb = stubOf(to)
  const horizontal = (side: string) => side === 'left' || side === 'right'
  let middle: Point[]
  if (horizontal(from.side) && horizontal(to.side)) {
    const mx = (sa[0] + sb[0]) / 2
    middle = [[mx, sa[1]], [mx, sb[1]]]
  } else if (!horizontal(from.side) && !horizontal(to.side)) {
    const my = (sa[1] + sb[1]) / 2
    middle = [[sa[0], my], [sb[0], my]]
  } else if (horizontal(from.side)) middle = [[sb[0], sa[1]]]
  else middle = [[sa[0], sb[1]]]
  return [a, sa, ...middle, sb, b]
}

function marks(numbers: number[], findings: Finding[], x: number, y: number): Primitive[] {
  return numbers.flatMap((number, i) => {
    const colour = SEVERITY_COLOURS[findings[number - 1].severity]
    const cx = x - i * 18
    return [
      { kind: 'circle' as const, cx, cy: y, r: 8, stroke: colour, fill: colour },
      { kind: 'text' as const, x: cx, y: y + 3.5, text: String(number), size: 9, bold: true, anchor: 'middle' as const, fill: '#ffffff' },
    ]
  })
}

export function buildDiagramModel(design: Design, analysis: AnalysisResult, options: DiagramOptions): DiagramModel {
  const boxes = new Map(design.parts.map((p) => [p.id, partBox(p)]))
  const findings = [...analysis.findings].sort((a, b) => SEVERITY_RANK[a.severity] - SEVERITY_RANK[b.severity])
  const markNumbers = new Map(findings.map((f, i) => [f.id, i + 1]))
  const numbersFor = (predicate: (f: Finding) => boolean) => findings.flatMap((f, i) => (predicate(f) ? [i + 1] : []))

  const drawn: Primitive[] = []
  // Conductors under the parts, their labels and marks above them; a label goes where it covers no
  // part (terminal names included) and no earlier label.
  const labels: Primitive[] = []
  const partRects = [...boxes.values()].map((b) => ({ x: b.x, y: b.y, w: b.width, h: b.height }))
  const takenRects: Rect[] = []
  for (const c of design.conductors) {
    const from = boxes.get(c.from.partId)?.terminals.get(c.from.terminal)
    const to = boxes.get(c.to.partId)?.terminals.get(c.to.terminal)
    const points = route(from, to)
    if (points.length === 0) continue
    const negative = from?.polarity === 'negative' || to?.polarity === 'negative'
    const stroke = negative ? NEGATIVE : POSITIVE
    drawn.push({ kind: 'line', points, stroke, strokeWidth: 1.6, dash: negative ? [6, 3] : undefined })
    const text = conductorLabel(c)
    const w = textWidth(text, 9) + 6
    const numbers = numbersFor((f) => f.conductorIds.includes(c.id))
    const { x: lx, y: ly, rect, leaderTo } = placeLabel(points, w, numbers.length > 0 ? 20 : 0, partRects, takenRects)
    if (leaderTo) {
      // Moved away for room: a thin leader from the label's nearer edge back to its conductor.
      const edgeY = leaderTo[1] < rect.y ? rect.y : leaderTo[1] > rect.y + rect.h ? rect.y + rect.h : leaderTo[1]
      const edgeX = leaderTo[0] < lx - w / 2 ? lx - w / 2 : leaderTo[0] > lx + w / 2 ? lx + w / 2 : leaderTo[0]
      labels.push({ kind: 'line', points: [[edgeX, edgeY], leaderTo], stroke, strokeWidth: 0.6 })
    }
    labels.push({ kind: 'rect', x: lx - w / 2, y: ly - 8, w, h: 11, stroke: '#ffffff', fill: '#ffffff', strokeWidth: 0 })
    labels.push({ kind: 'text', x: lx, y: ly, text, size: 9, anchor: 'middle', fill: stroke })
    labels.push(...marks(numbers, findings, lx + w / 2 + 10, ly - 4))
  }
  for (const box of boxes.values()) drawn.push(...partPrimitives(box, numbersFor((f) => f.partIds.includes(box.part.id)), findings))
  drawn.push(...labels)

  // Bounds of what was drawn (parts, stubs and labels), then shift everything into the page.
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity
  const see = (x: number, y: number) => {
    minX = Math.min(minX, x); minY = Math.min(minY, y); maxX = Math.max(maxX, x); maxY = Math.max(maxY, y)
  }
  for (const p of drawn) {
    if (p.kind === 'rect') { see(p.x, p.y); see(p.x + p.w, p.y + p.h) }
    else if (p.kind === 'line') p.points.forEach(([x, y]) => see(x, y))
    else if (p.kind === 'circle') { see(p.cx - p.r, p.cy - p.r); see(p.cx + p.r, p.cy + p.r) }
    else {
      const w = textWidth(p.text, p.size)
      const left = p.anchor === 'middle' ? p.x - w / 2 : p.anchor === 'end' ? p.x - w : p.x
      see(left, p.y - p.size); see(left + w, p.y + 3)
    }
  }
  if (!Number.isFinite(minX)) { minX = 0; minY = 0; maxX = 0; maxY = 0 }
  const dx = MARGIN - minX
  const dy = MARGIN - minY
  const primitives = drawn.map((p) => shift(p, dx, dy))
  if (design.parts.length === 0) {
    primitives.push({ kind: 'text', x: MARGIN, y: MARGIN + 12, text: 'This design has no parts yet.', size: 12, fill: MUTED })
    maxY = minY + 24
  }

  const cautions = options.cautions ?? designCautions(design)
  const width = Math.max(maxX - minX + 2 * MARGIN, TITLE_BLOCK_WIDTH + 2 * MARGIN, 900)
  let y = maxY - minY + MARGIN + 24
  // Findings key: the number on the drawing, severity, title and the parts it names.
  const keyLines = findings.map((f, i) => `${i + 1}. [${f.severity}] ${f.title} — ${[...f.partIds, ...f.conductorIds].join(', ') || 'whole design'}`)
  if (keyLines.length > 0) {
    primitives.push({ kind: 'text', x: MARGIN, y, text: 'Findings (numbers on the drawing)', size: 11, bold: true, fill: INK })
    y += 16
    for (const [i, line] of keyLines.entries()) {
      for (const text of wrapText(line, 9.5, width - 2 * MARGIN)) {
        primitives.push({ kind: 'text', x: MARGIN, y, text, size: 9.5, fill: SEVERITY_COLOURS[findings[i].severity] })
        y += 13
      }
    }
    y += 12
  }
  const tbX = width - MARGIN - TITLE_BLOCK_WIDTH
  primitives.push(...titleBlock(options.titleBlock, cautions, tbX, y))
  const height = y + titleBlockHeight(cautions) + MARGIN
  return { width: Math.ceil(width), height: Math.ceil(height), primitives, markNumbers: new Map([...markNumbers].map(([id, n]) => [id, n])) }
}

export function conductorLabel(c: Conductor): string {
  let size: string = c.sizeId
  try {
    size = getConductorSize(c.sizeId).label
  } catch {
    // an unknown size id cannot pass parseDesign; keep the raw id rather than failing the export
  }
  return `${size} · ${formatLengthM(c.lengthM)}`
}

const TITLE_SIZE = 10.5
const RATING_SIZE = 9
const TERMINAL_SIZE = 8
/** Gap between a terminal's dot and its label, and around texts inside the box. */
const INSET = 5

/** Everything drawn inside a box stays inside it: titles wrap to two lines, other texts are cut with an ellipsis. */
function partPrimitives(box: PartBox, markNumbersForPart: number[], findings: Finding[]): Primitive[] {
  const { part, x, y, width, height } = box
  const terminals = [...box.terminals.values()]
  const out: Primitive[] = [{ kind: 'rect', x, y, w: width, h: height, stroke: INK, fill: '#ffffff', strokeWidth: 1.2, radius: 4 }]
  // Terminals on the top or bottom edge label themselves inside the box: keep the title and the rating clear of them.
  const topRow = terminals.some((t) => t.side === 'top') ? 12 : 0
  const bottomRow = terminals.some((t) => t.side === 'bottom') ? 12 : 0
  // Bold glyphs run wider than textWidth's 0.55 em, most in the fallback fonts a viewer may substitute: fit titles
  // as if 12 % larger (checked by eye in chromium with its default sans-serif bold).
  const title = wrapTextLines(part.label || part.id, TITLE_SIZE * 1.12, width - 2 * INSET, 2)
  title.forEach((text, i) => out.push({ kind: 'text', x: x + width / 2, y: y + topRow + 14 + i * 12, text, size: TITLE_SIZE, bold: true, anchor: 'middle', fill: INK }))
  const cy = y + Math.max(height / 2, topRow + 14 + title.length * 12 + 16)
  out.push(...partSymbol(part, x + width / 2, cy))
  // The rating shares its line with the side terminals' labels near the bottom edge: centre it between them.
  const ratingY = y + height - 8 - bottomRow
  const sideLabelWidth = Math.max(0, ...terminals
    .filter((t) => (t.side === 'left' || t.side === 'right') && Math.abs(t.y + 3 - ratingY) < 11)
    .map((t) => textWidth(t.label, TERMINAL_SIZE) + INSET + 4))
  const rating = fitText(partRatingText(part), RATING_SIZE, width - 2 * Math.max(INSET, sideLabelWidth))
  out.push({ kind: 'text', x: x + width / 2, y: ratingY, text: rating, size: RATING_SIZE, anchor: 'middle', fill: MUTED })
  const sideRoom = width / 2 - INSET - 4
  const rowRoom = (t: PlacedTerminal) => {
    // Top and bottom labels share the edge with their neighbours, one pitch apart.
    const neighbours = terminals.filter((o) => o.side === t.side && o !== t).map((o) => Math.abs(o.x - t.x))
    return Math.min(width - 2 * INSET, ...neighbours.map((d) => d - 4))
  }
  for (const t of terminals) {
    out.push({ kind: 'circle', cx: t.x, cy: t.y, r: 2.5, stroke: INK, fill: t.polarity === 'negative' ? NEGATIVE : POSITIVE })
    const inset = t.side === 'left' ? { x: t.x + INSET, y: t.y + 3, anchor: 'start' as const }
      : t.side === 'right' ? { x: t.x - INSET, y: t.y + 3, anchor: 'end' as const }
      : t.side === 'top' ? { x: t.x, y: t.y + 11, anchor: 'middle' as const }
      : { x: t.x, y: t.y - 5, anchor: 'middle' as const }
    const room = t.side === 'left' || t.side === 'right' ? sideRoom : rowRoom(t)
    out.push({ kind: 'text', ...inset, text: fitText(t.label, TERMINAL_SIZE, room), size: TERMINAL_SIZE, fill: MUTED })
  }
  out.push(...marks(markNumbersForPart, findings, x + width, y))
  return out
}

function shift(p: Primitive, dx: number, dy: number): Primitive {
  switch (p.kind) {
    case 'rect':
      return { ...p, x: p.x + dx, y: p.y + dy }
    case 'line':
      return { ...p, points: p.points.map(([x, y]) => [x + dx, y + dy] as Point) }
    case 'circle':
      return { ...p, cx: p.cx + dx, cy: p.cy + dy }
    case 'text':
      return { ...p, x: p.x + dx, y: p.y + dy }
  }
}
