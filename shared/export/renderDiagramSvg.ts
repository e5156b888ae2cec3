import type { AnalysisResult } from '../analysis/types'
import type { Design } from '../design/schema'
import { buildDiagramModel, type DiagramOptions } from './diagramModel'
import type { DiagramModel, Primitive } from './diagramPrimitives'

// The diagram as a standalone SVG document (no external fonts, images or scripts).

export function escapeXml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' })[c]!)
}

const num = (v: number) => String(Math.round(v * 100) / 100)

function primitiveSvg(p: Primitive): string {
  switch (p.kind) {
    case 'rect':
      return `<rect x="${num(p.x)}" y="${num(p.y)}" width="${num(p.w)}" height="${num(p.h)}"${p.radius ? ` rx="${p.radius}"` : ''} fill="${p.fill ?? 'none'}" stroke="${p.stroke}" stroke-width="${p.strokeWidth ?? 1}"/>`
    case 'line':
      return `<polyline points="${p.points.map(([x, y]) => `${num(x)},${num(y)}`).join(' ')}" fill="none" stroke="${p.stroke}" stroke-width="${p.strokeWidth ?? 1}"${p.dash ? ` stroke-dasharray="${p.dash.join(' ')}"` : ''} stroke-linejoin="round"/>`
    case 'circle':
      return `<circle cx="${num(p.cx)}" cy="${num(p.cy)}" r="${num(p.r)}" fill="${p.fill ?? 'none'}" stroke="${p.stroke}" stroke-width="${p.strokeWidth ?? 1}"/>`
    case 'text': {
      const anchor = p.anchor && p.anchor !== 'start' ? ` text-anchor="${p.anchor}"` : ''
      const weight = p.bold ? ' font-weight="700"' : ''
      return `<text x="${num(p.x)}" y="${num(p.y)}" font-size="${p.size}"${anchor}${weight} fill="${p.fill ?? '#000'}">${escapeXml(p.text)}</text>`
    }
  }
}

export function diagramModelToSvg(model: DiagramModel, title: string): string {
  return [
    `<?xml version="1.0" encoding="UTF-8"?>`,
    `<svg xmlns="http://www.w3.org/2000/svg" width="${model.width}" height="${model.height}" viewBox="0 0 ${model.width} ${model.height}" font-family="Roboto, 'Helvetica Neue', Arial, sans-serif">`,
    `<title>${escapeXml(title)}</title>`,
    `<rect width="100%" height="100%" fill="#ffffff"/>`,
    ...model.primitives.map(primitiveSvg),
    `</svg>`,
  ].join('\n')
}

/**
 * A clean schematic of the design with the analysis' finding marks and the title block.
 * @example renderDiagramSvg(design, analyzeDesign(design), { titleBlock: { project: 'Van', client: '', revision: '3', date: '2026-12-02', designer: 'A. Sparks' } })
 */
export function renderDiagramSvg(design: Design, analysis: AnalysisResult, options: DiagramOptions): string {
  return diagramModelToSvg(buildDiagramModel(design, analysis, options), `${options.titleBlock.project} — DC wiring diagram`)
}
