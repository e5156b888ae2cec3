// pdfkit set-up shared by the diagram and report PDFs: the app's own Roboto (shipped in node_modules),
// text cleaned to what the font subset holds, and the finished document as a Buffer.
import path from 'node:path'
import PDFDocument from 'pdfkit'
import { REPO_ROOT } from '../../../config'

const FONT_DIR = path.join(REPO_ROOT, 'node_modules', '@fontsource', 'roboto', 'files')
export const FONT_REGULAR = 'Roboto'
export const FONT_BOLD = 'Roboto-Bold'

export type Pdf = InstanceType<typeof PDFDocument>

export function newPdf(options: { size: [number, number]; title: string; subject: string; margin?: number }): Pdf {
  const doc = new PDFDocument({
    size: options.size,
    margin: options.margin ?? 36,
    bufferPages: true,
    info: { Title: options.title, Subject: options.subject, Creator: 'Ampwright', Producer: 'Ampwright' },
  })
  doc.registerFont(FONT_REGULAR, path.join(FONT_DIR, 'roboto-latin-400-normal.woff'))
  doc.registerFont(FONT_BOLD, path.join(FONT_DIR, 'roboto-latin-700-normal.woff'))
  doc.font(FONT_REGULAR)
  return doc
}

/** The Latin subset has no Greek letters or arrows: write them out. */
export function pdfText(text: string): string {
  return text.replace(/Ω/g, ' ohm').replace(/µ/g, 'u').replace(/→/g, '->')
}

export function pdfBuffer(doc: Pdf): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = []
    doc.on('data', (chunk: Buffer) => chunks.push(chunk))
    doc.on('end', () => resolve(Buffer.concat(chunks)))
    doc.on('error', reject)
    doc.end()
  })
}

/** Points per millimetre; page sizes in points (ISO 216). */
export const A4_LANDSCAPE: [number, number] = [841.89, 595.28]
export const A3_LANDSCAPE: [number, number] = [1190.55, 841.89]
