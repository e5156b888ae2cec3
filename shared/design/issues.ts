import type { z } from 'zod'

// Turning zod issues into what a person reads: a path like `parts[3].params.capacityAh` and a
// plain sentence where the schema gave none of its own.

const IDENTIFIER = /^[A-Za-z_$][A-Za-z0-9_$]*$/

/** `['parts', 3, 'params', 'capacityAh']` → `parts[3].params.capacityAh`; odd keys are quoted: `loads["pump-1"]`. */
export function formatIssuePath(path: readonly PropertyKey[]): string {
  let out = ''
  for (const segment of path) {
    if (typeof segment === 'number') out += `[${segment}]`
    else if (typeof segment === 'string' && IDENTIFIER.test(segment)) out += out ? `.${segment}` : segment
    else out += `[${JSON.stringify(String(segment))}]`
  }
  return out
}

const KIND_WORDS: Record<string, string> = {
  object: 'an object',
  array: 'a list',
  string: 'text',
  number: 'a number',
  boolean: 'true or false',
  record: 'an object',
}

/** Per-parse error map: only used where the schema did not set its own message. */
export const friendlyDefaultMessage: z.core.$ZodErrorMap = (issue) => {
  if (issue.code === 'invalid_type') {
    if (issue.input === undefined) return 'Required'
    const expected = KIND_WORDS[String(issue.expected)] ?? String(issue.expected)
    return `Must be ${expected}`
  }
  if (issue.code === 'too_big' && issue.origin === 'string') return `At most ${issue.maximum} characters`
  if (issue.code === 'too_small' && issue.origin === 'string') return 'Must not be empty'
  return undefined
}
