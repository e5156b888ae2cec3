import type { Part } from '../design/schema'
import { INK, type Primitive } from './diagramPrimitives'

// Our own simple schematic glyphs, one per part type, drawn around a centre point (about 48 × 28 units),
// and the one-line rating printed under each part.

const line = (points: [number, number][], strokeWidth = 1.5): Primitive => ({ kind: 'line', points, stroke: INK, strokeWidth })
const label = (x: number, y: number, text: string, size = 11): Primitive => ({ kind: 'text', x, y, text, size, anchor: 'middle', fill: INK })

export function partSymbol(part: Part, cx: number, cy: number): Primitive[] {
  switch (part.type) {
    case 'battery': // two cells: long plate positive, short plate negative
      return [
        line([[cx - 24, cy], [cx - 14, cy]]), line([[cx - 14, cy - 12], [cx - 14, cy + 12]], 2), line([[cx - 8, cy - 6], [cx - 8, cy + 6]], 3),
        line([[cx - 2, cy], [cx + 2, cy]]), line([[cx + 8, cy - 12], [cx + 8, cy + 12]], 2), line([[cx + 14, cy - 6], [cx + 14, cy + 6]], 3),
        line([[cx + 14, cy], [cx + 24, cy]]),
      ]
    case 'pv-array': // a module with cell lines and an arrow of light
      return [
        { kind: 'rect', x: cx - 20, y: cy - 12, w: 40, h: 24, stroke: INK, strokeWidth: 1.5 },
        line([[cx - 20, cy], [cx + 20, cy]], 0.8), line([[cx - 7, cy - 12], [cx - 7, cy + 12]], 0.8), line([[cx + 7, cy - 12], [cx + 7, cy + 12]], 0.8),
        line([[cx + 26, cy - 18], [cx + 20, cy - 12]], 1),
      ]
    case 'charge-controller':
    case 'dc-dc-charger':
    case 'mains-charger':
    case 'inverter': {
      const text = part.type === 'inverter' ? '= / ~' : part.type === 'mains-charger' ? '~ / =' : '= / ='
      return [{ kind: 'rect', x: cx - 22, y: cy - 13, w: 44, h: 26, stroke: INK, strokeWidth: 1.5 }, line([[cx - 22, cy + 13], [cx + 22, cy - 13]], 0.8), label(cx, cy + 4, text, 10)]
    }
    case 'bus-bar':
      return [{ kind: 'rect', x: cx - 36, y: cy - 4, w: 72, h: 8, stroke: INK, fill: INK }]
    case 'fuse-panel':
      return [0, 1, 2].flatMap((i) => {
        const y = cy - 10 + i * 10
        return [{ kind: 'rect' as const, x: cx - 10, y: y - 3, w: 20, h: 6, stroke: INK, strokeWidth: 1 }, line([[cx - 18, y], [cx + 18, y]], 0.8)]
      })
    case 'fuse':
      return [line([[cx - 24, cy], [cx + 24, cy]]), { kind: 'rect', x: cx - 12, y: cy - 5, w: 24, h: 10, stroke: INK, strokeWidth: 1.5 }]
    case 'breaker':
      return [
        line([[cx - 24, cy], [cx - 10, cy]]), line([[cx + 10, cy], [cx + 24, cy]]),
        { kind: 'circle', cx: cx - 10, cy, r: 2, stroke: INK, fill: INK }, { kind: 'circle', cx: cx + 10, cy, r: 2, stroke: INK, fill: INK },
        line([[cx - 10, cy - 4], [cx - 5, cy - 10], [cx + 5, cy - 10], [cx + 10, cy - 4]], 1.5),
      ]
    case 'battery-switch': {
      const closed = part.params.closed
      return [
        line([[cx - 24, cy], [cx - 10, cy]]), line([[cx + 10, cy], [cx + 24, cy]]),
        { kind: 'circle', cx: cx - 10, cy, r: 2, stroke: INK, fill: INK }, { kind: 'circle', cx: cx + 10, cy, r: 2, stroke: INK, fill: INK },
        line([[cx - 10, cy], closed ? [cx + 9, cy - 2] : [cx + 8, cy - 12]], 2),
      ]
    }
    case 'shunt': // a resistor zig-zag
      return [line([[cx - 24, cy], [cx - 14, cy], [cx - 10, cy - 6], [cx - 4, cy + 6], [cx + 2, cy - 6], [cx + 8, cy + 6], [cx + 12, cy], [cx + 24, cy]])]
    case 'load':
      return [
        { kind: 'circle', cx, cy, r: 12, stroke: INK, strokeWidth: 1.5 },
        line([[cx - 8, cy - 8], [cx + 8, cy + 8]], 1), line([[cx - 8, cy + 8], [cx + 8, cy - 8]], 1),
      ]
  }
}

const n = (value: number, digits = 1) => String(Number(value.toFixed(digits)))

/** A short rating line: what a builder reads off the part. */
export function partRatingText(part: Part): string {
  switch (part.type) {
    case 'battery': {
      const p = part.params
      return `${p.chemistry.toUpperCase()} ${p.seriesCount}S${p.parallelCount}P × ${n(p.nominalVoltageV)} V ${n(p.capacityAh, 0)} Ah`
    }
    case 'pv-array': {
      const p = part.params
      return `${p.strings} × ${p.modulesPerString} modules, Voc ${n(p.moduleVocV)} V`
    }
    case 'charge-controller':
      return `${n(part.params.maxPvVoltageV, 0)} V in, ${n(part.params.outputCurrentA, 0)} A out`
    case 'dc-dc-charger':
    case 'mains-charger':
      return `${n(part.params.outputCurrentA, 0)} A`
    case 'inverter':
      return `${n(part.params.continuousW, 0)} W (surge ${n(part.params.surgeW, 0)} W)`
    case 'bus-bar':
      return `${n(part.params.ratingA, 0)} A, ${part.params.polarity}`
    case 'fuse-panel':
      return `${part.params.ways} ways: ${part.params.wayRatingsA.map((r) => n(r)).join('/')} A`
    case 'fuse':
    case 'breaker':
      return `${n(part.params.ratingA)} A${part.params.closed ? '' : ' (open)'}`
    case 'battery-switch':
      return `${n(part.params.ratingA, 0)} A${part.params.closed ? '' : ' (off)'}`
    case 'shunt':
      return `${n(part.params.ratingA, 0)} A`
    case 'load': {
      const p = part.params
      const value = p.model === 'power' ? `${n(p.powerW ?? 0)} W` : p.model === 'current' ? `${n(p.currentA ?? 0)} A` : `${n(p.resistanceOhm ?? 0, 3)} Ω`
      return `${value}${p.critical ? ', critical' : ''}`
    }
  }
}
