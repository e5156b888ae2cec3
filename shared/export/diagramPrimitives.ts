// The drawing vocabulary shared by the SVG and PDF diagram renderers: both draw the same list, so the
// two exports cannot drift apart. Coordinates in drawing units (1 unit = 1 px of the editor canvas).

export type Point = readonly [number, number]

export type Primitive =
  | { kind: 'rect'; x: number; y: number; w: number; h: number; stroke: string; fill?: string; strokeWidth?: number; radius?: number }
  | { kind: 'line'; points: Point[]; stroke: string; strokeWidth?: number; dash?: number[] }
  | { kind: 'circle'; cx: number; cy: number; r: number; stroke: string; fill?: string; strokeWidth?: number }
  | {
      kind: 'text'
      x: number
      y: number
      text: string
      size: number
      anchor?: 'start' | 'middle' | 'end'
      bold?: boolean
      fill?: string
    }

export interface DiagramModel {
  width: number
  height: number
  primitives: Primitive[]
  /** Finding number (1-based, the report's order) → finding id, for the marks on the drawing. */
  markNumbers: Map<string, number>
}

export const INK = '#1f2933'
export const MUTED = '#52606d'
export const POSITIVE = '#c62828'
export const NEGATIVE = '#263238'
export const SEVERITY_COLOURS = { error: '#c62828', warning: '#b26a00', info: '#1565c0' } as const

/** Rough width of a line of text in the sans-serif fonts we use (0.55 em per character, generous). */
export function textWidth(text: string, size: number): number {
  return text.length * size * 0.55
}

/** Greedy word wrap to a width, for the title block and notes. */
export function wrapText(text: string, size: number, maxWidth: number): string[] {
  const lines: string[] = []
  let line = ''
  for (const word of text.split(/\s+/).filter(Boolean)) {
    const next = line ? `${line} ${word}` : word
    if (line && textWidth(next, size) > maxWidth) {
      lines.push(line)
      line = word
    } else line = next
  }
  if (line) lines.push(line)
  return lines
}

const ELLIPSIS = '…'

/** The text cut to fit a width, ending in an ellipsis when anything was cut ('' if not even that fits). */
export function fitText(text: string, size: number, maxWidth: number): string {
  if (textWidth(text, size) <= maxWidth) return text
  const chars = Array.from(text)
  let keep = Math.max(0, Math.floor(maxWidth / (size * 0.55)) - 1)
  while (keep > 0 && /\s/.test(chars[keep - 1])) keep--
  return keep > 0 ? chars.slice(0, keep).join('') + ELLIPSIS : ''
}

/** wrapText to at most maxLines; the last line ends in an ellipsis when text was left over. Long words are cut too. */
export function wrapTextLines(text: string, size: number, maxWidth: number, maxLines: number): string[] {
  const lines = wrapText(text, size, maxWidth)
  const kept = lines.slice(0, maxLines).map((line) => fitText(line, size, maxWidth))
  // The next line did not fit after the last kept one, so joining them overflows and fitText adds the ellipsis.
  if (lines.length > maxLines && kept.length > 0) kept[kept.length - 1] = fitText(`${lines[maxLines - 1]} ${lines[maxLines]}`, size, maxWidth)
  return kept
}
