// Share links: made by owners and designers, shown once, stored as SHA-256; the public view is
// read-only; expired and revoked links are refused; client approvals are stored and e-mailed to the
// designers through the fake SMTP; the share e-mail carries the link.
import { createHash } from 'node:crypto'
import { eq } from 'drizzle-orm'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { analyzeDesign } from '../../shared/analysis'
import { createDemoDesign } from '../../shared/design/demo'
import { shareLinks } from '../../server/db/schema'
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
