// Vuetify field rules from the shared zod schemas, so the client checks exactly what the API checks.
import { reactive } from 'vue'
import type { z } from 'zod'
import type { FieldError } from '@shared/errors'

export type FieldRule = (value: unknown) => true | string

/** One rule: the field's schema accepts the value, or the first issue's message is shown. */
export function zodRule(schema: z.ZodType): FieldRule {
  return (value) => {
    const result = schema.safeParse(value)
    return result.success || (result.error.issues[0]?.message ?? 'Invalid value')
  }
}

/** Rules for every field of an object schema: `rules.name`, `rules.email`, ... */
export function useZodRules<Shape extends z.ZodRawShape>(schema: z.ZodObject<Shape>): { [K in keyof Shape]: FieldRule[] } {
  const rules = {} as { [K in keyof Shape]: FieldRule[] }
  for (const key of Object.keys(schema.shape) as (keyof Shape)[]) {
    rules[key] = [zodRule(schema.shape[key] as unknown as z.ZodType)]
  }
  return rules
}

/** Issues (from zod or from the API's `fields`) keyed by their top-level field name. */
export function fieldMessages(issues: readonly FieldError[] | readonly z.core.$ZodIssue[]): Record<string, string[]> {
  const out: Record<string, string[]> = {}
  for (const issue of issues) {
    const path = typeof issue.path === 'string' ? issue.path : issue.path.map(String).join('.')
    const key = path.split('.')[0] || '_'
    ;(out[key] ??= []).push(issue.message)
  }
  return out
}

/**
 * Errors the server returned for fields, shown under those fields until the user edits them.
 * `form` holds anything that matches no field, so it is never lost.
 */
export function useServerFieldErrors<Key extends string>(fieldNames: readonly Key[]) {
  const byField = reactive<Record<string, string[]>>({}) as Record<Key, string[]>
  const state = reactive({ form: [] as string[] })
  function clear(field?: Key): void {
    for (const key of field ? [field] : fieldNames) byField[key] = []
    if (!field) state.form = []
  }
  function set(fields: readonly FieldError[]): void {
    clear()
    for (const [key, messages] of Object.entries(fieldMessages(fields))) {
      if ((fieldNames as readonly string[]).includes(key)) byField[key as Key] = messages
      else state.form.push(...messages)
    }
  }
  clear()
  return { byField, state, set, clear }
}
