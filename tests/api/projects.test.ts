// Projects: create (with its design), read, search, sort, paginate, archive, duplicate, delete, shares.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Project } from '../../shared/api/projects.schemas'
import { createMember, createOrganization, createProject, TEST_PASSWORD, type TestOrganization } from '../helpers/factories'
import { apiClient, signedInClient, type Api } from '../helpers/http'
import { startTestServer, type TestServer } from '../helpers/server'

let server: TestServer
let org: TestOrganization
let designer: Api
let owner: Api

beforeAll(async () => {
  server = await startTestServer()
  org = await createOrganization(server.db, 'Projects')
  designer = await signedInClient(server.baseUrl, org.designer.email, TEST_PASSWORD)
  owner = await signedInClient(server.baseUrl, org.owner.email, TEST_PASSWORD)
})
afterAll(() => server.close())

const input = {
  name: 'Catamaran house bank',
  clientName: 'Saltmarsh Charters',
  installationKind: 'vessel',
  nominalVoltageV: 24,
  notes: 'Two 200 Ah banks, one per hull.',
}

describe('POST /api/projects', () => {
  it('creates the project and its empty design (revision 1)', async () => {
    const res = await designer.post('/api/projects', input)
    expect(res.status).toBe(201)
    const project = res.body as Project
    expect(project).toMatchObject({ ...input, archived: false, createdBy: { id: org.designer.id, name: org.designer.name } })
    expect(Date.parse(project.createdAt)).not.toBeNaN()

    const design = await designer.get(`/api/projects/${project.id}/design`)
    expect(design.status).toBe(200)
    expect(design.body.revision).toBe(1)
    expect(design.body.design).toMatchObject({
      name: input.name,
      settings: { nominalVoltageV: 24, profile: 'marine' },
      parts: [],
      conductors: [],
    })
  })

  it('fills optional fields with their defaults', async () => {
    const res = await designer.post('/api/projects', { name: '  Cabin ', installationKind: 'building', nominalVoltageV: 48 })
    expect(res.status).toBe(201)
    expect(res.body).toMatchObject({ name: 'Cabin', clientName: '', notes: '' })
  })

  it('answers 400 with the exact field messages', async () => {
    const res = await designer.post('/api/projects', { name: '', installationKind: 'bus', nominalVoltageV: 36, notes: 'x'.repeat(5001) })
    expect(res.status).toBe(400)
    expect(res.body.error.code).toBe('invalid_request')
    expect(res.body.error.message).toBe('Some fields are not valid')
    expect(res.body.error.fields).toEqual([
      { path: 'name', message: 'Enter a project name' },
      { path: 'installationKind', message: 'Invalid option: expected one of "vehicle"|"vessel"|"building"|"other"' },
      { path: 'nominalVoltageV', message: 'Choose 12, 24 or 48 V' },
      { path: 'notes', message: 'Too big: expected string to have <=5000 characters' },
    ])
  })

  it('answers 400 for a body that is not JSON and 401 without a session', async () => {
    const broken = await designer.send('post', '/api/projects').set('Content-Type', 'application/json').send('{"name":')
    expect(broken.status).toBe(400)
    expect(broken.body.error).toEqual({ code: 'invalid_request', message: 'The request body is not valid JSON' })
    const anonymous = await apiClient(server.baseUrl).post('/api/projects', input)
    expect(anonymous.status).toBe(401)
  })
})

describe('POST /api/projects/demo', () => {
  it('creates the invented demo system as a project whose design opens with findings', async () => {
    const res = await designer.post('/api/projects/demo')
    expect(res.status).toBe(201)
    expect(res.body).toMatchObject({ installationKind: 'vehicle', nominalVoltageV: 24, archived: false })
    const design = await designer.get(`/api/projects/${res.body.id}/design`)
    expect(design.status).toBe(200)
    expect(design.body.design.parts.length).toBeGreaterThan(10)
    const analysis = await designer.post('/api/analyze', { design: design.body.design })
    expect(analysis.status).toBe(200)
    // The demo is meant to teach: at least two real findings (see shared/design/demo.ts).
    const serious = analysis.body.findings.filter((f: { severity: string }) => f.severity !== 'info')
    expect(serious.length).toBeGreaterThanOrEqual(2)
  })
})

describe('GET /api/projects: search, sort, pagination, archive filter', () => {
  let listOrg: TestOrganization
  let api: Api
  beforeAll(async () => {
    listOrg = await createOrganization(server.db, 'Listing')
    api = await signedInClient(server.baseUrl, listOrg.reviewer.email, TEST_PASSWORD)
    const rows = [
      { name: 'Alpha van', clientName: 'Northwind Campers', notes: '', nominalVoltageV: 12 },
      { name: 'bravo boat', clientName: 'Quayside', notes: 'needs a 100% review', nominalVoltageV: 24 },
      { name: 'Charlie cabin', clientName: 'Fernhill', notes: 'off-grid, 48 V', nominalVoltageV: 48 },
      { name: 'Delta trailer', clientName: 'Northwind Campers', notes: '', nominalVoltageV: 12 },
      { name: 'Echo bus', clientName: 'Roadhouse', notes: 'under_floor bank', nominalVoltageV: 24 },
    ]
    for (const row of rows) await createProject(server.db, listOrg, row)
    const archivedId = await createProject(server.db, listOrg, { name: 'Foxtrot (archived)', clientName: 'Northwind Campers' })
    const listOwner = await signedInClient(server.baseUrl, listOrg.owner.email, TEST_PASSWORD)
    await listOwner.patch(`/api/projects/${archivedId}`, { archived: true }).expect(200)
  })

  const names = (body: { items: Project[] }) => body.items.map((p) => p.name)

  it('sorts by name case-insensitively, both ways, excluding archived by default', async () => {
    const asc = await api.get('/api/projects?sort=name&order=asc')
    expect(asc.status).toBe(200)
    expect(names(asc.body)).toEqual(['Alpha van', 'bravo boat', 'Charlie cabin', 'Delta trailer', 'Echo bus'])
    expect(asc.body).toMatchObject({ total: 5, page: 1, pageSize: 20 })
    const desc = await api.get('/api/projects?sort=name&order=desc')
    expect(names(desc.body)).toEqual(['Echo bus', 'Delta trailer', 'Charlie cabin', 'bravo boat', 'Alpha van'])
  })

  it('sorts by voltage, then by id for a stable order', async () => {
    const res = await api.get('/api/projects?sort=nominalVoltageV&order=desc&pageSize=1')
    expect(names(res.body)).toEqual(['Charlie cabin'])
  })

  it('pages through the results', async () => {
    const page1 = await api.get('/api/projects?sort=name&order=asc&pageSize=2&page=1')
    const page3 = await api.get('/api/projects?sort=name&order=asc&pageSize=2&page=3')
    expect(names(page1.body)).toEqual(['Alpha van', 'bravo boat'])
    expect(names(page3.body)).toEqual(['Echo bus'])
    expect(page3.body).toMatchObject({ total: 5, page: 3, pageSize: 2 })
    const beyond = await api.get('/api/projects?pageSize=2&page=9')
    expect(beyond.body).toMatchObject({ items: [], total: 5 })
  })

  it('searches name, client and notes, case-insensitively, with % and _ taken literally', async () => {
    expect(names((await api.get('/api/projects?q=northwind&sort=name&order=asc')).body)).toEqual(['Alpha van', 'Delta trailer'])
    expect(names((await api.get('/api/projects?q=CABIN')).body)).toEqual(['Charlie cabin'])
    expect(names((await api.get('/api/projects?q=off-grid')).body)).toEqual(['Charlie cabin'])
    expect(names((await api.get('/api/projects?q=100%25')).body)).toEqual(['bravo boat'])
    expect(names((await api.get('/api/projects?q=under_floor')).body)).toEqual(['Echo bus'])
    expect(names((await api.get('/api/projects?q=under%25floor')).body)).toEqual([])
  })

  it('filters archived projects: exclude (default), only, include', async () => {
    expect(names((await api.get('/api/projects?archived=only')).body)).toEqual(['Foxtrot (archived)'])
    const all = await api.get('/api/projects?archived=include&q=northwind&sort=name&order=asc')
    expect(names(all.body)).toEqual(['Alpha van', 'Delta trailer', 'Foxtrot (archived)'])
  })

  it('answers 400 for a bad query with the field paths', async () => {
    const res = await api.get('/api/projects?sort=colour&page=0&pageSize=500&archived=maybe')
    expect(res.status).toBe(400)
    expect(res.body.error.fields.map((f: { path: string }) => f.path)).toEqual(['sort', 'page', 'pageSize', 'archived'])
    expect(res.body.error.fields[1]).toEqual({ path: 'page', message: 'Too small: expected number to be >=1' })
  })
})

describe('PATCH, duplicate, DELETE', () => {
  it('renames and edits; an empty patch is 400; a bad voltage gives its field message', async () => {
    const id = await createProject(server.db, org, { name: 'Before' })
    const res = await designer.patch(`/api/projects/${id}`, { name: 'After', notes: 'changed' })
    expect(res.status).toBe(200)
    expect(res.body).toMatchObject({ id, name: 'After', notes: 'changed' })
    expect(Date.parse(res.body.updatedAt)).toBeGreaterThanOrEqual(Date.parse(res.body.createdAt))
    const empty = await designer.patch(`/api/projects/${id}`, {})
    expect(empty.status).toBe(400)
    expect(empty.body.error.message).toBe('Nothing to change')
    const bad = await designer.patch(`/api/projects/${id}`, { nominalVoltageV: 6 })
    expect(bad.body.error.fields).toEqual([{ path: 'nominalVoltageV', message: 'Choose 12, 24 or 48 V' }])
  })

  it('archives and unarchives, leaving the other fields as they were', async () => {
    const id = await createProject(server.db, org, { clientName: 'Keep me', notes: 'Keep these notes' })
    const archived = await designer.patch(`/api/projects/${id}`, { archived: true })
    expect(archived.body).toMatchObject({ archived: true, clientName: 'Keep me', notes: 'Keep these notes' })
    expect((await designer.patch(`/api/projects/${id}`, { archived: false })).body.archived).toBe(false)
  })

  it('duplicates a project with its design as "<name> (copy)", shortened to fit 120 characters', async () => {
    const id = (await designer.post('/api/projects', input)).body.id as string
    const current = await designer.get(`/api/projects/${id}/design`)
    const edited = { ...current.body.design, name: 'Edited design name' }
    await designer.put(`/api/projects/${id}/design`, { design: edited, baseRevision: 1 }).expect(200)

    const copy = await designer.post(`/api/projects/${id}/duplicate`)
    expect(copy.status).toBe(201)
    expect(copy.body).toMatchObject({ name: 'Catamaran house bank (copy)', clientName: input.clientName, archived: false })
    expect(copy.body.id).not.toBe(id)
    const copiedDesign = await designer.get(`/api/projects/${copy.body.id}/design`)
    expect(copiedDesign.body.design).toEqual(edited)
    expect(copiedDesign.body.revision).toBe(1)

    const longId = await createProject(server.db, org, { name: 'L'.repeat(120) })
    const longCopy = await designer.post(`/api/projects/${longId}/duplicate`)
    expect(longCopy.body.name).toBe('L'.repeat(113) + ' (copy)')
    expect(longCopy.body.name).toHaveLength(120)
  })

  it('deletes (owner) with its design; afterwards 404', async () => {
    const id = await createProject(server.db, org)
    expect((await owner.delete(`/api/projects/${id}`)).status).toBe(204)
    expect((await owner.get(`/api/projects/${id}`)).status).toBe(404)
    expect((await owner.get(`/api/projects/${id}/design`)).status).toBe(404)
    const again = await owner.delete(`/api/projects/${id}`)
    expect(again.status).toBe(404)
    expect(again.body.error).toEqual({ code: 'not_found', message: 'Project not found' })
  })

  it('answers 400 for an id that is not a uuid', async () => {
    const res = await owner.get('/api/projects/not-a-uuid')
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual([{ path: 'id', message: 'Not a valid id' }])
  })
})

describe('shares', () => {
  it('shares with a client member, lists, and unshares; the client sees the project only while shared', async () => {
    const id = await createProject(server.db, org, { name: 'Shared later' })
    const client = await signedInClient(server.baseUrl, org.otherClient.email, TEST_PASSWORD)
    expect((await client.get(`/api/projects/${id}`)).status).toBe(404)

    const shared = await designer.post(`/api/projects/${id}/shares`, { userId: org.otherClient.id })
    expect(shared.status).toBe(201)
    expect(shared.body).toEqual({ userId: org.otherClient.id, name: org.otherClient.name, email: org.otherClient.email })
    expect((await designer.get(`/api/projects/${id}/shares`)).body).toEqual([shared.body])
    expect((await client.get(`/api/projects/${id}`)).status).toBe(200)
    expect((await client.get('/api/projects?q=Shared%20later')).body.total).toBe(1)

    expect((await designer.delete(`/api/projects/${id}/shares/${org.otherClient.id}`)).status).toBe(204)
    expect((await client.get(`/api/projects/${id}`)).status).toBe(404)
    expect((await client.get('/api/projects?q=Shared%20later')).body.total).toBe(0)
    expect((await designer.delete(`/api/projects/${id}/shares/${org.otherClient.id}`)).status).toBe(404)
  })

  it('refuses to share with a non-client member (400) or someone outside the organisation (404)', async () => {
    const id = await createProject(server.db, org)
    const withReviewer = await designer.post(`/api/projects/${id}/shares`, { userId: org.reviewer.id })
    expect(withReviewer.status).toBe(400)
    expect(withReviewer.body.error.fields).toEqual([
      { path: 'userId', message: 'Only client members can be given a share: other roles already see every project' },
    ])
    const other = await createOrganization(server.db, 'Elsewhere')
    const outsider = await createMember(server.db, other.id, 'client')
    const withOutsider = await designer.post(`/api/projects/${id}/shares`, { userId: outsider.id })
    expect(withOutsider.status).toBe(404)
    const notUuid = await designer.post(`/api/projects/${id}/shares`, { userId: 'someone' })
    expect(notUuid.body.error.fields).toEqual([{ path: 'userId', message: 'Choose a client member' }])
  })
})
