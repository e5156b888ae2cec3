// Load list CSV import: every bad cell reported with its line and column and nothing changed; good
// rows become load parts in a column, running in every scenario.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createDemoDesign } from '../../shared/design/demo'
import { createOrganization, createProject, type TestOrganization } from '../helpers/factories'
import { freshSessionClient, type Api } from '../helpers/http'
import { startTestServer, type TestServer } from '../helpers/server'

let server: TestServer
let org: TestOrganization
let designer: Api

beforeAll(async () => {
  server = await startTestServer()
  org = await createOrganization(server.db, 'Loads')
  designer = await freshSessionClient(server, { userId: org.designer.id, organizationId: org.id })
})
afterAll(() => server.close())

const importCsv = (api: Api, id: string, csv: string) => api.send('post', `/api/projects/${id}/design/import-loads`).set('Content-Type', 'text/csv').send(csv)

describe('POST /api/projects/:id/design/import-loads', () => {
  it('adds good rows as loads in a column to the right of the drawing', async () => {
    const id = await createProject(server.db, org, { document: createDemoDesign(), nominalVoltageV: 24 })
    const csv = 'Name,Watts,Amps,Hours per day,Critical\nDiesel heater fan,40,,8,no\nBilge pump,,4.5,0.5,yes\n"Starlink, dish",75,,6,TRUE\n'
    const res = await importCsv(designer, id, csv)
    expect(res.status).toBe(200)
    expect(res.body.added.map((a: { label: string }) => a.label)).toEqual(['Diesel heater fan', 'Bilge pump', 'Starlink, dish'])
    const { design } = (await designer.get(`/api/projects/${id}/design`)).body
    // Part order is not kept by the stored (Yjs) design: find the new parts by id.
    const added = res.body.added.map((a: { id: string }) => design.parts.find((p: { id: string }) => p.id === a.id))
    expect(added.map((p: { params: unknown }) => p.params)).toEqual([
      expect.objectContaining({ model: 'power', powerW: 40, hoursPerDay: 8, critical: false }),
      expect.objectContaining({ model: 'current', currentA: 4.5, hoursPerDay: 0.5, critical: true }),
      expect.objectContaining({ model: 'power', powerW: 75, hoursPerDay: 6, critical: true }),
    ])
    const demoRight = Math.max(...createDemoDesign().parts.map((p) => p.position.x))
    expect(new Set(added.map((p: { position: { x: number } }) => p.position.x)).size).toBe(1)
    expect(added[0].position.x).toBeGreaterThan(demoRight)
    for (const s of design.scenarios) expect(s.loads[added[0].id]).toEqual({ on: true, level: 1 })
  })

  it('reports every bad row with its line and column and changes nothing', async () => {
    const id = await createProject(server.db, org, { document: createDemoDesign(), nominalVoltageV: 24 })
    const before = (await designer.get(`/api/projects/${id}/design`)).body
    const csv = 'name,watts,amps,hours per day,critical\nFridge,45,,24,no\n,10,,2,no\nPump,abc,,1,yes\nFan,10,2,1,maybe\nHeater,30,,25,no\n'
    const res = await importCsv(designer, id, csv)
    expect(res.status).toBe(400)
    expect(res.body.error.fields.map((f: { path: string }) => f.path)).toEqual([
      'line 3.name', 'line 4.watts', 'line 5.amps', 'line 5.critical', 'line 6.hours per day',
    ])
    expect(res.body.error.fields[3].message).toBe('Line 5, column "critical": "maybe" is not yes, no, true or false')
    expect((await designer.get(`/api/projects/${id}/design`)).body).toEqual(before)
  })

  it('names missing columns and refuses roles that cannot edit', async () => {
    const id = await createProject(server.db, org)
    const res = await importCsv(designer, id, 'load,kW\nx,1\n')
    expect(res.status).toBe(400)
    expect(res.body.error.fields.map((f: { path: string }) => f.path)).toEqual(['line 1.watts', 'line 1.hours per day', 'line 1.critical'])
    const reviewer = await freshSessionClient(server, { userId: org.reviewer.id, organizationId: org.id })
    expect((await importCsv(reviewer, id, 'name,watts,hours per day,critical\nx,1,1,no\n')).status).toBe(403)
  })
})
