// Design documents: read, save with an optimistic revision, validation by shared/design (parseDesign).
// The saved document is the invented demo system from shared/design/demo.ts.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createDemoDesign } from '../../shared/design/demo'
import { createOrganization, createProject, TEST_PASSWORD, type TestOrganization } from '../helpers/factories'
import { signedInClient, type Api } from '../helpers/http'
import { startTestServer, type TestServer } from '../helpers/server'

let server: TestServer
let org: TestOrganization
let designer: Api

beforeAll(async () => {
  server = await startTestServer()
  org = await createOrganization(server.db, 'Designs')
  designer = await signedInClient(server.baseUrl, org.designer.email, TEST_PASSWORD)
})
afterAll(() => server.close())

describe('GET/PUT /api/projects/:id/design', () => {
  it('saves a design on the current revision and returns it unchanged', async () => {
    const id = await createProject(server.db, org, { nominalVoltageV: 24 })
    const before = await designer.get(`/api/projects/${id}/design`)
    expect(before.body.revision).toBe(1)

    const demo = createDemoDesign()
    const saved = await designer.put(`/api/projects/${id}/design`, { design: demo, baseRevision: 1 })
    expect(saved.status).toBe(200)
    expect(saved.body.revision).toBe(2)
    expect(Date.parse(saved.body.updatedAt)).not.toBeNaN()

    const after = await designer.get(`/api/projects/${id}/design`)
    expect(after.body).toEqual({ design: demo, revision: 2, updatedAt: saved.body.updatedAt })
  })

  it('answers 409 for a stale base revision and keeps the newer document', async () => {
    const id = await createProject(server.db, org)
    const { design } = (await designer.get(`/api/projects/${id}/design`)).body
    await designer.put(`/api/projects/${id}/design`, { design: { ...design, name: 'First save' }, baseRevision: 1 }).expect(200)
    const stale = await designer.put(`/api/projects/${id}/design`, { design: { ...design, name: 'Lost save' }, baseRevision: 1 })
    expect(stale.status).toBe(409)
    expect(stale.body.error).toEqual({
      code: 'conflict',
      message:
        'The design was changed by someone else (now at revision 2, yours is based on 1). Reload it and apply your change again.',
    })
    const current = await designer.get(`/api/projects/${id}/design`)
    expect(current.body.design.name).toBe('First save')
  })

  it('lets exactly one of three simultaneous saves on the same revision win', async () => {
    const id = await createProject(server.db, org)
    const { design } = (await designer.get(`/api/projects/${id}/design`)).body
    const results = await Promise.all(
      ['A', 'B', 'C'].map((name) => designer.put(`/api/projects/${id}/design`, { design: { ...design, name }, baseRevision: 1 })),
    )
    expect(results.map((r) => r.status).sort()).toEqual([200, 409, 409])
    expect((await designer.get(`/api/projects/${id}/design`)).body.revision).toBe(2)
  })

  it('answers 400 with the design field path and leaves the stored design alone', async () => {
    const id = await createProject(server.db, org, { nominalVoltageV: 24 })
    const demo = createDemoDesign()
    demo.conductors[0].lengthM = -1
    const res = await designer.put(`/api/projects/${id}/design`, { design: demo, baseRevision: 1 })
    expect(res.status).toBe(400)
    expect(res.body.error).toEqual({
      code: 'invalid_request',
      message: 'Length must be more than 0 m',
      fields: [{ path: 'design.conductors[0].lengthM', message: 'Length must be more than 0 m' }],
    })
    expect((await designer.get(`/api/projects/${id}/design`)).body.revision).toBe(1)
  })

  it('answers 400 for a document that is not a design, and for a missing base revision', async () => {
    const id = await createProject(server.db, org)
    const notDesign = await designer.put(`/api/projects/${id}/design`, { design: { hello: 'world' }, baseRevision: 1 })
    expect(notDesign.status).toBe(400)
    expect(notDesign.body.error.fields.length).toBeGreaterThan(0)
    expect(notDesign.body.error.fields[0].path).toMatch(/^design/)

    const noBase = await designer.put(`/api/projects/${id}/design`, { design: createDemoDesign() })
    expect(noBase.status).toBe(400)
    expect(noBase.body.error.fields).toEqual([{ path: 'baseRevision', message: 'Send the revision your change is based on' }])
  })

  it('answers 413 payload_too_large for a body over the limit', async () => {
    const id = await createProject(server.db, org)
    const huge = { design: { name: 'x'.repeat(6 * 1024 * 1024) }, baseRevision: 1 }
    const res = await designer.put(`/api/projects/${id}/design`, huge)
    expect(res.status).toBe(413)
    expect(res.body.error.code).toBe('payload_too_large')
  })
})
