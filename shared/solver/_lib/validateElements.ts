import type { Circuit, CircuitElement, SolverProblem } from '../circuit'

/** An element's first terminal in its own order: a, pos or from. (No tuple: these run per element per call.) */
export function firstNode(element: CircuitElement): number {
  return element.kind === 'resistor' ? element.a : element.kind === 'isource' ? element.from : element.pos
}

/** An element's second terminal: b, neg or to. */
export function secondNode(element: CircuitElement): number {
  return element.kind === 'resistor' ? element.b : element.kind === 'isource' ? element.to : element.neg
}

function isNode(node: unknown, nodeCount: number): boolean {
  return Number.isInteger(node) && (node as number) >= 0 && (node as number) < nodeCount
}

const KINDS = new Set(['resistor', 'vsource', 'isource', 'cpower'])

function elementError(element: CircuitElement, nodeCount: number): string | null {
  if (!KINDS.has(element.kind)) return `unknown element kind ${String((element as { kind: unknown }).kind)}`
  if (!isNode(firstNode(element), nodeCount) || !isNode(secondNode(element), nodeCount)) return `terminal node out of range 0..${nodeCount - 1}`
  switch (element.kind) {
    case 'resistor':
      return Number.isFinite(element.resistanceOhm) && element.resistanceOhm > 0
        ? null
        : `resistance must be a finite value above 0 Ω (got ${element.resistanceOhm})`
    case 'vsource':
      if (!Number.isFinite(element.voltageV)) return `voltage must be finite (got ${element.voltageV})`
      return Number.isFinite(element.resistanceOhm) && element.resistanceOhm > 0
        ? null
        : `internal resistance must be a finite value above 0 Ω (got ${element.resistanceOhm})`
    case 'isource':
      return Number.isFinite(element.currentA) ? null : `current must be finite (got ${element.currentA})`
    case 'cpower':
      if (!Number.isFinite(element.powerW)) return `power must be finite (got ${element.powerW})`
      return Number.isFinite(element.minVoltageV) && element.minVoltageV > 0
        ? null
        : `minimum voltage must be a finite value above 0 V (got ${element.minVoltageV})`
    default:
      return `unknown element kind ${(element as { kind: unknown }).kind}`
  }
}

export interface ValidationResult {
  /** 1 for elements that take part in the solve. */
  valid: Uint8Array
  problems: SolverProblem[]
}

/** Checks every element; invalid ones are left out of the solve (treated as open) and reported. */
export function validateElements(circuit: Circuit): ValidationResult {
  const { elements, nodeCount } = circuit
  const valid = new Uint8Array(elements.length)
  const byMessage = new Map<string, string[]>()
  for (let e = 0; e < elements.length; e++) {
    const element = elements[e]
    const message =
      element && typeof element === 'object' ? elementError(element, nodeCount) : 'element is not an object'
    if (message === null) valid[e] = 1
    else {
      const ids = byMessage.get(message) ?? []
      ids.push(String(element?.id ?? `#${e}`))
      byMessage.set(message, ids)
    }
  }
  const problems: SolverProblem[] = []
  for (const [message, elementIds] of byMessage) problems.push({ kind: 'invalid-element', elementIds, message })
  return { valid, problems }
}
