// A plain table for the report: wrapped cells, a header row repeated on every page it spans.
import type { ReportTable } from '../../../../shared/export'
import { FONT_BOLD, FONT_REGULAR, pdfText, type Pdf } from './pdfDocument'

const PAD = 3
const SIZE = 7.5

export function drawTable(doc: Pdf, table: ReportTable): void {
  const left = doc.page.margins.left
  const width = doc.page.width - left - doc.page.margins.right
  const totalWeight = table.columns.reduce((s, c) => s + c.weight, 0)
  const widths = table.columns.map((c) => (c.weight / totalWeight) * width)

  const rowHeight = (cells: string[], bold: boolean) => {
    doc.font(bold ? FONT_BOLD : FONT_REGULAR).fontSize(SIZE)
    return Math.max(...cells.map((cell, i) => doc.heightOfString(pdfText(cell || ' '), { width: widths[i] - 2 * PAD }))) + 2 * PAD
  }
  const drawRow = (cells: string[], bold: boolean, shade: string | null) => {
    const h = rowHeight(cells, bold)
    const y = doc.y
    if (shade) doc.rect(left, y, width, h).fill(shade)
    let x = left
    doc.font(bold ? FONT_BOLD : FONT_REGULAR).fontSize(SIZE).fillColor('#1f2933')
    cells.forEach((cell, i) => {
      doc.text(pdfText(cell), x + PAD, y + PAD, { width: widths[i] - 2 * PAD, align: table.columns[i].align === 'right' ? 'right' : 'left' })
      x += widths[i]
    })
    doc.moveTo(left, y + h).lineTo(left + width, y + h).lineWidth(0.4).stroke('#9aa5b1')
    doc.x = left
    doc.y = y + h
  }
  const header = table.columns.map((c) => c.header)
  const bottom = () => doc.page.height - doc.page.margins.bottom
  if (doc.y + rowHeight(header, true) + 20 > bottom()) doc.addPage()
  drawRow(header, true, '#e4e7eb')
  if (table.rows.length === 0) {
    doc.font(FONT_REGULAR).fontSize(SIZE).text('None.', left + PAD, doc.y + PAD)
    return
  }
  table.rows.forEach((row, i) => {
    if (doc.y + rowHeight(row, false) > bottom()) {
      doc.addPage()
      drawRow(header, true, '#e4e7eb')
    }
    drawRow(row, false, i % 2 === 1 ? '#f5f7fa' : null)
  })
  doc.moveDown(0.8)
}
