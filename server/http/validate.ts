// validate({ body, query, params }) parses the request parts with zod schemas (400 invalid_request with
// field paths on failure) and keeps the typed result for the handler: `const { body } = input.data(req)`.
import type { Request, RequestHandler } from 'express'
import { ZodError, type ZodType, type output } from 'zod'

interface Schemas {
  body?: ZodType
  query?: ZodType
  params?: ZodType
}

type Parsed<S extends Schemas> = { [K in keyof S]: S[K] extends ZodType ? output<S[K]> : never }

export interface Validator<S extends Schemas> extends RequestHandler {
  data(req: Request): Parsed<S>
}

const parsedByRequest = new WeakMap<Request, Map<Validator<Schemas>, unknown>>()

export function validate<S extends Schemas>(schemas: S): Validator<S> {
  const middleware: RequestHandler = (req, _res, next) => {
    const parsed: Record<string, unknown> = {}
    const issues: ZodError['issues'] = []
    for (const part of ['params', 'query', 'body'] as const) {
      const schema = schemas[part]
      if (!schema) continue
      const result = schema.safeParse(part === 'body' ? (req.body ?? {}) : req[part])
      if (result.success) parsed[part] = result.data
      else issues.push(...result.error.issues)
    }
    if (issues.length > 0) throw new ZodError(issues)
    let forRequest = parsedByRequest.get(req)
    if (!forRequest) parsedByRequest.set(req, (forRequest = new Map()))
    forRequest.set(validator, parsed)
    next()
  }
  const validator = Object.assign(middleware, {
    data(req: Request): Parsed<S> {
      const parsed = parsedByRequest.get(req)?.get(validator)
      if (!parsed) throw new Error('validate(): data() called on a request this validator did not see')
      return parsed as Parsed<S>
    },
  }) as Validator<S>
  return validator
}
