// supertest against a running test server, with the Origin header every state-changing request needs
// and, optionally, a session cookie.
import request from 'supertest'
import type { AppConfig } from '../../server/config'
import type { DbOrTx } from '../../server/db/client'
import { startSession } from '../../server/modules/auth/sessions'
import { SESSION_COOKIE } from '../../server/security/session-token'

export type Api = ReturnType<typeof apiClient>
export type HttpMethod = 'get' | 'post' | 'put' | 'patch' | 'delete'

export function apiClient(baseUrl: string, cookie?: string) {
  const send = (method: HttpMethod, path: string) => {
    const req = request(baseUrl)[method](path).set('Origin', baseUrl)
    return cookie ? req.set('Cookie', cookie) : req
  }
  return {
    cookie,
    send,
    get: (path: string) => send('get', path),
    post: (path: string, body?: object) => send('post', path).send(body ?? {}),
    put: (path: string, body?: object) => send('put', path).send(body ?? {}),
    patch: (path: string, body?: object) => send('patch', path).send(body ?? {}),
    delete: (path: string) => send('delete', path),
  }
}

/** The `aw_session=...` pair from a response's Set-Cookie, for the Cookie header of later requests. */
export function sessionCookieFrom(headers: Record<string, unknown>): string {
  const setCookie = headers['set-cookie']
  const all = Array.isArray(setCookie) ? (setCookie as string[]) : typeof setCookie === 'string' ? [setCookie] : []
  const line = all.find((value) => value.startsWith(`${SESSION_COOKIE}=`))
  if (!line) throw new Error(`no ${SESSION_COOKIE} cookie in the response`)
  return line.split(';')[0]
}

/** Signs in through the API and returns a client carrying the session cookie. */
export async function signedInClient(baseUrl: string, email: string, password: string): Promise<Api> {
  const res = await apiClient(baseUrl).post('/api/auth/login', { email, password })
  if (res.status !== 200) throw new Error(`sign-in of ${email} failed: ${res.status} ${JSON.stringify(res.body)}`)
  return apiClient(baseUrl, sessionCookieFrom(res.headers))
}

/**
 * A client with a brand-new session for the user, started the way sign-in starts one (session row +
 * signed cookie) but without the bcrypt check: for tests that end sessions (sign-out rows of a table).
 */
export async function freshSessionClient(
  server: { baseUrl: string; db: DbOrTx; config: AppConfig },
  ids: { userId: string; organizationId: string },
): Promise<Api> {
  const { token } = await startSession(server, ids)
  return apiClient(server.baseUrl, `${SESSION_COOKIE}=${token}`)
}
