// The one way the client talks to the API: same-origin JSON, typed errors.
import type { ApiErrorBody, ErrorCode, FieldError } from '@shared/errors'

/** `network` when the server could not be reached at all. */
export type ClientErrorCode = ErrorCode | 'network'

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: ClientErrorCode,
    message: string,
    readonly fields: FieldError[] = [],
  ) {
    super(message)
    this.name = 'ApiError'
  }
}

export function isApiError(err: unknown): err is ApiError {
  return err instanceof ApiError
}

type Query = Record<string, string | number | boolean | undefined | null>

export interface RequestOptions {
  body?: unknown
  query?: Query
  signal?: AbortSignal
  /** A 401 here is an expected answer (e.g. "who am I?"), not an expired session. */
  expectUnauthenticated?: boolean
}

let onUnauthenticated: (() => void) | null = null
let onForbidden: (() => void) | null = null

/** Wired once at start-up (router/guards.ts) so an expired session sends the user back to sign-in. */
export function setUnauthenticatedHandler(handler: () => void): void {
  onUnauthenticated = handler
}

/** Wired once at start-up: a 403 may mean our role changed meanwhile, so the session is re-read. */
export function setForbiddenHandler(handler: () => void): void {
  onForbidden = handler
}

function toUrl(path: string, query?: Query): string {
  const params = new URLSearchParams()
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value !== undefined && value !== null && value !== '') params.set(key, String(value))
  }
  const qs = params.toString()
  return `/api${path}${qs ? `?${qs}` : ''}`
}

async function readError(res: Response): Promise<ApiError> {
  try {
    const body = (await res.json()) as Partial<ApiErrorBody>
    if (body.error && typeof body.error.message === 'string') {
      return new ApiError(res.status, body.error.code ?? 'internal', body.error.message, body.error.fields ?? [])
    }
  } catch {
    // not JSON: fall through to a generic message
  }
  return new ApiError(res.status, res.status >= 500 ? 'internal' : 'invalid_request', `The server answered ${res.status} ${res.statusText}`.trim())
}

export async function request<T>(method: string, path: string, options: RequestOptions = {}): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' }
  if (options.body !== undefined) headers['Content-Type'] = 'application/json'
  let res: Response
  try {
    res = await fetch(toUrl(path, options.query), {
      method,
      headers,
      credentials: 'same-origin',
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      signal: options.signal,
    })
  } catch (err) {
    if (err instanceof DOMException && err.name === 'AbortError') throw err
    throw new ApiError(0, 'network', 'Cannot reach the Ampwright server. Check your connection and try again.')
  }
  if (!res.ok) {
    const error = await readError(res)
    if (error.status === 401 && error.code === 'unauthenticated' && !options.expectUnauthenticated) onUnauthenticated?.()
    if (error.status === 403 && error.code === 'forbidden') onForbidden?.()
    throw error
  }
  if (res.status === 204) return undefined as T
  const text = await res.text()
  return (text ? JSON.parse(text) : undefined) as T
}

export const http = {
  get: <T>(path: string, options?: RequestOptions) => request<T>('GET', path, options),
  post: <T>(path: string, body?: unknown, options?: RequestOptions) => request<T>('POST', path, { ...options, body }),
  patch: <T>(path: string, body?: unknown, options?: RequestOptions) => request<T>('PATCH', path, { ...options, body }),
  put: <T>(path: string, body?: unknown, options?: RequestOptions) => request<T>('PUT', path, { ...options, body }),
  delete: <T = void>(path: string, options?: RequestOptions) => request<T>('DELETE', path, options),
}
