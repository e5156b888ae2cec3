// Who may open /collab/<projectId>: the upgrade is answered with an HTTP status before any WebSocket
// exists. Editors (owner, designer) and watchers (reviewer, client with a share) get 101; the role's
// read-only flag is tested in collab.test.ts. Everything else is refused like the API would refuse it.
import { randomBytes, randomUUID } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signSessionToken, SESSION_COOKIE } from '../../server/security/session-token'
import { startSession } from '../../server/modules/auth/sessions'
import { collabUrl, upgradeStatus } from '../helpers/collab'
import { createOrganization, createProject, type TestOrganization, type TestUser } from '../helpers/factories'
import { startTestServer, type TestServer } from '../helpers/server'

let server: TestServer
let orgA: TestOrganization
let orgB: TestOrganization
let projectId: string

beforeAll(async () => {
  server = await startTestServer()
  orgA = await createOrganization(server.db, 'Collab perms A')
  orgB = await createOrganization(server.db, 'Collab perms B')
  projectId = await createProject(server.db, orgA, { sharedWith: [orgA.client] })
})
afterAll(() => server.close())

async function cookieOf(user: TestUser, organizationId: string): Promise<string> {
  const { token } = await startSession(server, { userId: user.id, organizationId })
  return `${SESSION_COOKIE}=${token}`
}
const open = (cookie?: string, id = projectId, extra: Record<string, string> = {}) =>
  upgradeStatus(collabUrl(server.baseUrl, id), cookie ? { Cookie: cookie, ...extra } : extra)

describe('WebSocket upgrade on /collab/:projectId', () => {
  it.each([
    ['owner', 101],
    ['designer', 101],
    ['reviewer', 101],
    ['client', 101],
    ['otherClient', 404],
  ] as const)('%s of the organisation → %i', async (who, status) => {
    expect((await open(await cookieOf(orgA[who], orgA.id))).status).toBe(status)
  })

  it("another organisation's owner → 404 (never 403)", async () => {
    const res = await open(await cookieOf(orgB.owner, orgB.id))
    expect(res.status).toBe(404)
    expect(JSON.parse(res.body).error.code).toBe('not_found')
  })

  it('no cookie → 401', async () => {
    const res = await open()
    expect(res.status).toBe(401)
    expect(JSON.parse(res.body)).toEqual({ error: { code: 'unauthenticated', message: 'Sign in to continue' } })
  })

  it('an expired token → 401', async () => {
    const { sessionId } = await startSession(server, { userId: orgA.owner.id, organizationId: orgA.id })
    const expired = await signSessionToken(
      { userId: orgA.owner.id, organizationId: orgA.id, sessionId, expiresAt: new Date(Date.now() - 60_000) },
      server.config.jwtSecret,
    )
    expect((await open(`${SESSION_COOKIE}=${expired}`)).status).toBe(401)
  })

  it('a token signed with another secret (forged) → 401', async () => {
    const { sessionId } = await startSession(server, { userId: orgA.owner.id, organizationId: orgA.id })
    const forged = await signSessionToken(
      { userId: orgA.owner.id, organizationId: orgA.id, sessionId, expiresAt: new Date(Date.now() + 3_600_000) },
      new TextEncoder().encode(randomBytes(32).toString('hex')),
    )
    expect((await open(`${SESSION_COOKIE}=${forged}`)).status).toBe(401)
    expect((await open(`${SESSION_COOKIE}=not-a-token`)).status).toBe(401)
  })

  it('a session that was signed out → 401', async () => {
    const { token } = await startSession(server, { userId: orgA.designer.id, organizationId: orgA.id })
    const cookie = `${SESSION_COOKIE}=${token}`
    expect((await open(cookie)).status).toBe(101)
    const logout = await fetch(`${server.baseUrl}/api/auth/logout`, { method: 'POST', headers: { Cookie: cookie, Origin: server.baseUrl } })
    expect(logout.status).toBe(204)
    expect((await open(cookie)).status).toBe(401)
  })

  it('an unknown project, a malformed id or another path → 404', async () => {
    const cookie = await cookieOf(orgA.owner, orgA.id)
    expect((await open(cookie, randomUUID())).status).toBe(404)
    expect((await open(cookie, 'not-a-uuid')).status).toBe(404)
    expect((await upgradeStatus(server.baseUrl.replace('http', 'ws') + '/elsewhere', { Cookie: cookie })).status).toBe(404)
  })

  it('a handshake from a foreign page (Origin of another site) → 403', async () => {
    const cookie = await cookieOf(orgA.owner, orgA.id)
    expect((await open(cookie, projectId, { Origin: 'https://attacker.example' })).status).toBe(403)
    expect((await open(cookie, projectId, { Origin: server.baseUrl })).status).toBe(101)
  })
})
