import { INK, MUTED, wrapText, type Primitive } from './diagramPrimitives'

// The title block of our own design: a header strip, a 2-column grid of the facts a drawing must
// carry (project, client, revision, date, designer, drawing), then the cautions in full.

export interface TitleBlockInfo {
  project: string
  client: string
  revision: string
  /** As printed, e.g. "2026-12-02". */
  date: string
  designer: string
  /** Drawing title, e.g. "DC wiring diagram". */
  drawing?: string
}

export const TITLE_BLOCK_WIDTH = 560
const ROW = 30
const PAD = 8
const CAUTION_SIZE = 9

export function titleBlockHeight(cautions: string[]): number {
  const lines = cautions.flatMap((c) => wrapText(c, CAUTION_SIZE, TITLE_BLOCK_WIDTH - 2 * PAD))
  return 24 + 3 * ROW + PAD + lines.length * (CAUTION_SIZE + 3) + PAD
}

export function titleBlock(info: TitleBlockInfo, cautions: string[], x: number, y: number): Primitive[] {
  const w = TITLE_BLOCK_WIDTH
  const h = titleBlockHeight(cautions)
  const half = w / 2
  const out: Primitive[] = [
    { kind: 'rect', x, y, w, h, stroke: INK, fill: '#ffffff', strokeWidth: 1.5 },
    { kind: 'rect', x, y, w, h: 24, stroke: INK, fill: '#1f2933', strokeWidth: 1.5 },
    { kind: 'text', x: x + PAD, y: y + 16, text: 'AMPWRIGHT', size: 11, bold: true, fill: '#ffffff' },
    { kind: 'text', x: x + w - PAD, y: y + 16, text: info.drawing ?? 'DC wiring diagram', size: 11, anchor: 'end', fill: '#ffffff' },
  ]
  const cells: [string, string][] = [
    ['Project', info.project], ['Client', info.client || '—'],
    ['Revision', info.revision], ['Date', info.date],
    ['Designer', info.designer || '—'], ['Sheet', '1 of 1'],
  ]
  cells.forEach(([name, value], i) => {
    const cx = x + (i % 2) * half
    const cy = y + 24 + Math.floor(i / 2) * ROW
    out.push({ kind: 'rect', x: cx, y: cy, w: half, h: ROW, stroke: INK, strokeWidth: 0.75 })
    out.push({ kind: 'text', x: cx + PAD, y: cy + 10, text: name.toUpperCase(), size: 7, fill: MUTED })
    const shown = value.length > 44 ? `${value.slice(0, 43)}…` : value
    out.push({ kind: 'text', x: cx + PAD, y: cy + 24, text: shown, size: 11, bold: name === 'Project', fill: INK })
  })
  let ty = y + 24 + 3 * ROW + PAD + CAUTION_SIZE
  for (const caution of cautions) {
    for (const text of wrapText(caution, CAUTION_SIZE, w - 2 * PAD)) {
      out.push({ kind: 'text', x: x + PAD, y: ty, text, size: CAUTION_SIZE, fill: INK })
      ty += CAUTION_SIZE + 3
    }
  }
  return out
}
