import type { Part } from '@shared/design/schema'
import { formatAuto } from './format'

// The one-line rating shown on a part's node ("30 A", "25.6 V · 200 Ah", "2000 W").

export function partSummary(part: Part): string {
  const p = part.params as Record<string, unknown>
  const num = (key: string, unit: string) => formatAuto(p[key], unit)
  switch (part.type) {
    case 'battery': {
      const s = Number(p.seriesCount) || 1
      const n = Number(p.parallelCount) || 1
      return `${formatAuto(Number(p.nominalVoltageV) * s, 'V')} · ${formatAuto(Number(p.capacityAh) * n, 'Ah')}`
    }
    case 'pv-array':
      return `${p.modulesPerString}S × ${p.strings}P · ${formatAuto(Number(p.moduleVmpV) * Number(p.moduleImpA) * Number(p.modulesPerString) * Number(p.strings), 'W')}`
    case 'charge-controller':
    case 'dc-dc-charger':
    case 'mains-charger':
      return num('outputCurrentA', 'A')
    case 'inverter':
      return num('continuousW', 'W')
    case 'fuse':
    case 'breaker':
      return `${num('ratingA', 'A')}${p.closed === false ? ' · open' : ''}`
    case 'battery-switch':
      return p.closed === false ? 'Off' : 'On'
    case 'fuse-panel':
      return `${p.ways} ways · ${num('ratingA', 'A')}`
    case 'bus-bar':
      return `${p.polarity === 'negative' ? '−' : '+'} · ${num('ratingA', 'A')}`
    case 'shunt':
      return num('ratingA', 'A')
    case 'load':
      if (p.model === 'current') return num('currentA', 'A')
      if (p.model === 'resistance') return num('resistanceOhm', 'Ω')
      return num('powerW', 'W')
    default:
      return ''
  }
}
