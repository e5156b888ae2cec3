// Members and invitations: invite → e-mail with a link → accept → signed in with that role; role
// changes and removals take effect on the very next request; an organisation always keeps an owner.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { invitations } from '../../server/db/schema'
import { newOneTimeToken } from '../../server/security/one-time-tokens'
import { createMember, createOrganization, TEST_PASSWORD, uniqueEmail, type TestOrganization } from '../helpers/factories'
import { apiClient, sessionCookieFrom, signedInClient, type Api } from '../helpers/http'
import { startTestServer, tokenFromLink, type TestServer } from '../helpers/server'

let server: TestServer
let org: TestOrganization
let owner: Api

beforeAll(async () => {
  server = await startTestServer()
  org = await createOrganization(server.db, 'Members')
  owner = await signedInClient(server.baseUrl, org.owner.email, TEST_PASSWORD)
})
afterAll(() => server.close())

describe('invitations', () => {
  it('invite → e-mail with a link → lookup → accept → signed in as that role', async () => {
    const email = uniqueEmail('invitee')
    const created = await owner.post('/api/invitations', { email: email.toUpperCase(), role: 'reviewer' })
    expect(created.status).toBe(201)
    expect(created.body).toMatchObject({ email, role: 'reviewer', invitedBy: org.owner.name })
    // 7 days, as the contract says.
    const ttlMs = Date.parse(created.body.expiresAt) - Date.parse(created.body.createdAt)
    expect(Math.abs(ttlMs - 7 * 24 * 3600_000)).toBeLessThan(5_000)
    expect((await owner.get('/api/invitations')).body.map((i: { id: string }) => i.id)).toContain(created.body.id)

    const mail = await server.outbox.latestTo(email)
    expect(mail.subject).toBe(`${org.owner.name} invited you to ${org.name} on Ampwright`)
    const token = tokenFromLink(mail, '/accept-invitation', server.baseUrl)

    const outbox = await owner.get('/api/outbox')
    expect(outbox.status).toBe(200)
    expect(outbox.body[0]).toMatchObject({ to: email, subject: mail.subject })

    const anonymous = apiClient(server.baseUrl)
    const lookup = await anonymous.get(`/api/invitations/lookup/${token}`)
    expect(lookup.status).toBe(200)
    expect(lookup.body).toEqual({ email, role: 'reviewer', organizationName: org.name })

    const accepted = await anonymous.post('/api/invitations/accept', { token, name: 'Rui Tavares', password: 'reviewer password 1' })
    expect(accepted.status).toBe(201)
    expect(accepted.body).toMatchObject({ role: 'reviewer', user: { name: 'Rui Tavares', email }, organization: { id: org.id } })
    const me = await apiClient(server.baseUrl, sessionCookieFrom(accepted.headers)).get('/api/auth/me')
    expect(me.body.role).toBe('reviewer')

    // Single use: the link is gone, and so is the pending invitation.
    expect((await anonymous.get(`/api/invitations/lookup/${token}`)).status).toBe(404)
    const again = await anonymous.post('/api/invitations/accept', { token, name: 'Someone', password: 'another password 1' })
    expect(again.status).toBe(404)
    expect((await owner.get('/api/invitations')).body.map((i: { id: string }) => i.id)).not.toContain(created.body.id)
    await anonymous.post('/api/auth/login', { email, password: 'reviewer password 1' }).expect(200)
  })

  it('refuses to invite an address that already has an account (409)', async () => {
    const res = await owner.post('/api/invitations', { email: org.designer.email, role: 'designer' })
    expect(res.status).toBe(409)
    expect(res.body.error).toEqual({ code: 'conflict', message: 'This e-mail address already has an Ampwright account' })
  })

  it('answers 400 with field messages for a bad invitation', async () => {
    const res = await owner.post('/api/invitations', { email: 'nope', role: 'admin' })
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual([
      { path: 'email', message: 'Enter a valid e-mail address' },
      { path: 'role', message: 'Invalid option: expected one of "owner"|"designer"|"reviewer"|"client"' },
    ])
  })

  it('a re-sent invitation replaces the earlier one; a revoked one can no longer be used', async () => {
    const email = uniqueEmail('resend')
    const first = await owner.post('/api/invitations', { email, role: 'client' })
    const firstToken = tokenFromLink(await server.outbox.latestTo(email), '/accept-invitation', server.baseUrl)
    const second = await owner.post('/api/invitations', { email, role: 'designer' })
    const secondToken = tokenFromLink(await server.outbox.latestTo(email), '/accept-invitation', server.baseUrl)
    expect(secondToken).not.toBe(firstToken)
    expect((await apiClient(server.baseUrl).get(`/api/invitations/lookup/${firstToken}`)).status).toBe(404)
    const pending = (await owner.get('/api/invitations')).body.filter((i: { email: string }) => i.email === email)
    expect(pending).toEqual([second.body])
    expect(first.body.id).not.toBe(second.body.id)

    expect((await owner.delete(`/api/invitations/${second.body.id}`)).status).toBe(204)
    expect((await owner.delete(`/api/invitations/${second.body.id}`)).status).toBe(404)
    const accept = await apiClient(server.baseUrl).post('/api/invitations/accept', {
      token: secondToken,
      name: 'Too Late',
      password: 'a long password',
    })
    expect(accept.status).toBe(404)
    expect(accept.body.error).toEqual({ code: 'not_found', message: 'Invitation not found' })
  })

  it('an expired invitation can be neither looked up nor accepted (404)', async () => {
    const { token, tokenHash } = newOneTimeToken()
    await server.db.insert(invitations).values({
      organizationId: org.id,
      email: uniqueEmail('expired'),
      role: 'designer',
      tokenHash,
      invitedBy: org.owner.id,
      expiresAt: new Date(Date.now() - 1000),
    })
    const anonymous = apiClient(server.baseUrl)
    expect((await anonymous.get(`/api/invitations/lookup/${token}`)).status).toBe(404)
    const accept = await anonymous.post('/api/invitations/accept', { token, name: 'Late Comer', password: 'a long password' })
    expect(accept.status).toBe(404)
  })
})

describe('members', () => {
  it('lists the members with their roles', async () => {
    const res = await owner.get('/api/members')
    expect(res.status).toBe(200)
    const byEmail = new Map(res.body.map((m: { email: string; role: string }) => [m.email, m.role]))
    expect(byEmail.get(org.owner.email)).toBe('owner')
    expect(byEmail.get(org.client.email)).toBe('client')
    expect(res.body[0]).toEqual(expect.objectContaining({ userId: expect.any(String), name: expect.any(String), joinedAt: expect.any(String) }))
  })

  it('a role change takes effect on the next request of that member', async () => {
    const member = await createMember(server.db, org.id, 'designer', 'promoted')
    const api = await signedInClient(server.baseUrl, member.email, TEST_PASSWORD)
    expect((await api.post('/api/projects', { name: 'Allowed', installationKind: 'other', nominalVoltageV: 12 })).status).toBe(201)

    const changed = await owner.patch(`/api/members/${member.id}`, { role: 'reviewer' })
    expect(changed.status).toBe(200)
    expect(changed.body).toMatchObject({ userId: member.id, role: 'reviewer' })

    const refused = await api.post('/api/projects', { name: 'Refused', installationKind: 'other', nominalVoltageV: 12 })
    expect(refused.status).toBe(403)
    expect(refused.body.error).toEqual({ code: 'forbidden', message: 'Your role (reviewer) cannot edit projects' })
    expect((await api.get('/api/auth/me')).body.role).toBe('reviewer')
  })

  it('a removed member is signed out at once (401) and can no longer sign in', async () => {
    const member = await createMember(server.db, org.id, 'client', 'leaving')
    const api = await signedInClient(server.baseUrl, member.email, TEST_PASSWORD)
    expect((await owner.delete(`/api/members/${member.id}`)).status).toBe(204)
    expect((await api.get('/api/auth/me')).status).toBe(401)
    expect((await apiClient(server.baseUrl).post('/api/auth/login', { email: member.email, password: TEST_PASSWORD })).status).toBe(401)
    expect((await owner.delete(`/api/members/${member.id}`)).status).toBe(404)
  })

  it('never leaves the organisation without an owner (409), but allows it when another owner exists', async () => {
    const solo = await createOrganization(server.db, 'Solo')
    const soloOwner = await signedInClient(server.baseUrl, solo.owner.email, TEST_PASSWORD)
    const lastOwnerMessage = 'An organisation needs at least one owner: make someone else owner first'
    const demote = await soloOwner.patch(`/api/members/${solo.owner.id}`, { role: 'designer' })
    expect(demote.status).toBe(409)
    expect(demote.body.error).toEqual({ code: 'conflict', message: lastOwnerMessage })
    expect((await soloOwner.delete(`/api/members/${solo.owner.id}`)).status).toBe(409)

    await soloOwner.patch(`/api/members/${solo.designer.id}`, { role: 'owner' }).expect(200)
    expect((await soloOwner.patch(`/api/members/${solo.owner.id}`, { role: 'designer' })).status).toBe(200)
    // The former owner is now a designer: member management is refused on their next request.
    expect((await soloOwner.get('/api/invitations')).status).toBe(403)
  })

  it('answers 400 for an unknown role with the field message', async () => {
    const res = await owner.patch(`/api/members/${org.client.id}`, { role: 'superuser' })
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual([
      { path: 'role', message: 'Invalid option: expected one of "owner"|"designer"|"reviewer"|"client"' },
    ])
  })
})

describe('outbox', () => {
  it('shows an owner only the mail sent to people of their own organisation', async () => {
    const other = await createOrganization(server.db, 'Outbox other')
    const otherOwner = await signedInClient(server.baseUrl, other.owner.email, TEST_PASSWORD)
    const email = uniqueEmail('private')
    await owner.post('/api/invitations', { email, role: 'client' }).expect(201)
    const mine = (await owner.get('/api/outbox')).body.map((m: { to: string }) => m.to)
    const theirs = (await otherOwner.get('/api/outbox')).body.map((m: { to: string }) => m.to)
    expect(mine).toContain(email)
    expect(theirs).not.toContain(email)
  })
})
