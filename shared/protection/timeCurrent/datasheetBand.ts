import { bandFromDefinition } from './deviceBand'
import type { ChartPoint, CurvePoint, DeviceBand, DeviceKind } from './types'

// A band from a device's own datasheet points (current in A, time in s), for devices a user adds.
// The points are checked the same way the catalogue bands are tested: enough of them, finite and
// positive, current rising, time not rising, and minimum melting never after maximum clearing.

export interface DatasheetInput {
  id: string
  ratingA: number
  kind?: DeviceKind
  timeDelay?: boolean
  minMelt: ChartPoint[]
  maxClear: ChartPoint[]
  /** Where the points come from, e.g. "maker's datasheet rev. C, fig. 3". */
  source: string
}

export interface DatasheetIssue {
  path: string
  message: string
}

export type DatasheetResult = { ok: true; band: DeviceBand } | { ok: false; issues: DatasheetIssue[] }

function curveIssues(name: 'minMelt' | 'maxClear', points: ChartPoint[]): DatasheetIssue[] {
  const issues: DatasheetIssue[] = []
  if (!Array.isArray(points) || points.length < 2) return [{ path: name, message: 'Give at least two current/time points' }]
  points.forEach((p, i) => {
    for (const key of ['currentA', 'timeS'] as const) {
      if (!(typeof p?.[key] === 'number' && Number.isFinite(p[key]) && p[key] > 0)) {
        issues.push({ path: `${name}.${i}.${key}`, message: `${key === 'currentA' ? 'Current' : 'Time'} must be a positive number` })
      }
    }
    const prev = points[i - 1]
    if (i > 0 && issues.length === 0) {
      if (!(p.currentA > prev.currentA)) issues.push({ path: `${name}.${i}.currentA`, message: 'Currents must rise from one point to the next' })
      else if (p.timeS > prev.timeS) issues.push({ path: `${name}.${i}.timeS`, message: 'Time must not rise as the current rises' })
    }
  })
  return issues
}

function toCurve(points: ChartPoint[], ratingA: number, source: string): CurvePoint[] {
  return points.map((p) => ({ multiple: p.currentA / ratingA, timeS: p.timeS, source, status: 'datasheet' as const }))
}

/**
 * Validates datasheet points and builds the band; never throws. Issues carry field paths for a form.
 * @example datasheetBand({ id: 'my-fuse', ratingA: 10, minMelt: [...], maxClear: [...], source: 'datasheet' })
 */
export function datasheetBand(input: DatasheetInput): DatasheetResult {
  const issues: DatasheetIssue[] = []
  if (!(typeof input.ratingA === 'number' && Number.isFinite(input.ratingA) && input.ratingA > 0)) {
    issues.push({ path: 'ratingA', message: 'Rating must be a positive number of amperes' })
  }
  if (!input.source || !input.source.trim()) issues.push({ path: 'source', message: 'Name where the points come from' })
  issues.push(...curveIssues('minMelt', input.minMelt), ...curveIssues('maxClear', input.maxClear))
  if (issues.length) return { ok: false, issues }
  const source = `${input.source} (user datasheet points)`
  const band = bandFromDefinition(input.id, input.ratingA, {
    kind: input.kind ?? 'fuse',
    timeDelay: input.timeDelay ?? false,
    minMelt: toCurve(input.minMelt, input.ratingA, source),
    maxClear: toCurve(input.maxClear, input.ratingA, source),
    source,
  })
  // Minimum melting must not come after maximum clearing at any current the two curves share.
  const currents = [...input.minMelt, ...input.maxClear].map((p) => p.currentA)
  const crossing = currents.find((a) => band.minMeltS(a) > band.maxClearS(a) * (1 + 1e-9))
  if (crossing !== undefined) {
    return { ok: false, issues: [{ path: 'minMelt', message: `Minimum melting time is after maximum clearing time at ${crossing} A` }] }
  }
  return { ok: true, band }
}
