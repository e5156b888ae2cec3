// What changed between two designs: parts and conductors added, removed and changed (with the changed
// fields), and the analysis findings that appeared or cleared. Pure: the caller runs the analysis.
import type { Finding } from '../analysis/types'
import type { Conductor, Design, Part } from '../design/schema'

export interface FieldChange {
  /** 'label', 'position', 'params.ratingA', 'lengthM', … */
  field: string
  from: unknown
  to: unknown
}

export interface ElementSummary {
  id: string
  label: string
  /** Part type; undefined for conductors. */
  type?: string
}

export interface ElementChanges {
  added: ElementSummary[]
  removed: ElementSummary[]
  changed: (ElementSummary & { fields: FieldChange[] })[]
}

export interface FindingSummary {
  id: string
  ruleId: string
  severity: Finding['severity']
  title: string
  partIds: string[]
  conductorIds: string[]
}

export interface DesignDiff {
  parts: ElementChanges
  conductors: ElementChanges
  findings: { appeared: FindingSummary[]; cleared: FindingSummary[] }
  /** Settings and name changes ('settings.ambientC', 'name'). */
  other: FieldChange[]
}

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b)

/** Field-by-field differences; keys in `nested` are compared one level deeper ('params.x'). */
function fieldChanges(from: Record<string, unknown>, to: Record<string, unknown>, nested: ReadonlySet<string>, prefix = ''): FieldChange[] {
  const changes: FieldChange[] = []
  const keys = [...new Set([...Object.keys(from), ...Object.keys(to)])].sort()
  for (const key of keys) {
    const a = from[key]
    const b = to[key]
    if (same(a, b)) continue
    if (nested.has(key) && a && b && typeof a === 'object' && typeof b === 'object') {
      changes.push(...fieldChanges(a as Record<string, unknown>, b as Record<string, unknown>, new Set(), `${prefix}${key}.`))
    } else {
      changes.push({ field: `${prefix}${key}`, from: a, to: b })
    }
  }
  return changes
}

function elementChanges<T extends { id: string; label: string }>(
  from: T[],
  to: T[],
  summary: (element: T) => ElementSummary,
  nested: ReadonlySet<string>,
): ElementChanges {
  const before = new Map(from.map((e) => [e.id, e]))
  const after = new Map(to.map((e) => [e.id, e]))
  const result: ElementChanges = { added: [], removed: [], changed: [] }
  for (const element of to) if (!before.has(element.id)) result.added.push(summary(element))
  for (const element of from) if (!after.has(element.id)) result.removed.push(summary(element))
  for (const element of to) {
    const old = before.get(element.id)
    if (!old) continue
    const fields = fieldChanges(old as unknown as Record<string, unknown>, element as unknown as Record<string, unknown>, nested)
    if (fields.length > 0) result.changed.push({ ...summary(element), fields })
  }
  return result
}

const findingSummary = (f: Finding): FindingSummary => ({
  id: f.id,
  ruleId: f.ruleId,
  severity: f.severity,
  title: f.title,
  partIds: f.partIds,
  conductorIds: f.conductorIds,
})

/**
 * @example
 * diffDesigns(revisionA, revisionB, analyzeDesign(revisionA).findings, analyzeDesign(revisionB).findings)
 */
export function diffDesigns(from: Design, to: Design, findingsFrom: Finding[] = [], findingsTo: Finding[] = []): DesignDiff {
  const beforeIds = new Set(findingsFrom.map((f) => f.id))
  const afterIds = new Set(findingsTo.map((f) => f.id))
  return {
    parts: elementChanges<Part>(from.parts, to.parts, (p) => ({ id: p.id, label: p.label, type: p.type }), new Set(['params'])),
    conductors: elementChanges<Conductor>(from.conductors, to.conductors, (c) => ({ id: c.id, label: c.label }), new Set()),
    findings: {
      appeared: findingsTo.filter((f) => !beforeIds.has(f.id)).map(findingSummary),
      cleared: findingsFrom.filter((f) => !afterIds.has(f.id)).map(findingSummary),
    },
    other: [
      ...fieldChanges({ name: from.name }, { name: to.name }, new Set()),
      ...fieldChanges({ settings: from.settings }, { settings: to.settings }, new Set(['settings'])),
    ],
  }
}
