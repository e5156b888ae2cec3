// Who may open /collab/<projectId>. Editors (owner, designer) and watchers (reviewer, client with a
// share) join the room; the role's read-only flag is tested in collab.test.ts. A missing or ended
// session and a project the user cannot see are refused in-band — the handshake completes and the
// socket closes at once with 4401 / 4404 (a browser cannot read an HTTP status of a refused handshake).
// A foreign Origin or a path that is not /collab/<uuid> is refused with an HTTP status.
import { randomBytes, randomUUID } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signSessionToken, SESSION_COOKIE } from '../../server/security/session-token'
import { startSession } from '../../server/modules/auth/sessions'
import { COLLAB_CLOSE } from '../../shared/collab/protocol'
import { collabUrl, upgradeStatus, type UpgradeOutcome } from '../helpers/collab'
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
/** 'joined', the in-band close code, or the HTTP status of a refused handshake. */
const outcome = (o: UpgradeOutcome) => (o.status !== 101 ? o.status : o.closeCode === undefined ? 'joined' : o.closeCode)

describe('WebSocket upgrade on /collab/:projectId', () => {
  it.each([
    ['owner', 'joined'],
    ['designer', 'joined'],
    ['reviewer', 'joined'],
    ['client', 'joined'],
    ['otherClient', COLLAB_CLOSE.notFound],
  ] as const)('%s of the organisation → %s', async (who, expected) => {
    expect(outcome(await open(await cookieOf(orgA[who], orgA.id)))).toBe(expected)
  })

  it("another organisation's owner → closed with 4404 (never 4403)", async () => {
    const res = await open(await cookieOf(orgB.owner, orgB.id))
    expect(res).toMatchObject({ status: 101, closeCode: 4404, closeReason: 'Project not found' })
  })

  it('no cookie → closed with 4401 and a reason', async () => {
    const res = await open()
    expect(res).toMatchObject({ status: 101, closeCode: 4401, closeReason: 'Sign in to continue' })
  })

  it('an expired token → 401', async () => {
    const { sessionId } = await startSession(server, { userId: orgA.owner.id, organizationId: orgA.id })
    const expired = await signSessionToken(
      { userId: orgA.owner.id, organizationId: orgA.id, sessionId, expiresAt: new Date(Date.now() - 60_000) },
      server.config.jwtSecret,
    )
    expect(await open(`${SESSION_COOKIE}=${expired}`)).toMatchObject({ closeCode: 4401, closeReason: 'Your session has ended. Sign in again.' })
  })

  it('a token signed with another secret (forged) → 401', async () => {
    const { sessionId } = await startSession(server, { userId: orgA.owner.id, organizationId: orgA.id })
    const forged = await signSessionToken(
      { userId: orgA.owner.id, organizationId: orgA.id, sessionId, expiresAt: new Date(Date.now() + 3_600_000) },
      new TextEncoder().encode(randomBytes(32).toString('hex')),
    )
    expect(outcome(await open(`${SESSION_COOKIE}=${forged}`))).toBe(4401)
    expect(outcome(await open(`${SESSION_COOKIE}=not-a-token`))).toBe(4401)
  })

  it('a session that was signed out → 401', async () => {
    const { token } = await startSession(server, { userId: orgA.designer.id, organizationId: orgA.id })
    const cookie = `${SESSION_COOKIE}=${token}`
    expect(outcome(await open(cookie))).toBe('joined')
    const logout = await fetch(`${server.baseUrl}/api/auth/logout`, { method: 'POST', headers: { Cookie: cookie, Origin: server.baseUrl } })
    expect(logout.status).toBe(204)
    expect(outcome(await open(cookie))).toBe(4401)
  })

  it('an unknown project → 4404; a malformed id or another path → HTTP 404', async () => {
    const cookie = await cookieOf(orgA.owner, orgA.id)
    expect(outcome(await open(cookie, randomUUID()))).toBe(4404)
    expect((await open(cookie, 'not-a-uuid')).status).toBe(404)
    expect((await upgradeStatus(server.baseUrl.replace('http', 'ws') + '/elsewhere', { Cookie: cookie })).status).toBe(404)
  })

  it('a handshake from a foreign page (Origin of another site) → 403', async () => {
    const cookie = await cookieOf(orgA.owner, orgA.id)
    expect((await open(cookie, projectId, { Origin: 'https://attacker.example' })).status).toBe(403)
    expect(outcome(await open(cookie, projectId, { Origin: server.baseUrl }))).toBe('joined')
  })
})
