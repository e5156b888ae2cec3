import type { DiagramModel } from '../../../../shared/export'
import { drawDiagram } from './drawDiagram'
import { A3_LANDSCAPE, newPdf, pdfBuffer } from './pdfDocument'

/** The diagram on one A3 sheet (landscape, or portrait for a tall drawing), vector throughout. */
export function diagramPdf(model: DiagramModel, title: string): Promise<Buffer> {
  const portrait = model.height > model.width
  const size: [number, number] = portrait ? [A3_LANDSCAPE[1], A3_LANDSCAPE[0]] : A3_LANDSCAPE
  const margin = 24
  const doc = newPdf({ size, title, subject: 'DC wiring diagram', margin })
  drawDiagram(doc, model, { x: margin, y: margin, width: size[0] - 2 * margin, height: size[1] - 2 * margin })
  return pdfBuffer(doc)
}
