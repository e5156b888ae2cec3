// A plain-text table whose cells wrap inside their column, for findings in a terminal or a log.

export interface Column {
  header: string
  /** Widest the column may grow; its text wraps beyond this. */
  maxWidth: number
}

function wrap(text: string, width: number): string[] {
  const lines: string[] = []
  for (const paragraph of text.split('\n')) {
    let line = ''
    for (const word of paragraph.split(/\s+/).filter(Boolean)) {
      let rest = word
      while (rest.length > width) {
        if (line) lines.push(line)
        lines.push(rest.slice(0, width))
        line = ''
        rest = rest.slice(width)
      }
      if (!line) line = rest
      else if (line.length + 1 + rest.length <= width) line += ` ${rest}`
      else {
        lines.push(line)
        line = rest
      }
    }
    lines.push(line)
  }
  return lines
}

/** Render rows under headers; each column is as wide as its widest cell, up to its maxWidth. */
export function renderTable(columns: readonly Column[], rows: readonly string[][]): string {
  const widths = columns.map((column, c) => {
    const longest = Math.max(column.header.length, ...rows.map((row) => Math.max(0, ...(row[c] ?? '').split('\n').map((l) => l.length))))
    return Math.max(column.header.length, Math.min(column.maxWidth, longest))
  })
  const renderRow = (cells: readonly string[]) => {
    const wrapped = widths.map((width, c) => wrap(cells[c] ?? '', width))
    const height = Math.max(...wrapped.map((lines) => lines.length))
    const out: string[] = []
    for (let l = 0; l < height; l++) {
      out.push(wrapped.map((lines, c) => (lines[l] ?? '').padEnd(widths[c])).join('  ').trimEnd())
    }
    return out.join('\n')
  }
  const rule = widths.map((width) => '-'.repeat(width)).join('  ')
  return [renderRow(columns.map((column) => column.header)), rule, ...rows.map(renderRow)].join('\n')
}
