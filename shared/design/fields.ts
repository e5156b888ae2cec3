import { z } from 'zod'

// Field builders that give every parameter the same kind of message a person can act on,
// e.g. "Enter the capacity (Ah)" or "Capacity must be at most 5000 Ah", and attach what a form
// needs to draw the field (label, unit, limits, choices) as zod metadata: see `describeField`.

/** What a form needs to show one field. */
export interface FieldInfo {
  label: string
  kind: 'number' | 'boolean' | 'choice' | 'text' | 'list' | 'group'
  unit?: string
  min?: number
  max?: number
  integer?: boolean
  options?: readonly string[]
  optional?: boolean
  defaultValue?: unknown
}

const capitalise = (text: string) => text.charAt(0).toUpperCase() + text.slice(1)
const withUnit = (value: number, unit: string) => (unit ? `${value} ${unit}` : `${value}`)

export interface QuantityLimits {
  min: number
  max: number
  /** true: the value must be strictly above `min` (e.g. a length or a resistance). */
  minExclusive?: boolean
  int?: boolean
}

/** A number with a unit, e.g. quantity('capacity', 'Ah', { min: 1, max: 5000 }). */
export function quantity(label: string, unit: string, limits: QuantityLimits) {
  const name = capitalise(label)
  const asked = unit ? `${label} (${unit})` : label
  let schema = z.number({
    error: (issue) => (issue.input === undefined ? `Enter the ${asked}` : `${name} must be a number`),
  })
  if (limits.int) schema = schema.int(`${name} must be a whole number`)
  schema = limits.minExclusive
    ? schema.gt(limits.min, `${name} must be more than ${withUnit(limits.min, unit)}`)
    : schema.min(limits.min, `${name} must be at least ${withUnit(limits.min, unit)}`)
  return schema
    .max(limits.max, `${name} must be at most ${withUnit(limits.max, unit)}`)
    .meta({ label: name, kind: 'number', unit, min: limits.min, max: limits.max, integer: limits.int ?? false })
}

/** A yes/no setting: its form label, and the clause the error message asks about. */
export function flag(label: string, whether: string) {
  return z.boolean({ error: `Choose whether ${whether} (true or false)` }).meta({ label, kind: 'boolean' })
}

/** One of a fixed list of words. */
export function choice<const T extends readonly [string, ...string[]]>(label: string, values: T) {
  return z.enum(values, { error: `Choose the ${label}: ${values.join(', ')}` }).meta({ label: capitalise(label), kind: 'choice', options: values })
}

/** A short free-text label. */
export function labelText(label: string, maxLength = 80) {
  return z
    .string({ error: `Enter the ${label}` })
    .trim()
    .max(maxLength, `${capitalise(label)} must be at most ${maxLength} characters`)
    .meta({ label: capitalise(label), kind: 'text', max: maxLength })
}

/** A field's form metadata, looking through optional/default/nullable wrappers; null if it has none. */
export function describeField(schema: z.ZodType): FieldInfo | null {
  let inner: z.ZodType = schema
  let optional = false
  let defaultValue: unknown
  for (let depth = 0; depth < 5; depth++) {
    const def = (inner as { def: { type: string; innerType?: z.ZodType; defaultValue?: unknown } }).def
    if (def.type === 'optional' || def.type === 'nullable') optional = true
    else if (def.type === 'default') defaultValue = def.defaultValue
    else break
    inner = def.innerType as z.ZodType
  }
  const meta = z.globalRegistry.get(inner) as Partial<FieldInfo> | undefined
  if (!meta?.label || !meta.kind) return null
  return { ...(meta as FieldInfo), ...(optional ? { optional } : {}), ...(defaultValue !== undefined ? { defaultValue } : {}) }
}
