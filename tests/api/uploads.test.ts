// Attachments: multer with the shared 10 MB limit, type from the content's magic bytes, files in the
// local S3 fake (s3rver through @aws-sdk/client-s3), downloads only through the API's role checks.
import { randomBytes } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { UPLOAD_MAX_BYTES } from '../../shared/api/uploads.schemas'
import { createDemoDesign } from '../../shared/design/demo'
import { createOrganization, createProject, type TestOrganization } from '../helpers/factories'
import { freshSessionClient, type Api } from '../helpers/http'
import { startTestServer, type TestServer } from '../helpers/server'

let server: TestServer
let org: TestOrganization
let designer: Api
let reviewer: Api
let otherClient: Api
let projectId: string

// Smallest real files: a PNG signature + IHDR, a JPEG SOI + APP0, a one-line PDF (the types' published signatures).
const PNG = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), randomBytes(2000)])
const JPEG = Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), randomBytes(3000)])
const PDF = Buffer.from('%PDF-1.4\n% datasheet\n1 0 obj << >> endobj\ntrailer << >>\n%%EOF\n')

beforeAll(async () => {
  server = await startTestServer()
  org = await createOrganization(server.db, 'Uploads')
  const session = (user: { id: string }) => freshSessionClient(server, { userId: user.id, organizationId: org.id })
  designer = await session(org.designer)
  reviewer = await session(org.reviewer)
  otherClient = await session(org.otherClient)
  projectId = await createProject(server.db, org, { document: createDemoDesign(), nominalVoltageV: 24 })
})
afterAll(() => server.close())

const upload = (api: Api, file: Buffer, filename: string, fields: Record<string, string> = {}) => {
  let req = api.send('post', `/api/projects/${projectId}/attachments`)
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v)
  return req.attach('file', file, filename)
}

describe('attachments', () => {
  it('round-trips PDF, PNG and JPEG files byte for byte, for a project or a part', async () => {
    for (const [file, name, type] of [[PDF, 'battery datasheet.pdf', 'application/pdf'], [PNG, 'bus.png', 'image/png'], [JPEG, 'photo.jpg', 'image/jpeg']] as const) {
      const res = await upload(designer, file, name, name === 'bus.png' ? { partId: 'pos-bus' } : {})
      expect(res.status).toBe(201)
      expect(res.body).toMatchObject({ filename: name, contentType: type, size: file.length })
      const download = await reviewer.get(`/api/projects/${projectId}/attachments/${res.body.id}/download`).buffer(true).parse((r, cb) => {
        const chunks: Buffer[] = []
        r.on('data', (c: Buffer) => chunks.push(c))
        r.on('end', () => cb(null, Buffer.concat(chunks)))
      })
      expect(download.status).toBe(200)
      expect(download.headers['content-type']).toContain(type)
      expect(Buffer.compare(download.body as Buffer, file)).toBe(0)
    }
    const list = await reviewer.get(`/api/projects/${projectId}/attachments`)
    expect(list.body.map((a: { filename: string }) => a.filename)).toEqual(expect.arrayContaining(['battery datasheet.pdf', 'bus.png', 'photo.jpg']))
    expect(list.body.find((a: { filename: string }) => a.filename === 'bus.png').partId).toBe('pos-bus')
  })

  it("lists one part's files with ?partId= (any reader), and refuses a malformed part id with 400", async () => {
    const res = await upload(designer, PDF, 'fridge datasheet.pdf', { partId: 'fridge' })
    expect(res.status).toBe(201)
    const mine = await reviewer.get(`/api/projects/${projectId}/attachments?partId=fridge`)
    expect(mine.status).toBe(200)
    expect(mine.body.map((a: { id: string }) => a.id)).toEqual([res.body.id])
    expect((await reviewer.get(`/api/projects/${projectId}/attachments?partId=no-files-here`)).body).toEqual([])
    const all = await reviewer.get(`/api/projects/${projectId}/attachments`)
    expect(all.body.length).toBeGreaterThan(1)
    const bad = await reviewer.get(`/api/projects/${projectId}/attachments?partId=${encodeURIComponent('not an id!')}`)
    expect(bad.status).toBe(400)
    expect(bad.body.error.fields[0].path).toBe('partId')
  })

  it('refuses a file over the limit with 413 and a clear message', async () => {
    const big = Buffer.concat([PDF, Buffer.alloc(UPLOAD_MAX_BYTES)])
    const res = await upload(designer, big, 'huge.pdf')
    expect(res.status).toBe(413)
    expect(res.body.error.message).toContain('larger than 10 MB')
  })

  it('refuses a wrong type disguised by its name (checked on the content)', async () => {
    const res = await upload(designer, Buffer.from('MZ\x90\x00 this is a program, not a PDF'), 'datasheet.pdf')
    expect(res.status).toBe(400)
    expect(res.body.error.message).toBe('Only PDF, PNG and JPEG files can be uploaded (checked on the file content, not its name)')
    const html = await upload(designer, Buffer.from('<html><script>alert(1)</script></html>'), 'photo.png')
    expect(html.status).toBe(400)
  })

  it('keeps files from users who may not see or change the project', async () => {
    const res = await upload(designer, PNG, 'wiring.png')
    expect(res.status).toBe(201)
    expect((await upload(reviewer, PNG, 'reviewer.png')).status).toBe(403)
    expect((await otherClient.get(`/api/projects/${projectId}/attachments/${res.body.id}/download`)).status).toBe(404)
    expect((await otherClient.get(`/api/projects/${projectId}/attachments`)).status).toBe(404)
    const outsiderOrg = await createOrganization(server.db, 'Outsiders')
    const outsider = await freshSessionClient(server, { userId: outsiderOrg.designer.id, organizationId: outsiderOrg.id })
    expect((await upload(outsider, PNG, 'x.png')).status).toBe(404)
    expect((await reviewer.delete(`/api/projects/${projectId}/attachments/${res.body.id}`)).status).toBe(403)
    expect((await designer.delete(`/api/projects/${projectId}/attachments/${res.body.id}`)).status).toBe(204)
    expect((await designer.get(`/api/projects/${projectId}/attachments/${res.body.id}/download`)).status).toBe(404)
  })
})
