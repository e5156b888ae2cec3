// Cross-cutting HTTP behaviour: the origin check on state-changing requests, the error shape (no stack
// traces, generic 500), unknown API routes, security headers, and serving the built client.
import { randomUUID } from 'node:crypto'
import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createApp } from '../../server/app'
import { connectDatabase } from '../../server/db/client'
import { createMailer } from '../../server/mail/mailer'
import { SESSION_COOKIE, signSessionToken } from '../../server/security/session-token'
import { startSession } from '../../server/modules/auth/sessions'
import { createOrganization, TEST_PASSWORD, uniqueEmail, type TestOrganization } from '../helpers/factories'
import { apiClient, signedInClient } from '../helpers/http'
import { startTestServer, type TestServer } from '../helpers/server'

let server: TestServer
let org: TestOrganization
const BAD_ORIGIN = { code: 'bad_origin', message: 'This request did not come from the Ampwright app and was refused' }

beforeAll(async () => {
  server = await startTestServer()
  org = await createOrganization(server.db, 'Basics')
})
afterAll(() => server.close())

describe('origin check on state-changing requests', () => {
  const login = () => ({ email: org.owner.email, password: TEST_PASSWORD })

  it('refuses a POST without Origin or Referer, and one from another site (403 bad_origin)', async () => {
    const none = await request(server.baseUrl).post('/api/auth/login').send(login())
    expect(none.status).toBe(403)
    expect(none.body.error).toEqual(BAD_ORIGIN)
    const foreign = await request(server.baseUrl).post('/api/auth/login').set('Origin', 'http://evil.example').send(login())
    expect(foreign.status).toBe(403)
    const opaque = await request(server.baseUrl).post('/api/auth/login').set('Origin', 'null').send(login())
    expect(opaque.status).toBe(403)
    const otherPort = await request(server.baseUrl).post('/api/auth/login').set('Origin', 'http://127.0.0.1:1').send(login())
    expect(otherPort.status).toBe(403)
  })

  it('accepts a same-origin Referer when Origin is absent', async () => {
    const res = await request(server.baseUrl).post('/api/auth/login').set('Referer', `${server.baseUrl}/sign-in`).send(login())
    expect(res.status).toBe(200)
  })

  it('refuses PUT, PATCH and DELETE from another origin even with a valid session cookie', async () => {
    const owner = await signedInClient(server.baseUrl, org.owner.email, TEST_PASSWORD)
    for (const method of ['put', 'patch', 'delete'] as const) {
      const res = await request(server.baseUrl)[method](`/api/members/${org.client.id}`).set('Cookie', owner.cookie!).set('Origin', 'https://elsewhere.example').send({ role: 'reviewer' })
      expect(res.status).toBe(403)
      expect(res.body.error.code).toBe('bad_origin')
    }
    expect((await owner.get('/api/members')).body.find((m: { userId: string }) => m.userId === org.client.id).role).toBe('client')
  })

  it('lets GET through without an Origin header', async () => {
    const res = await request(server.baseUrl).get('/api/health')
    expect(res.status).toBe(200)
    expect(res.body).toEqual({ ok: true })
  })
})

describe('errors and headers', () => {
  it('answers an unknown API route with a JSON 404', async () => {
    const res = await apiClient(server.baseUrl).get('/api/no-such-thing')
    expect(res.status).toBe(404)
    expect(res.headers['content-type']).toMatch(/application\/json/)
    expect(res.body.error).toEqual({ code: 'not_found', message: 'API route not found' })
  })

  it('answers a malformed %-escape in a path with 400, not 500', async () => {
    const res = await apiClient(server.baseUrl).get('/api/invitations/lookup/%E0%A4%A')
    expect(res.status).toBe(400)
    expect(res.body.error).toEqual({ code: 'invalid_request', message: 'The address contains an invalid %-escape' })
  })

  it('answers a JSON body that is not an object with 400 and the root path', async () => {
    const res = await apiClient(server.baseUrl).post('/api/auth/login', [1, 2])
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual([{ path: '', message: 'Invalid input: expected object, received array' }])
  })

  it('sets nosniff, no-store for the API, and no X-Powered-By', async () => {
    const res = await request(server.baseUrl).get('/api/health')
    expect(res.headers['x-content-type-options']).toBe('nosniff')
    expect(res.headers['cache-control']).toBe('no-store')
    expect(res.headers['x-powered-by']).toBeUndefined()
  })

  it('turns an unexpected failure (database gone) into a generic 500 without internals', async () => {
    // A real app whose connection pool has been closed: every query fails inside the server.
    const broken = connectDatabase(process.env.DATABASE_URL!, { max: 1 })
    await broken.close()
    const mailer = createMailer({ host: '127.0.0.1', port: 9, user: undefined, pass: undefined, from: 'x@example.test' })
    const app = createApp({ db: broken.db, config: server.config, mailer })
    const token = await signSessionToken(
      { userId: org.owner.id, organizationId: org.id, sessionId: randomUUID(), expiresAt: new Date(Date.now() + 60_000) },
      server.config.jwtSecret,
    )
    const originalError = console.error
    console.error = () => {} // the server logs the cause; keep the test output quiet
    try {
      const res = await request(app).get('/api/projects').set('Cookie', `${SESSION_COOKIE}=${token}`)
      expect(res.status).toBe(500)
      expect(res.body).toEqual({ error: { code: 'internal', message: 'Something went wrong on the server. Please try again.' } })
      expect(res.text).not.toMatch(/pool|at .*\.ts|Error:/i)
    } finally {
      console.error = originalError
      mailer.close()
    }
  })
})

describe('when the mail relay is unreachable', () => {
  it('an invitation is taken back with a clear 500; a reset request still answers 202', async () => {
    const origin = 'http://mail-test.example'
    const config = { ...server.config, allowedOrigins: [origin] }
    // Port 9 (discard) on loopback: nothing listens there, so every send fails.
    const mailer = createMailer({ host: '127.0.0.1', port: 9, user: undefined, pass: undefined, from: 'x@example.test' })
    const app = createApp({ db: server.db, config, mailer })
    const { token } = await startSession({ db: server.db, config }, { userId: org.owner.id, organizationId: org.id })
    const originalError = console.error
    console.error = () => {}
    try {
      const email = uniqueEmail('unsent')
      const invite = await request(app)
        .post('/api/invitations')
        .set('Origin', origin)
        .set('Cookie', `${SESSION_COOKIE}=${token}`)
        .send({ email, role: 'designer' })
      expect(invite.status).toBe(500)
      expect(invite.body.error).toEqual({
        code: 'internal',
        message: 'The invitation e-mail could not be sent, so no invitation was made. Check the mail settings and try again.',
      })
      const pending = await request(app).get('/api/invitations').set('Cookie', `${SESSION_COOKIE}=${token}`)
      expect(pending.body.map((i: { email: string }) => i.email)).not.toContain(email)

      const reset = await request(app).post('/api/auth/password-reset/request').set('Origin', origin).send({ email: org.owner.email })
      expect(reset.status).toBe(202)
    } finally {
      console.error = originalError
      mailer.close()
    }
  })
})

describe('serving the built client', () => {
  let clientServer: TestServer
  let clientDir: string
  beforeAll(async () => {
    clientDir = fs.mkdtempSync(path.join(os.tmpdir(), 'ampwright-dist-'))
    fs.mkdirSync(path.join(clientDir, 'assets'))
    fs.writeFileSync(path.join(clientDir, 'index.html'), '<!doctype html><title>Ampwright test shell</title>')
    fs.writeFileSync(path.join(clientDir, 'assets', 'app.js'), 'console.log("app")')
    clientServer = await startTestServer({ serveClient: true, config: { clientDir } })
  })
  afterAll(async () => {
    await clientServer.close()
    fs.rmSync(clientDir, { recursive: true, force: true })
  })

  it('serves files and falls back to index.html for client routes, but not for /api', async () => {
    const asset = await request(clientServer.baseUrl).get('/assets/app.js')
    expect(asset.status).toBe(200)
    expect(asset.text).toBe('console.log("app")')
    for (const route of ['/', '/projects/123/design', '/accept-invitation?token=abc']) {
      const page = await request(clientServer.baseUrl).get(route)
      expect(page.status).toBe(200)
      expect(page.text).toContain('Ampwright test shell')
    }
    const api = await request(clientServer.baseUrl).get('/api/missing')
    expect(api.status).toBe(404)
    expect(api.body.error.code).toBe('not_found')
  })
})
