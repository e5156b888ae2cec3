// Sign-up, sign-in, session cookie, rate limit, expiry, sign-out and password reset against the real
// server and PostgreSQL.
import { randomUUID } from 'node:crypto'
import { eq } from 'drizzle-orm'
import { SignJWT } from 'jose'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { passwordResets, users } from '../../server/db/schema'
import { newOneTimeToken } from '../../server/security/one-time-tokens'
import { bcryptCostOf } from '../../server/security/passwords'
import { SESSION_COOKIE } from '../../server/security/session-token'
import { createOrganization, TEST_PASSWORD, uniqueEmail, type TestOrganization } from '../helpers/factories'
import { apiClient, sessionCookieFrom, signedInClient } from '../helpers/http'
import { startTestServer, tokenFromLink, type TestServer } from '../helpers/server'

let server: TestServer
let org: TestOrganization
beforeAll(async () => {
  server = await startTestServer()
  org = await createOrganization(server.db, 'Auth')
})
afterAll(() => server.close())

const signUpBody = () => ({
  name: 'Ines Varga',
  email: uniqueEmail('signup'),
  password: 'a-long-enough-password',
  organizationName: 'Harbour Light Marine',
})

describe('POST /api/auth/signup', () => {
  it('creates an organisation with the user as owner and sets an httpOnly SameSite=Lax cookie', async () => {
    const body = signUpBody()
    const res = await apiClient(server.baseUrl).post('/api/auth/signup', body)
    expect(res.status).toBe(201)
    expect(res.body.user).toMatchObject({ name: 'Ines Varga', email: body.email })
    expect(res.body.organization.name).toBe('Harbour Light Marine')
    expect(res.body.role).toBe('owner')
    const line = (res.headers['set-cookie'] as unknown as string[]).find((c) => c.startsWith(`${SESSION_COOKIE}=`))!
    expect(line).toMatch(/HttpOnly/i)
    expect(line).toMatch(/SameSite=Lax/i)
    expect(line).toMatch(/Path=\//)
    // Session lifetime: 8 h by default, as the expiry in the answer says.
    const ttlMs = new Date(res.body.expiresAt).getTime() - Date.now()
    expect(ttlMs).toBeGreaterThan(8 * 3600_000 - 60_000)
    expect(ttlMs).toBeLessThanOrEqual(8 * 3600_000)

    const me = await apiClient(server.baseUrl, sessionCookieFrom(res.headers)).get('/api/auth/me')
    expect(me.status).toBe(200)
    expect(me.body.user.email).toBe(body.email)
  })

  it('stores a bcrypt hash of the configured cost (at least 10), never the password', async () => {
    const body = signUpBody()
    await apiClient(server.baseUrl).post('/api/auth/signup', body).expect(201)
    const [row] = await server.db.select().from(users).where(eq(users.email, body.email))
    expect(row.passwordHash).toMatch(/^\$2[aby]\$\d\d\$/)
    expect(bcryptCostOf(row.passwordHash)).toBeGreaterThanOrEqual(10)
    expect(bcryptCostOf(row.passwordHash)).toBe(server.config.bcryptCost)
    expect(row.passwordHash).not.toContain(body.password)
  })

  it('normalises the e-mail and refuses a second account with it (409)', async () => {
    const body = signUpBody()
    await apiClient(server.baseUrl).post('/api/auth/signup', body).expect(201)
    const again = await apiClient(server.baseUrl).post('/api/auth/signup', { ...body, email: `  ${body.email.toUpperCase()} ` })
    expect(again.status).toBe(409)
    expect(again.body.error).toEqual({ code: 'conflict', message: 'An account with this e-mail address already exists' })
  })

  it('answers 400 with the exact field messages', async () => {
    const res = await apiClient(server.baseUrl).post('/api/auth/signup', {
      name: ' ',
      email: 'not-an-address',
      password: 'short',
      organizationName: '',
    })
    expect(res.status).toBe(400)
    expect(res.body.error.code).toBe('invalid_request')
    expect(res.body.error.fields).toEqual([
      { path: 'name', message: 'Enter your name' },
      { path: 'email', message: 'Enter a valid e-mail address' },
      { path: 'password', message: 'Use at least 10 characters' },
      { path: 'organizationName', message: 'Enter the organisation name' },
    ])
  })
})

describe('POST /api/auth/login', () => {
  it('signs in with the right password', async () => {
    const res = await apiClient(server.baseUrl).post('/api/auth/login', { email: org.designer.email, password: TEST_PASSWORD })
    expect(res.status).toBe(200)
    expect(res.body).toMatchObject({ role: 'designer', organization: { id: org.id, name: org.name } })
    expect(sessionCookieFrom(res.headers)).toMatch(/^aw_session=.+/)
  })

  it('gives the same 401 for an unknown user and a wrong password', async () => {
    const unknown = await apiClient(server.baseUrl).post('/api/auth/login', { email: uniqueEmail('nobody'), password: TEST_PASSWORD })
    const wrong = await apiClient(server.baseUrl).post('/api/auth/login', { email: org.reviewer.email, password: 'not the password' })
    const expected = { error: { code: 'invalid_credentials', message: 'E-mail or password is incorrect' } }
    expect(unknown.status).toBe(401)
    expect(wrong.status).toBe(401)
    expect(unknown.body).toEqual(expected)
    expect(wrong.body).toEqual(expected)
    expect(unknown.headers['set-cookie']).toBeUndefined()
  })

  it('answers 429 after 10 failed attempts for one address, and still lets other addresses try', async () => {
    const api = apiClient(server.baseUrl)
    const target = org.otherClient.email
    for (let attempt = 1; attempt <= 10; attempt++) {
      const res = await api.post('/api/auth/login', { email: target, password: `wrong guess ${attempt}` })
      expect(res.status).toBe(401)
    }
    const blocked = await api.post('/api/auth/login', { email: target, password: TEST_PASSWORD })
    expect(blocked.status).toBe(429)
    expect(blocked.body.error.code).toBe('rate_limited')
    expect(blocked.body.error.message).toBe('Too many sign-in attempts. Wait 15 minutes and try again.')
    const other = await api.post('/api/auth/login', { email: org.owner.email, password: TEST_PASSWORD })
    expect(other.status).toBe(200)
  })
})

describe('sessions', () => {
  it('GET /api/auth/me without a cookie is 401 unauthenticated', async () => {
    const res = await apiClient(server.baseUrl).get('/api/auth/me')
    expect(res.status).toBe(401)
    expect(res.body.error.code).toBe('unauthenticated')
  })

  it('rejects an expired token (signed with the server secret, exp in the past)', async () => {
    const nowS = Math.floor(Date.now() / 1000)
    const token = await new SignJWT({ org: org.id })
      .setProtectedHeader({ alg: 'HS256' })
      .setSubject(org.owner.id)
      .setIssuedAt(nowS - 7200)
      .setExpirationTime(nowS - 3600)
      .sign(server.config.jwtSecret)
    const res = await apiClient(server.baseUrl, `${SESSION_COOKIE}=${token}`).get('/api/auth/me')
    expect(res.status).toBe(401)
    expect(res.body.error).toEqual({ code: 'unauthenticated', message: 'Your session has expired. Sign in again.' })
  })

  it('rejects a token signed with another secret, and a well-signed one naming no live session', async () => {
    const sign = (secret: Uint8Array) =>
      new SignJWT({ org: org.id })
        .setProtectedHeader({ alg: 'HS256' })
        .setSubject(org.owner.id)
        .setJti(randomUUID())
        .setExpirationTime('1h')
        .sign(secret)
    const forged = await apiClient(server.baseUrl, `${SESSION_COOKIE}=${await sign(new TextEncoder().encode('x'.repeat(40)))}`).get('/api/auth/me')
    expect(forged.status).toBe(401)
    expect(forged.body.error.message).toBe('Your session has expired. Sign in again.')
    const noSession = await apiClient(server.baseUrl, `${SESSION_COOKIE}=${await sign(server.config.jwtSecret)}`).get('/api/auth/me')
    expect(noSession.status).toBe(401)
    expect(noSession.body.error).toEqual({ code: 'unauthenticated', message: 'Your session has ended. Sign in again.' })
  })

  it('logout answers 204, clears the cookie and ends that session only', async () => {
    const api = await signedInClient(server.baseUrl, org.reviewer.email, TEST_PASSWORD)
    const otherDevice = await signedInClient(server.baseUrl, org.reviewer.email, TEST_PASSWORD)
    const res = await api.post('/api/auth/logout')
    expect(res.status).toBe(204)
    const cleared = (res.headers['set-cookie'] as unknown as string[]).find((c) => c.startsWith(`${SESSION_COOKIE}=`))!
    expect(cleared).toMatch(/^aw_session=;/)
    expect(cleared).toMatch(/Expires=Thu, 01 Jan 1970/)
    // A copy of the old cookie is worthless now; the other device stays signed in.
    const replay = await api.get('/api/auth/me')
    expect(replay.status).toBe(401)
    expect(replay.body.error.message).toBe('Your session has ended. Sign in again.')
    expect((await otherDevice.get('/api/auth/me')).status).toBe(200)
  })
})

describe('password reset', () => {
  it('e-mails a single-use link that sets a new password', async () => {
    const signUp = signUpBody()
    const signedUp = await apiClient(server.baseUrl).post('/api/auth/signup', signUp).expect(201)
    const api = apiClient(server.baseUrl)
    const before = apiClient(server.baseUrl, sessionCookieFrom(signedUp.headers))
    expect((await before.get('/api/auth/me')).status).toBe(200)

    const requested = await api.post('/api/auth/password-reset/request', { email: signUp.email })
    expect(requested.status).toBe(202)
    const mail = await server.outbox.latestTo(signUp.email)
    expect(mail.subject).toBe('Reset your Ampwright password')
    const token = tokenFromLink(mail, '/reset-password', server.baseUrl)

    await api.post('/api/auth/password-reset', { token, password: 'a brand new password' }).expect(204)
    // Sessions opened with the old password end with the reset.
    expect((await before.get('/api/auth/me')).status).toBe(401)
    await api.post('/api/auth/login', { email: signUp.email, password: signUp.password }).expect(401)
    await api.post('/api/auth/login', { email: signUp.email, password: 'a brand new password' }).expect(200)

    const reused = await api.post('/api/auth/password-reset', { token, password: 'yet another password' })
    expect(reused.status).toBe(400)
    expect(reused.body.error.fields).toEqual([
      { path: 'token', message: 'This reset link is invalid, already used or expired. Ask for a new one.' },
    ])
  })

  it('answers 202 for an unknown address and sends nothing', async () => {
    const email = uniqueEmail('ghost')
    const res = await apiClient(server.baseUrl).post('/api/auth/password-reset/request', { email })
    expect(res.status).toBe(202)
    expect(await server.outbox.messagesTo(email)).toEqual([])
  })

  it('sends at most 5 reset e-mails per hour for one address (then 429)', async () => {
    const signUp = signUpBody()
    await apiClient(server.baseUrl).post('/api/auth/signup', signUp).expect(201)
    const api = apiClient(server.baseUrl)
    for (let i = 0; i < 5; i++) await api.post('/api/auth/password-reset/request', { email: signUp.email }).expect(202)
    const sixth = await api.post('/api/auth/password-reset/request', { email: signUp.email })
    expect(sixth.status).toBe(429)
    expect(sixth.body.error).toEqual({
      code: 'rate_limited',
      message: 'Too many reset requests for this address. Wait 60 minutes and try again.',
    })
    expect(await server.outbox.messagesTo(signUp.email)).toHaveLength(5)
  })

  it('refuses an expired reset token (400) and leaves the password alone', async () => {
    const { token, tokenHash } = newOneTimeToken()
    await server.db.insert(passwordResets).values({ userId: org.designer.id, tokenHash, expiresAt: new Date(Date.now() - 1000) })
    const res = await apiClient(server.baseUrl).post('/api/auth/password-reset', { token, password: 'taken over password' })
    expect(res.status).toBe(400)
    expect(res.body.error.message).toBe('This reset link is invalid, already used or expired. Ask for a new one.')
    await apiClient(server.baseUrl).post('/api/auth/login', { email: org.designer.email, password: TEST_PASSWORD }).expect(200)
  })

  it('rejects a new password that is too short, with the field path', async () => {
    const res = await apiClient(server.baseUrl).post('/api/auth/password-reset', { token: 'x'.repeat(43), password: 'short' })
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual([{ path: 'password', message: 'Use at least 10 characters' }])
  })
})
