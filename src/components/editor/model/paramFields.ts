import type { z } from 'zod'
import { cToF, fToC, ftToM, mToFt } from '@shared/units'

// Form fields derived from the catalogue's zod parameter schemas, so the inspector, the API and the
// analysis share one definition of what a valid part is. Labels and units are read from the
// schema's own "Enter the … (unit)" message, falling back to the key.

export type UnitSystem = 'metric' | 'imperial'

export type ParamField =
  | { kind: 'number'; key: string; label: string; unit: string; min?: number; max?: number; int: boolean; optional: boolean }
  | { kind: 'choice'; key: string; label: string; options: string[] }
  | { kind: 'flag'; key: string; label: string }
  | { kind: 'number-list'; key: string; label: string; unit: string }
  | { kind: 'group'; key: string; label: string; optional: boolean; fields: ParamField[] }

type AnySchema = z.ZodType & { def: { type: string; innerType?: AnySchema } }

function unwrap(schema: AnySchema): { inner: AnySchema; optional: boolean } {
  let inner = schema
  let optional = false
  while (inner.def.type === 'optional' || inner.def.type === 'default' || inner.def.type === 'nullable') {
    if (inner.def.type === 'optional' || inner.def.type === 'nullable') optional = true
    inner = inner.def.innerType as AnySchema
  }
  return { inner, optional }
}

const humanise = (key: string) =>
  key
    .replace(/(Ah|Ohm|PctPerC|A|V|W|C|M|S)$/, '')
    .replace(/([a-z])([A-Z])/g, '$1 $2')
    .toLowerCase()

/** "Enter the capacity per battery (Ah)" → { label: 'capacity per battery', unit: 'Ah' } */
function describe(schema: AnySchema, key: string): { label: string; unit: string } {
  const result = schema.safeParse(undefined)
  const message = result.success ? '' : (result.error.issues[0]?.message ?? '')
  const enter = /^Enter the (.+?)(?: \(([^)]+)\))?$/.exec(message)
  if (enter) return { label: enter[1], unit: enter[2] ?? '' }
  const choose = /^Choose the (.+?):/.exec(message) ?? /^Choose whether (.+?) \(true or false\)$/.exec(message)
  if (choose) return { label: choose[1], unit: '' }
  return { label: humanise(key), unit: '' }
}

export function fieldsOf(schema: z.ZodType): ParamField[] {
  const { inner } = unwrap(schema as AnySchema)
  const shape = (inner as unknown as { shape?: Record<string, AnySchema> }).shape
  if (!shape) return []
  return Object.entries(shape).map(([key, fieldSchema]) => fieldOf(key, fieldSchema))
}

function fieldOf(key: string, schema: AnySchema): ParamField {
  const { inner, optional } = unwrap(schema)
  const { label, unit } = describe(inner, key)
  switch (inner.def.type) {
    case 'number': {
      const num = inner as unknown as { minValue: number | null; maxValue: number | null; isInt: boolean }
      return {
        kind: 'number', key, label, unit, optional, int: num.isInt,
        min: num.minValue ?? undefined, max: num.maxValue ?? undefined,
      }
    }
    case 'enum':
      return { kind: 'choice', key, label, options: [...(inner as unknown as { options: string[] }).options] }
    case 'boolean':
      return { kind: 'flag', key, label }
    case 'array': {
      const element = describe((inner as unknown as { element: AnySchema }).element, key)
      return { kind: 'number-list', key, label: element.label, unit: element.unit }
    }
    case 'object':
      return { kind: 'group', key, label: humanise(key), optional, fields: fieldsOf(inner) }
    default:
      return { kind: 'choice', key, label, options: [] }
  }
}

/** How a stored SI value is shown in the chosen unit system (lengths and temperatures convert). */
export interface DisplayUnit {
  unit: string
  toDisplay: (valueSi: number) => number
  fromDisplay: (value: number) => number
}

const identity = (unit: string): DisplayUnit => ({ unit, toDisplay: (v) => v, fromDisplay: (v) => v })

export function displayUnit(siUnit: string, system: UnitSystem): DisplayUnit {
  if (system === 'imperial' && siUnit === 'm') return { unit: 'ft', toDisplay: mToFt, fromDisplay: ftToM }
  if (system === 'imperial' && siUnit === '°C') return { unit: '°F', toDisplay: cToF, fromDisplay: fToC }
  return identity(siUnit)
}

/** Parse what a person typed into a number field: '' → undefined, '1,5' → 1.5, junk → NaN. */
export function parseTypedNumber(text: string): number | undefined {
  const trimmed = text.trim().replace(',', '.')
  if (trimmed === '') return undefined
  return /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(trimmed) ? Number(trimmed) : Number.NaN
}

/** Round a converted value for an input box so 3.28083989… shows as 3.281. */
export function roundForInput(value: number): number {
  if (!Number.isFinite(value)) return value
  const magnitude = Math.abs(value)
  const digits = magnitude === 0 ? 0 : magnitude >= 100 ? 2 : magnitude >= 1 ? 3 : magnitude >= 0.01 ? 4 : 7
  return Number(value.toFixed(digits))
}

/** Issues of a candidate params object, keyed by dotted path. */
export function issuesByPath(schema: z.ZodType, candidate: unknown): Map<string, string> {
  const result = schema.safeParse(candidate)
  const issues = new Map<string, string>()
  if (!result.success) {
    for (const issue of result.error.issues) {
      const path = issue.path.map(String).join('.')
      if (!issues.has(path)) issues.set(path, issue.message)
    }
  }
  return issues
}

/**
 * Validates setting `key` to `value` in `params`. Returns the message to show on that field, or
 * null when the whole object stays valid. An edit that breaks another field (e.g. switching a load
 * to constant current before its current is entered) is refused with that field's message.
 */
export function validateParamEdit(schema: z.ZodType, params: Record<string, unknown>, key: string, value: unknown): string | null {
  const before = issuesByPath(schema, params)
  const candidate = { ...params, [key]: value }
  if (value === undefined) delete candidate[key]
  const after = issuesByPath(schema, candidate)
  for (const [path, message] of after) {
    if (path === key || path.startsWith(`${key}.`)) return message
  }
  for (const [path, message] of after) {
    if (!before.has(path)) return message
  }
  return null
}

export interface FieldHandlers {
  validate: (value: unknown) => string | null
  commit: (value: unknown) => void
}

/**
 * One validator and one commit handler per field key, made once: a side form that handed its fields
 * new functions on every render would re-render every field on each edit, not only the changed one.
 */
export function fieldHandlersOf(
  keys: readonly string[],
  validate: (key: string, value: unknown) => string | null,
  commit: (key: string, value: unknown) => void,
): Record<string, FieldHandlers> {
  return Object.fromEntries(keys.map((key) => [key, { validate: (value: unknown) => validate(key, value), commit: (value: unknown) => commit(key, value) }]))
}
