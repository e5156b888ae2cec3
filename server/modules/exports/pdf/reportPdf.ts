// The PDF report: summary, energy and per-scenario current, conductor and device schedules, every
// finding with its rule and source, the cautions, and the diagram. Every page carries the general caution.
import type { DiagramModel, ReportModel } from '../../../../shared/export'
import { GENERAL_CAUTION } from '../../../../shared/export'
import { drawDiagram } from './drawDiagram'
import { drawTable } from './drawTable'
import { A4_LANDSCAPE, FONT_BOLD, FONT_REGULAR, newPdf, pdfBuffer, pdfText, type Pdf } from './pdfDocument'

const SEVERITY_COLOURS = { error: '#c62828', warning: '#b26a00', info: '#1565c0' } as const

function heading(doc: Pdf, text: string): void {
  if (doc.y > doc.page.height - doc.page.margins.bottom - 60) doc.addPage()
  doc.moveDown(0.4).font(FONT_BOLD).fontSize(12).fillColor('#1f2933').text(text, doc.page.margins.left)
  doc.moveDown(0.3).font(FONT_REGULAR).fontSize(9)
}

function paragraph(doc: Pdf, text: string, options: { size?: number; bold?: boolean; colour?: string } = {}): void {
  doc.font(options.bold ? FONT_BOLD : FONT_REGULAR).fontSize(options.size ?? 9).fillColor(options.colour ?? '#1f2933')
  doc.text(pdfText(text), doc.page.margins.left, doc.y, { width: doc.page.width - doc.page.margins.left - doc.page.margins.right })
}

export function reportPdf(report: ReportModel, diagram: DiagramModel): Promise<Buffer> {
  const { info } = report
  const doc = newPdf({ size: A4_LANDSCAPE, title: `${info.project} — design report`, subject: 'DC system design report', margin: 40 })
  doc.page.margins.bottom = 52

  doc.font(FONT_BOLD).fontSize(18).fillColor('#1f2933').text(pdfText(info.project))
  paragraph(doc, `Design report · client ${info.client || '—'} · revision ${info.revision} · ${info.date} · designer ${info.designer || '—'}`, { size: 10 })
  doc.moveDown(0.5)
  for (const caution of report.cautions) paragraph(doc, caution, { bold: caution === GENERAL_CAUTION, colour: '#8a4b00' })

  heading(doc, 'System summary')
  for (const line of report.summary) paragraph(doc, `• ${line}`)
  heading(doc, 'Energy budget (per day)')
  drawTable(doc, report.energy)
  heading(doc, 'Current per scenario')
  drawTable(doc, report.scenarios)
  heading(doc, 'Conductor schedule')
  drawTable(doc, report.conductors)
  heading(doc, 'Protective device schedule')
  drawTable(doc, report.devices)

  heading(doc, `Findings (${report.findings.length})`)
  if (report.findings.length === 0) paragraph(doc, 'No findings.')
  for (const f of report.findings) {
    if (doc.y > doc.page.height - doc.page.margins.bottom - 70) doc.addPage()
    paragraph(doc, `${f.number}. [${f.severity}] ${f.title}`, { bold: true, colour: SEVERITY_COLOURS[f.severity] })
    const numbers = [f.measured && `measured ${f.measured}`, f.limit && `limit ${f.limit}`].filter(Boolean).join(', ')
    paragraph(doc, `Rule: ${f.ruleId} · ${f.scenario}${numbers ? ` · ${numbers}` : ''}${f.targets ? ` · ${f.targets}` : ''}`, { size: 8, colour: '#52606d' })
    paragraph(doc, f.message)
    paragraph(doc, `Source: ${f.source}`, { size: 8, colour: '#52606d' })
    if (f.suggestion) paragraph(doc, `Suggested fix: ${f.suggestion}`, { size: 8.5 })
    doc.moveDown(0.5)
  }

  heading(doc, 'Cautions')
  for (const caution of report.cautions) paragraph(doc, `• ${caution}`)

  doc.addPage()
  heading(doc, 'Wiring diagram')
  drawDiagram(doc, diagram, { x: 40, y: doc.y, width: doc.page.width - 80, height: doc.page.height - doc.y - 56 })

  const range = doc.bufferedPageRange()
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i)
    const bottom = doc.page.margins.bottom
    doc.page.margins.bottom = 0
    doc.font(FONT_REGULAR).fontSize(7).fillColor('#52606d')
    doc.text(`${pdfText(info.project)} · revision ${pdfText(info.revision)} · page ${i + 1} of ${range.count}. ${GENERAL_CAUTION}`, 40, doc.page.height - 34, {
      width: doc.page.width - 80, lineBreak: true,
    })
    doc.page.margins.bottom = bottom
  }
  return pdfBuffer(doc)
}
