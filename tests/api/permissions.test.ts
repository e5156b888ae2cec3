// The whole permission matrix, table-driven: every route × every actor (each role; a client with and
// without a share of the project; no session; the owner of another organisation). The expected status
// follows from the API contract (/api rules in the docs) and shared/api/roles.ts:
//   no session → 401; role outside the route's list → 403; client on a project not shared with them → 404;
//   another organisation's resource → 404 (never 403); otherwise the route's success status.
import { randomUUID } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Role } from '../../shared/api/roles'
import { createDemoDesign } from '../../shared/design/demo'
import { designRevisions, invitations, shareLinks } from '../../server/db/schema'
import { shareTokenCipher } from '../../server/modules/shares/shareTokenCipher'
import { newOneTimeToken } from '../../server/security/one-time-tokens'
import { insertDevice } from '../../server/modules/devices/devices.repository'
import { createMember, createOrganization, createProject, TEST_PASSWORD, uniqueEmail, type TestOrganization } from '../helpers/factories'
import { apiClient, freshSessionClient, signedInClient, type Api, type HttpMethod } from '../helpers/http'
import { startTestServer, type TestServer } from '../helpers/server'

type Actor = Role | 'unsharedClient' | 'anonymous' | 'otherOrgOwner'
const ACTORS: Actor[] = ['owner', 'designer', 'reviewer', 'client', 'unsharedClient', 'anonymous', 'otherOrgOwner']
const ALL_ROLES: Role[] = ['owner', 'designer', 'reviewer', 'client']

interface RouteCase {
  method: HttpMethod
  path: string // as in the contract, for the test name
  allowed: Role[]
  success: number
  /** The path names a resource of organisation A (another organisation's owner must get 404). */
  resource: boolean
  /** The resource is a project: a client without a share of it gets 404. */
  projectScoped: boolean
  /** The request ends the session it is sent with: send it with a fresh session of the actor. */
  endsSession?: boolean
  /** Builds a fresh target for one request (mutating routes must not affect the next row). */
  target(): Promise<{ url: string; body?: object }>
}

let server: TestServer
let orgA: TestOrganization
let orgB: TestOrganization
const clients = {} as Record<Actor, Api>

/** A project of organisation A shared with its client member (not with the unshared client). */
const freshProject = () => createProject(server.db, orgA, { nominalVoltageV: 24, sharedWith: [orgA.client] })

async function freshInvitation(): Promise<string> {
  const [row] = await server.db
    .insert(invitations)
    .values({
      organizationId: orgA.id,
      email: uniqueEmail('matrix-invite'),
      role: 'client',
      tokenHash: newOneTimeToken().tokenHash,
      invitedBy: orgA.owner.id,
      expiresAt: new Date(Date.now() + 86_400_000),
    })
    .returning({ id: invitations.id })
  return row.id
}

/** An invented datasheet device of organisation A (device library), inserted directly. */
const DEVICE = {
  name: 'Matrix fuse 20 A', kind: 'fuse' as const, ratingA: 20, dcVoltageRatingV: 32, interruptingRatingA: 2000,
  ignitionProtected: false, timeDelay: false, source: 'invented test points',
  points: [{ currentA: 27, minMeltS: 120, maxClearS: 1800 }, { currentA: 70, minMeltS: 0.1, maxClearS: 0.5 }],
}
const freshDevice = async () => (await insertDevice(server.db, orgA.id, orgA.owner.id, DEVICE)).id
const NON_CLIENT: Role[] = ['owner', 'designer', 'reviewer']

/** A revision (the demo design) of the project, inserted directly. */
async function freshRevision(projectId: string): Promise<string> {
  const [row] = await server.db
    .insert(designRevisions)
    .values({ projectId, name: 'matrix', snapshot: new Uint8Array([0, 0]), design: createDemoDesign(), createdBy: orgA.owner.id })
    .returning({ id: designRevisions.id })
  return row.id
}

/** A live share link of the project whose token the server kept (encrypted), inserted directly. */
async function freshShareLink(projectId: string): Promise<string> {
  const { token, tokenHash } = newOneTimeToken()
  const [row] = await server.db
    .insert(shareLinks)
    .values({ projectId, tokenHash, tokenCiphertext: shareTokenCipher(server.config.jwtSecret).encrypt(token, tokenHash),
      createdBy: orgA.owner.id, expiresAt: new Date(Date.now() + 86_400_000) })
    .returning({ id: shareLinks.id })
  return row.id
}

const projectRoute = (
  method: HttpMethod,
  path: string,
  allowed: Role[],
  success: number,
  target: (projectId: string) => Promise<{ url: string; body?: object }>,
): RouteCase => ({
  method,
  path,
  allowed,
  success,
  resource: true,
  projectScoped: true,
  target: async () => target(await freshProject()),
})

const ROUTES: RouteCase[] = [
  {
    method: 'get', path: '/api/auth/me', allowed: ALL_ROLES, success: 200, resource: false, projectScoped: false,
    target: async () => ({ url: '/api/auth/me' }),
  },
  {
    method: 'post', path: '/api/auth/logout', allowed: ALL_ROLES, success: 204, resource: false, projectScoped: false,
    endsSession: true,
    target: async () => ({ url: '/api/auth/logout' }),
  },
  {
    method: 'get', path: '/api/projects', allowed: ALL_ROLES, success: 200, resource: false, projectScoped: false,
    target: async () => ({ url: '/api/projects' }),
  },
  {
    method: 'post', path: '/api/projects', allowed: ['owner', 'designer'], success: 201, resource: false, projectScoped: false,
    target: async () => ({ url: '/api/projects', body: { name: 'Matrix', installationKind: 'vessel', nominalVoltageV: 12 } }),
  },
  {
    method: 'post', path: '/api/projects/demo', allowed: ['owner', 'designer'], success: 201, resource: false, projectScoped: false,
    target: async () => ({ url: '/api/projects/demo' }),
  },
  projectRoute('get', '/api/projects/:id', ALL_ROLES, 200, async (id) => ({ url: `/api/projects/${id}` })),
  projectRoute('patch', '/api/projects/:id', ['owner', 'designer'], 200, async (id) => ({
    url: `/api/projects/${id}`,
    body: { name: 'Renamed' },
  })),
  projectRoute('post', '/api/projects/:id/duplicate', ['owner', 'designer'], 201, async (id) => ({
    url: `/api/projects/${id}/duplicate`,
  })),
  projectRoute('delete', '/api/projects/:id', ['owner'], 204, async (id) => ({ url: `/api/projects/${id}` })),
  projectRoute('get', '/api/projects/:id/shares', ['owner', 'designer', 'reviewer'], 200, async (id) => ({
    url: `/api/projects/${id}/shares`,
  })),
  projectRoute('post', '/api/projects/:id/shares', ['owner', 'designer'], 201, async (id) => {
    const newClient = await createMember(server.db, orgA.id, 'client', 'matrix-share')
    return { url: `/api/projects/${id}/shares`, body: { userId: newClient.id } }
  }),
  projectRoute('delete', '/api/projects/:id/shares/:userId', ['owner', 'designer'], 204, async (id) => ({
    url: `/api/projects/${id}/shares/${orgA.client.id}`,
  })),
  projectRoute('post', '/api/projects/:id/share-links/:linkId/email', ['owner', 'designer'], 200, async (id) => ({
    url: `/api/projects/${id}/share-links/${await freshShareLink(id)}/email`,
    body: { email: uniqueEmail('matrix-share-mail') },
  })),
  projectRoute('get', '/api/projects/:id/design', ALL_ROLES, 200, async (id) => ({ url: `/api/projects/${id}/design` })),
  projectRoute('put', '/api/projects/:id/design', ['owner', 'designer'], 200, async (id) => ({
    url: `/api/projects/${id}/design`,
    body: { design: createDemoDesign(), baseRevision: 1 },
  })),
  projectRoute('get', '/api/projects/:id/revisions', ALL_ROLES, 200, async (id) => ({ url: `/api/projects/${id}/revisions` })),
  projectRoute('post', '/api/projects/:id/revisions', ['owner', 'designer'], 201, async (id) => ({
    url: `/api/projects/${id}/revisions`,
    body: { name: 'issued for review' },
  })),
  projectRoute('get', '/api/projects/:id/revisions/:revisionId', ALL_ROLES, 200, async (id) => ({
    url: `/api/projects/${id}/revisions/${await freshRevision(id)}`,
  })),
  projectRoute('get', '/api/projects/:id/revisions/compare', ALL_ROLES, 200, async (id) => ({
    url: `/api/projects/${id}/revisions/compare?from=${await freshRevision(id)}&to=${await freshRevision(id)}`,
  })),
  projectRoute('post', '/api/projects/:id/revisions/:revisionId/restore', ['owner', 'designer'], 201, async (id) => ({
    url: `/api/projects/${id}/revisions/${await freshRevision(id)}/restore`,
  })),
  {
    method: 'get', path: '/api/members', allowed: ['owner', 'designer', 'reviewer'], success: 200, resource: false,
    projectScoped: false, target: async () => ({ url: '/api/members' }),
  },
  {
    method: 'patch', path: '/api/members/:userId', allowed: ['owner'], success: 200, resource: true, projectScoped: false,
    target: async () => {
      const member = await createMember(server.db, orgA.id, 'reviewer', 'matrix-role')
      return { url: `/api/members/${member.id}`, body: { role: 'designer' } }
    },
  },
  {
    method: 'delete', path: '/api/members/:userId', allowed: ['owner'], success: 204, resource: true, projectScoped: false,
    target: async () => ({ url: `/api/members/${(await createMember(server.db, orgA.id, 'client', 'matrix-remove')).id}` }),
  },
  {
    method: 'get', path: '/api/invitations', allowed: ['owner'], success: 200, resource: false, projectScoped: false,
    target: async () => ({ url: '/api/invitations' }),
  },
  {
    method: 'post', path: '/api/invitations', allowed: ['owner'], success: 201, resource: false, projectScoped: false,
    target: async () => ({ url: '/api/invitations', body: { email: uniqueEmail('matrix-new'), role: 'client' } }),
  },
  {
    method: 'delete', path: '/api/invitations/:id', allowed: ['owner'], success: 204, resource: true, projectScoped: false,
    target: async () => ({ url: `/api/invitations/${await freshInvitation()}` }),
  },
  {
    method: 'get', path: '/api/outbox', allowed: ['owner'], success: 200, resource: false, projectScoped: false,
    target: async () => ({ url: '/api/outbox' }),
  },
  {
    method: 'get', path: '/api/devices', allowed: NON_CLIENT, success: 200, resource: false, projectScoped: false,
    target: async () => ({ url: '/api/devices' }),
  },
  {
    method: 'post', path: '/api/devices', allowed: ['owner', 'designer'], success: 201, resource: false, projectScoped: false,
    target: async () => ({ url: '/api/devices', body: DEVICE }),
  },
  {
    method: 'post', path: '/api/devices/import-csv', allowed: ['owner', 'designer'], success: 201, resource: false, projectScoped: false,
    target: async () => ({ url: '/api/devices/import-csv', body: { ...DEVICE, points: undefined, csv: 'currentA,minMeltS,maxClearS\n27,120,1800\n70,0.1,0.5\n' } }),
  },
  {
    method: 'get', path: '/api/devices/:id', allowed: NON_CLIENT, success: 200, resource: true, projectScoped: false,
    target: async () => ({ url: `/api/devices/${await freshDevice()}` }),
  },
  {
    method: 'patch', path: '/api/devices/:id', allowed: ['owner', 'designer'], success: 200, resource: true, projectScoped: false,
    target: async () => ({ url: `/api/devices/${await freshDevice()}`, body: { name: 'Matrix fuse, renamed' } }),
  },
  {
    method: 'delete', path: '/api/devices/:id', allowed: ['owner', 'designer'], success: 204, resource: true, projectScoped: false,
    target: async () => ({ url: `/api/devices/${await freshDevice()}` }),
  },
  {
    method: 'post', path: '/api/analyze', allowed: ALL_ROLES, success: 200, resource: false, projectScoped: false,
    target: async () => ({ url: '/api/analyze', body: { design: createDemoDesign() } }),
  },
]

function expectedStatus(route: RouteCase, actor: Actor): number {
  if (actor === 'anonymous') return 401
  if (actor === 'otherOrgOwner') return route.resource ? 404 : route.success
  const role: Role = actor === 'unsharedClient' ? 'client' : actor
  if (!route.allowed.includes(role)) return 403
  if (actor === 'unsharedClient' && route.projectScoped) return 404
  return route.success
}

function freshSessionFor(actor: Exclude<Actor, 'anonymous'>): Promise<Api> {
  const users = { owner: orgA.owner, designer: orgA.designer, reviewer: orgA.reviewer, client: orgA.client, unsharedClient: orgA.otherClient }
  const ids = actor === 'otherOrgOwner'
    ? { userId: orgB.owner.id, organizationId: orgB.id }
    : { userId: users[actor].id, organizationId: orgA.id }
  return freshSessionClient(server, ids)
}

const CODE_BY_STATUS: Record<number, string> = { 401: 'unauthenticated', 403: 'forbidden', 404: 'not_found' }

const rows = ROUTES.flatMap((route) =>
  ACTORS.map((actor) => ({ name: `${route.method.toUpperCase()} ${route.path}`, actor, route, expected: expectedStatus(route, actor) })),
)

beforeAll(async () => {
  server = await startTestServer()
  orgA = await createOrganization(server.db, 'Matrix A')
  orgB = await createOrganization(server.db, 'Matrix B')
  const signIn = (email: string) => signedInClient(server.baseUrl, email, TEST_PASSWORD)
  clients.owner = await signIn(orgA.owner.email)
  clients.designer = await signIn(orgA.designer.email)
  clients.reviewer = await signIn(orgA.reviewer.email)
  clients.client = await signIn(orgA.client.email)
  clients.unsharedClient = await signIn(orgA.otherClient.email)
  clients.otherOrgOwner = await signIn(orgB.owner.email)
  clients.anonymous = apiClient(server.baseUrl)
}, 120_000)
afterAll(() => server.close())

describe('permission matrix', () => {
  it('covers every route of the contract that needs a session, for every actor', () => {
    expect(rows).toHaveLength(ROUTES.length * ACTORS.length)
    expect(new Set(ROUTES.map((r) => `${r.method} ${r.path}`)).size).toBe(ROUTES.length)
  })

  it.each(rows)('$name as $actor → $expected', async ({ route, actor, expected }) => {
    const { url, body } = await route.target()
    const api = route.endsSession && actor !== 'anonymous' ? await freshSessionFor(actor) : clients[actor]
    const req = api.send(route.method, url)
    const res = body ? await req.send(body) : await req
    expect(res.status, JSON.stringify(res.body)).toBe(expected)
    if (expected >= 400) {
      expect(res.body.error.code).toBe(CODE_BY_STATUS[expected])
      if (expected === 403) expect(res.body.error.message).toMatch(/^Your role \((owner|designer|reviewer|client)\) cannot \w/)
    }
  })
})

describe('organisation isolation in lists', () => {
  it("another organisation's projects, members and invitations never appear", async () => {
    const marker = `Isolation ${randomUUID().slice(0, 8)}`
    await createProject(server.db, orgA, { name: marker })
    const theirProjects = await clients.otherOrgOwner.get(`/api/projects?q=${encodeURIComponent(marker)}&archived=include`)
    expect(theirProjects.body.total).toBe(0)
    const ourProjects = await clients.owner.get(`/api/projects?q=${encodeURIComponent(marker)}`)
    expect(ourProjects.body.total).toBe(1)

    const theirMembers: { email: string }[] = (await clients.otherOrgOwner.get('/api/members')).body
    expect(theirMembers.map((m) => m.email)).not.toContain(orgA.owner.email)
    expect(theirMembers).toHaveLength(5)

    const invitationId = await freshInvitation()
    const theirInvitations: { id: string }[] = (await clients.otherOrgOwner.get('/api/invitations')).body
    expect(theirInvitations.map((i) => i.id)).not.toContain(invitationId)
  })

  it('a client sees only the projects shared with them in the list', async () => {
    const shared = await freshProject()
    const unshared = await createProject(server.db, orgA)
    const seen = async (api: Api) =>
      ((await api.get('/api/projects?pageSize=100&archived=include')).body.items as { id: string }[]).map((p) => p.id)
    const sharedClientSees = await seen(clients.client)
    expect(sharedClientSees).toContain(shared)
    expect(sharedClientSees).not.toContain(unshared)
    expect(await seen(clients.unsharedClient)).toEqual([])
  })

  it('the public routes need no session', async () => {
    const anonymous = clients.anonymous
    expect((await anonymous.get('/api/health')).body).toEqual({ ok: true })
    expect((await anonymous.get(`/api/invitations/lookup/${'x'.repeat(43)}`)).status).toBe(404)
  })
})
