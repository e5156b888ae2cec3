import { z } from 'zod'

// Field builders that give every parameter the same kind of message a person can act on,
// e.g. "Enter the capacity (Ah)" or "Capacity must be at most 5000 Ah".

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
  return schema.max(limits.max, `${name} must be at most ${withUnit(limits.max, unit)}`)
}

/** A yes/no setting. */
export function flag(label: string) {
  return z.boolean({ error: `Choose whether ${label} (true or false)` })
}

/** One of a fixed list of words. */
export function choice<const T extends readonly [string, ...string[]]>(label: string, values: T) {
  return z.enum(values, { error: `Choose the ${label}: ${values.join(', ')}` })
}

/** A short free-text label. */
export function labelText(label: string, maxLength = 80) {
  return z
    .string({ error: `Enter the ${label}` })
    .trim()
    .max(maxLength, `${capitalise(label)} must be at most ${maxLength} characters`)
}
