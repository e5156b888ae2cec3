import type { Finding } from './types'

/** Stable finding id: the rule and the sorted ids it targets (parts, then conductors). */
export function findingId(ruleId: string, partIds: readonly string[], conductorIds: readonly string[]): string {
  // Most findings name one target: no set and no sort for those (thousands per big design).
  if (partIds.length + conductorIds.length === 1) return `${ruleId}:${partIds.length ? partIds[0] : conductorIds[0]}`
  const targets = [...new Set([...partIds, ...conductorIds])].sort()
  return `${ruleId}:${targets.join('+')}`
}

/** Builds a finding with its stable id; callers give everything but the id. */
export function makeFinding(f: Omit<Finding, 'id'>): Finding {
  return { id: findingId(f.ruleId, f.partIds, f.conductorIds), ...f }
}

const SEVERITY_RANK = { error: 0, warning: 1, info: 2 } as const

/**
 * One list: where the same finding id comes from several scenarios keep the worst (highest measured
 * value, then the most severe), and sort errors first, then by id, so output is deterministic.
 */
export function mergeFindings(findings: readonly Finding[]): Finding[] {
  const byId = new Map<string, Finding>()
  for (const f of findings) {
    const seen = byId.get(f.id)
    if (!seen || worse(f, seen)) byId.set(f.id, f)
  }
  return [...byId.values()].sort(
    (a, b) => SEVERITY_RANK[a.severity] - SEVERITY_RANK[b.severity] || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0),
  )
}

function worse(a: Finding, b: Finding): boolean {
  if (SEVERITY_RANK[a.severity] !== SEVERITY_RANK[b.severity]) return SEVERITY_RANK[a.severity] < SEVERITY_RANK[b.severity]
  return (a.measured?.value ?? 0) > (b.measured?.value ?? 0)
}
