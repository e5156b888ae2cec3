// Draws the shared diagram model (shared/export) with pdfkit as vector graphics: the same primitives
// as the SVG, scaled to fit a box on the page.
import type { DiagramModel, Primitive } from '../../../../shared/export'
import { FONT_BOLD, FONT_REGULAR, pdfText, type Pdf } from './pdfDocument'

function drawPrimitive(doc: Pdf, p: Primitive): void {
  switch (p.kind) {
    case 'rect': {
      if (p.radius) doc.roundedRect(p.x, p.y, p.w, p.h, p.radius)
      else doc.rect(p.x, p.y, p.w, p.h)
      doc.lineWidth(p.strokeWidth ?? 1)
      if (p.fill && (p.strokeWidth ?? 1) > 0) doc.fillAndStroke(p.fill, p.stroke)
      else if (p.fill) doc.fill(p.fill)
      else doc.stroke(p.stroke)
      return
    }
    case 'line': {
      const [first, ...rest] = p.points
      if (!first) return
      doc.moveTo(first[0], first[1])
      for (const [x, y] of rest) doc.lineTo(x, y)
      doc.lineWidth(p.strokeWidth ?? 1).lineJoin('round')
      if (p.dash) doc.dash(p.dash[0], { space: p.dash[1] ?? p.dash[0] })
      doc.stroke(p.stroke)
      if (p.dash) doc.undash()
      return
    }
    case 'circle':
      doc.circle(p.cx, p.cy, p.r).lineWidth(p.strokeWidth ?? 1)
      if (p.fill) doc.fillAndStroke(p.fill, p.stroke)
      else doc.stroke(p.stroke)
      return
    case 'text': {
      const text = pdfText(p.text)
      doc.font(p.bold ? FONT_BOLD : FONT_REGULAR).fontSize(p.size)
      const width = doc.widthOfString(text)
      const x = p.anchor === 'middle' ? p.x - width / 2 : p.anchor === 'end' ? p.x - width : p.x
      doc.fillColor(p.fill ?? '#000000').text(text, x, p.y, { lineBreak: false, baseline: 'alphabetic' })
      return
    }
  }
}

/** Fits the model into the box (keeping its proportions) and draws it. */
export function drawDiagram(doc: Pdf, model: DiagramModel, box: { x: number; y: number; width: number; height: number }): void {
  const scale = Math.min(box.width / model.width, box.height / model.height)
  doc.save()
  doc.translate(box.x + (box.width - model.width * scale) / 2, box.y)
  doc.scale(scale)
  for (const p of model.primitives) drawPrimitive(doc, p)
  doc.restore()
  doc.fillColor('#000000').font(FONT_REGULAR)
}
