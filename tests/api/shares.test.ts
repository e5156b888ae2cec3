// Share links: made by owners and designers, shown once, stored as SHA-256; the public view is
// read-only; expired and revoked links are refused; client approvals are stored and e-mailed to the
// designers through the fake SMTP; the share e-mail carries the link.
import { createHash } from 'node:crypto'
import { eq } from 'drizzle-orm'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { analyzeDesign } from '../../shared/analysis'
import { createDemoDesign } from '../../shared/design/demo'
import { shareLinks } from '../../server/db/schema'
import { shareTokenCipher } from '../../server/modules/shares/shareTokenCipher'
import { newOneTimeToken } from '../../server/security/one-time-tokens'
import { SHARE_LINK_MAILS_PER_HOUR } from '../../shared/api/shares.schemas'
import { createOrganization, createProject, uniqueEmail, type TestOrganization } from '../helpers/factories'
import { apiClient, freshSessionClient, type Api } from '../helpers/http'
import { startTestServer, type TestServer } from '../helpers/server'

let server: TestServer
let org: TestOrganization
let designer: Api
let reviewer: Api
let anonymous: Api
let projectId: string
const demo = createDemoDesign()

beforeAll(async () => {
  server = await startTestServer()
  org = await createOrganization(server.db, 'Shares')
  const session = (user: { id: string }) => freshSessionClient(server, { userId: user.id, organizationId: org.id })
  designer = await session(org.designer)
  reviewer = await session(org.reviewer)
  anonymous = apiClient(server.baseUrl)
  projectId = await createProject(server.db, org, { name: 'Liveaboard refit', nominalVoltageV: 24, document: demo })
})
afterAll(() => server.close())

async function newLink(body: object = {}) {
  const res = await designer.post(`/api/projects/${projectId}/share-links`, { label: 'For the owners', expiresInDays: 7, ...body })
  expect(res.status).toBe(201)
  return res.body as { id: string; token: string; url: string; status: string; emailedTo: string | null }
}

describe('share links', () => {
  it('gives the token once (256 bits, base64url) and stores only its SHA-256', async () => {
    const link = await newLink()
    expect(link.token).toMatch(/^[A-Za-z0-9_-]{43}$/) // 32 random bytes
    expect(link.url).toBe(`${server.baseUrl}/s/${link.token}`)
    const [row] = await server.db.select().from(shareLinks).where(eq(shareLinks.id, link.id))
    expect(row.tokenHash).toBe(createHash('sha256').update(link.token).digest('hex'))
    expect(JSON.stringify(row)).not.toContain(link.token)
    const list = await designer.get(`/api/projects/${projectId}/share-links`)
    expect(list.body.find((l: { id: string }) => l.id === link.id)).toMatchObject({ label: 'For the owners', status: 'active' })
    expect(JSON.stringify(list.body)).not.toContain(link.token)
  })

  it('e-mails the link when an address is given', async () => {
    const to = uniqueEmail('boat-owner')
    const link = await newLink({ email: to })
    expect(link.emailedTo).toBe(to)
    const mail = await server.outbox.latestTo(to)
    expect(mail.subject).toContain('Liveaboard refit')
    expect(mail.text).toContain(`${server.baseUrl}/s/${link.token}`)
  })

  it('shows the project, design and findings without a session, read-only', async () => {
    const link = await newLink()
    const view = await anonymous.get(`/api/shared/${link.token}`)
    expect(view.status).toBe(200)
    expect(view.body.project.name).toBe('Liveaboard refit')
    expect(view.body.design).toEqual(demo)
    expect(view.body.findings.map((f: { id: string }) => f.id)).toEqual(analyzeDesign(demo).findings.map((f) => f.id))
    expect(view.body.cautions[0]).toContain('authority having jurisdiction')

    for (const method of ['put', 'post', 'patch', 'delete'] as const) {
      const write = await anonymous.send(method, `/api/shared/${link.token}/design`).send({ design: demo, baseRevision: 1 })
      expect(write.status).toBe(403)
      expect(write.body.error.message).toBe('A share link is read-only: it cannot change the design')
    }
    // The token is no session: the project's own design API stays closed.
    expect((await anonymous.put(`/api/projects/${projectId}/design`, { design: demo, baseRevision: 1 })).status).toBe(401)

    const report = await anonymous.get(`/api/shared/${link.token}/exports/report.pdf`)
    expect(report.status).toBe(200)
    expect(report.headers['content-type']).toBe('application/pdf')
    const svg = await anonymous.get(`/api/shared/${link.token}/exports/diagram.svg`)
    expect(svg.status).toBe(200)
  })

  it('refuses revoked, expired and unknown links with a clear message', async () => {
    const revoked = await newLink()
    expect((await designer.delete(`/api/projects/${projectId}/share-links/${revoked.id}`)).status).toBe(204)
    const afterRevoke = await anonymous.get(`/api/shared/${revoked.token}`)
    expect(afterRevoke.status).toBe(410)
    expect(afterRevoke.body.error.message).toContain('revoked')
    expect((await anonymous.get(`/api/shared/${revoked.token}/exports/report.pdf`)).status).toBe(410)

    const expired = await newLink()
    await server.db.update(shareLinks).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(shareLinks.id, expired.id))
    const afterExpiry = await anonymous.get(`/api/shared/${expired.token}`)
    expect(afterExpiry.status).toBe(410)
    expect(afterExpiry.body.error.message).toContain('expired')
    expect((await anonymous.post(`/api/shared/${expired.token}/approvals`, { name: 'Late' })).status).toBe(410)

    const unknown = await anonymous.get(`/api/shared/${'x'.repeat(43)}`)
    expect(unknown.status).toBe(404)
    expect(unknown.body.error.message).toContain('does not exist')
  })

  it('records an approval and e-mails the designers a notice with the project link', async () => {
    const link = await newLink()
    const bad = await anonymous.post(`/api/shared/${link.token}/approvals`, { name: '  ' })
    expect(bad.status).toBe(400)
    expect(bad.body.error.fields[0].path).toBe('name')

    const res = await anonymous.post(`/api/shared/${link.token}/approvals`, { name: 'Ada Okafor' })
    expect(res.status).toBe(201)
    expect(res.body).toMatchObject({ name: 'Ada Okafor', revisionName: 'Saved revision 1', designRevision: 1, via: 'share-link' })
    expect(Date.parse(res.body.createdAt)).not.toBeNaN()

    const approvals = await reviewer.get(`/api/projects/${projectId}/approvals`)
    expect(approvals.status).toBe(200)
    expect(approvals.body.some((a: { id: string; name: string }) => a.id === res.body.id && a.name === 'Ada Okafor')).toBe(true)

    // The link's creator (designer) and the project's creator (owner, in the factories) are told.
    for (const user of [org.designer, org.owner]) {
      const mail = await server.outbox.latestTo(user.email)
      expect(mail.subject).toBe('Ada Okafor approved "Liveaboard refit" (Saved revision 1)')
      expect(mail.text).toContain(`${server.baseUrl}/projects/${projectId}`)
    }
  })

  it('lets only owners and designers manage links', async () => {
    expect((await reviewer.post(`/api/projects/${projectId}/share-links`, {})).status).toBe(403)
    const client = await freshSessionClient(server, { userId: org.client.id, organizationId: org.id })
    expect((await client.get(`/api/projects/${projectId}/share-links`)).status).toBe(403)
    const bad = await designer.post(`/api/projects/${projectId}/share-links`, { expiresInDays: 0, email: 'nope' })
    expect(bad.status).toBe(400)
    expect(bad.body.error.fields.map((f: { path: string }) => f.path).sort()).toEqual(['email', 'expiresInDays'])
    const other = await createOrganization(server.db, 'Elsewhere')
    const outsider = await freshSessionClient(server, { userId: other.designer.id, organizationId: other.id })
    expect((await outsider.post(`/api/projects/${projectId}/share-links`, {})).status).toBe(404)
  })
})

describe('e-mailing an existing link', () => {
  const sendUrl = (linkId: string) => `/api/projects/${projectId}/share-links/${linkId}/email`

  it('keeps the token AES-256-GCM encrypted beside its hash, and the ciphertext opens only with this server key and hash', async () => {
    const link = await newLink()
    const [row] = await server.db.select().from(shareLinks).where(eq(shareLinks.id, link.id))
    expect(row.tokenCiphertext).toMatch(/^v1\.[\w-]{16}\.[\w-]{22}\.[\w-]+$/) // 96-bit IV, 128-bit tag
    expect(row.tokenCiphertext).not.toContain(link.token)
    const cipher = shareTokenCipher(server.config.jwtSecret)
    expect(cipher.decrypt(row.tokenCiphertext!, row.tokenHash)).toBe(link.token)
    expect(cipher.decrypt(row.tokenCiphertext!, 'another-hash')).toBeNull()
    expect(shareTokenCipher(new TextEncoder().encode('x'.repeat(48))).decrypt(row.tokenCiphertext!, row.tokenHash)).toBeNull()
    const list = await designer.get(`/api/projects/${projectId}/share-links`)
    expect(list.body.find((l: { id: string }) => l.id === link.id).canEmail).toBe(true)
    expect(JSON.stringify(list.body)).not.toContain(row.tokenCiphertext)
  })

  it('sends the link to an address through the mail transport, and again on request', async () => {
    const link = await newLink()
    const to = uniqueEmail('client-later')
    const res = await designer.post(sendUrl(link.id), { email: `  ${to.toUpperCase()} ` })
    expect(res.status).toBe(200)
    expect(res.body).toMatchObject({ id: link.id, status: 'active', emailedTo: to })
    const mail = await server.outbox.latestTo(to)
    expect(mail.subject).toBe(`${org.designer.name} shared the design "Liveaboard refit" with you`)
    expect(mail.text).toContain(`${server.baseUrl}/s/${link.token}`)
    expect((await anonymous.get(`/api/shared/${link.token}`)).status).toBe(200) // the e-mailed link works

    const owner = await freshSessionClient(server, { userId: org.owner.id, organizationId: org.id })
    expect((await owner.post(sendUrl(link.id), { email: to })).status).toBe(200)
    expect(await server.outbox.messagesTo(to)).toHaveLength(2)
  })

  it('answers 400 naming the field for a bad address', async () => {
    const link = await newLink()
    for (const body of [{ email: 'not an address' }, {}]) {
      const bad = await designer.post(sendUrl(link.id), body)
      expect(bad.status).toBe(400)
      expect(bad.body.error.fields.map((f: { path: string }) => f.path)).toEqual(['email'])
    }
    expect((await designer.post(sendUrl(link.id), { email: 'not an address' })).body.error.fields[0].message).toBe('Enter a valid e-mail address')
  })

  it('refuses revoked (409) and expired (410) links with a clear message, and sends nothing', async () => {
    const to = uniqueEmail('never-sent')
    const revoked = await newLink()
    await designer.delete(`/api/projects/${projectId}/share-links/${revoked.id}`)
    const r = await designer.post(sendUrl(revoked.id), { email: to })
    expect(r.status).toBe(409)
    expect(r.body.error.message).toBe('This link was revoked, so it cannot be sent. Make a new link to share the design.')

    const expired = await newLink()
    const when = new Date(Date.now() - 1000)
    await server.db.update(shareLinks).set({ expiresAt: when }).where(eq(shareLinks.id, expired.id))
    const e = await designer.post(sendUrl(expired.id), { email: to })
    expect(e.status).toBe(410)
    expect(e.body.error.message).toBe(`This link expired on ${when.toUTCString()}, so it cannot be sent. Make a new link to share the design.`)
    expect(await server.outbox.messagesTo(to)).toEqual([])
  })

  it('cannot send a link made before the token was kept (or whose ciphertext does not open): 409, re-create it', async () => {
    const { tokenHash } = newOneTimeToken()
    const [old] = await server.db.insert(shareLinks)
      .values({ projectId, label: 'before', tokenHash, createdBy: org.designer.id, expiresAt: new Date(Date.now() + 86_400_000) })
      .returning({ id: shareLinks.id })
    const list = await designer.get(`/api/projects/${projectId}/share-links`)
    expect(list.body.find((l: { id: string }) => l.id === old.id).canEmail).toBe(false)
    const res = await designer.post(sendUrl(old.id), { email: uniqueEmail('old-link') })
    expect(res.status).toBe(409)
    expect(res.body.error.message).toContain('Make a new link to send it by e-mail')

    const tampered = await newLink()
    const [row] = await server.db.select().from(shareLinks).where(eq(shareLinks.id, tampered.id))
    const flipped = row.tokenCiphertext!.slice(0, -2) + (row.tokenCiphertext!.endsWith('AA') ? 'BA' : 'AA')
    await server.db.update(shareLinks).set({ tokenCiphertext: flipped }).where(eq(shareLinks.id, tampered.id))
    expect((await designer.post(sendUrl(tampered.id), { email: uniqueEmail('tampered') })).status).toBe(409)
  })

  it(`sends one link at most ${SHARE_LINK_MAILS_PER_HOUR} times an hour (429 after; refused requests do not count)`, async () => {
    const link = await newLink()
    expect((await designer.post(sendUrl(link.id), { email: 'bad' })).status).toBe(400)
    const to = uniqueEmail('flood')
    for (let i = 0; i < SHARE_LINK_MAILS_PER_HOUR; i++) expect((await designer.post(sendUrl(link.id), { email: to })).status).toBe(200)
    const over = await designer.post(sendUrl(link.id), { email: to })
    expect(over.status).toBe(429)
    expect(over.body.error.message).toContain('Wait an hour')
    expect(await server.outbox.messagesTo(to)).toHaveLength(SHARE_LINK_MAILS_PER_HOUR)
    expect((await designer.post(sendUrl((await newLink()).id), { email: to })).status).toBe(200) // per link
  })

  it('lets only owners and designers of the organisation send: reviewer 403, client 403, other organisation 404, no session 401', async () => {
    const link = await newLink()
    const body = { email: uniqueEmail('perm') }
    expect((await reviewer.post(sendUrl(link.id), body)).status).toBe(403)
    const client = await freshSessionClient(server, { userId: org.client.id, organizationId: org.id })
    expect((await client.post(sendUrl(link.id), body)).status).toBe(403)
    const other = await createOrganization(server.db, 'Elsewhere again')
    const outsider = await freshSessionClient(server, { userId: other.owner.id, organizationId: other.id })
    const res = await outsider.post(sendUrl(link.id), body)
    expect(res.status).toBe(404)
    expect((await anonymous.post(sendUrl(link.id), body)).status).toBe(401)
    expect(await server.outbox.messagesTo(body.email)).toEqual([])
    // A link id of another project of the same organisation is not found under this project.
    const otherProject = await createProject(server.db, org, { name: 'Other boat', nominalVoltageV: 12 })
    expect((await designer.post(`/api/projects/${otherProject}/share-links/${link.id}/email`, body)).status).toBe(404)
  })
})
