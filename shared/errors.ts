// Stable error codes shared by the API and the client. Every API error is sent as
// `{ error: { code, message, fields? } }`; the client shows `message` and, for forms, `fields`.

export const ERROR_CODES = [
  'invalid_request', // 400: a body, query or param failed its schema; `fields` says which
  'unauthenticated', // 401: no session, or it expired
  'forbidden', // 403: signed in, but the role does not allow this
  'not_found', // 404: absent, or belonging to another organisation
  'conflict', // 409: e.g. an e-mail address already registered
  'invalid_credentials', // 401: the same for an unknown user and a wrong password
  'rate_limited', // 429: too many sign-in attempts
  'bad_origin', // 403: a state-changing request from another origin
  'payload_too_large', // 413
  'internal', // 500: never carries the raw message
] as const
export type ErrorCode = (typeof ERROR_CODES)[number]

/** One invalid field: its dotted path in the submitted object and a sentence for a person. */
export interface FieldError {
  path: string
  message: string
}

export interface ApiErrorBody {
  error: { code: ErrorCode; message: string; fields?: FieldError[] }
}
