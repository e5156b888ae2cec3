// Known errors are HttpErrors built by the factories below; one middleware serialises every error as
// `{ error: { code, message, fields? } }`. Anything unexpected becomes a generic 500, logged here only.
import type { ErrorRequestHandler } from 'express'
import { ZodError } from 'zod'
import type { ErrorCode, FieldError } from '../../shared/errors'

export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode,
    message: string,
    readonly fields?: FieldError[],
  ) {
    super(message)
    this.name = 'HttpError'
  }
}

export const invalidRequest = (message: string, fields?: FieldError[]) =>
  new HttpError(400, 'invalid_request', message, fields)
export const unauthenticated = (message = 'Sign in to continue') => new HttpError(401, 'unauthenticated', message)
export const invalidCredentials = () => new HttpError(401, 'invalid_credentials', 'E-mail or password is incorrect')
export const forbidden = (message: string) => new HttpError(403, 'forbidden', message)
export const badOrigin = () =>
  new HttpError(403, 'bad_origin', 'This request did not come from the Ampwright app and was refused')
export const notFound = (what: string) => new HttpError(404, 'not_found', `${what} not found`)
export const conflict = (message: string) => new HttpError(409, 'conflict', message)
export const rateLimited = (message: string) => new HttpError(429, 'rate_limited', message)

/** Zod issues as `[{ path: 'a.b.0', message }]`, with an optional prefix for the request part. */
export function fieldErrorsOf(error: ZodError): FieldError[] {
  return error.issues.map((issue) => ({
    path: issue.path.map(String).join('.'),
    message: issue.message,
  }))
}

function invalidRequestFromZod(error: ZodError): HttpError {
  const fields = fieldErrorsOf(error)
  const message = fields.length === 1 ? fields[0].message : 'Some fields are not valid'
  return invalidRequest(message, fields)
}

/** Errors raised by express.json() carry `type` and `status`. */
function bodyParserError(error: unknown): HttpError | undefined {
  const type = (error as { type?: unknown } | null)?.type
  if (type === 'entity.parse.failed') return invalidRequest('The request body is not valid JSON')
  if (type === 'entity.too.large') return new HttpError(413, 'payload_too_large', 'The request body is too large')
  if ((typeof type === 'string' && type.startsWith('encoding.')) || type === 'charset.unsupported') {
    return invalidRequest('The request body has an unsupported encoding')
  }
  return undefined
}

/** Client errors raised inside Express: the router's URIError (a malformed %-escape in a path, status
 * 400) and http-errors marked `expose`. */
function expressClientError(error: unknown): HttpError | undefined {
  const { status, expose } = (error ?? {}) as { status?: unknown; expose?: unknown }
  if (typeof status !== 'number' || status < 400 || status > 499) return undefined
  if (error instanceof URIError) return invalidRequest('The address contains an invalid %-escape')
  if (expose !== true) return undefined
  if (status === 404) return notFound('Page')
  return invalidRequest('The request could not be read')
}

export function toHttpError(error: unknown): HttpError | undefined {
  if (error instanceof HttpError) return error
  if (error instanceof ZodError) return invalidRequestFromZod(error)
  return bodyParserError(error) ?? expressClientError(error)
}

export const errorMiddleware: ErrorRequestHandler = (error, req, res, _next) => {
  let known = toHttpError(error)
  if (!known) {
    console.error(`[http] ${req.method} ${req.originalUrl} failed:`, error)
    known = new HttpError(500, 'internal', 'Something went wrong on the server. Please try again.')
  }
  if (res.headersSent) return
  const { status, code, message, fields } = known
  res.status(status).json({ error: fields ? { code, message, fields } : { code, message } })
}
