// The organisation's device library: create/read/change/delete, the band checks of datasheetBand
// reported at field paths, CSV import with line/column errors (nothing saved), role and organisation
// limits. The points are an invented 20 A fuse's datasheet (our own figures, not a real product).
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { CustomDevice } from '../../shared/api/devices.schemas'
import { customDeviceBand } from '../../shared/api/devices.schemas'
import { createOrganization, type TestOrganization } from '../helpers/factories'
import { apiClient, freshSessionClient, type Api } from '../helpers/http'
import { startTestServer, type TestServer } from '../helpers/server'

let server: TestServer
let org: TestOrganization
let other: TestOrganization
const as = {} as Record<'owner' | 'designer' | 'reviewer' | 'client' | 'otherOwner', Api>

beforeAll(async () => {
  server = await startTestServer()
  org = await createOrganization(server.db, 'Devices')
  other = await createOrganization(server.db, 'Devices other')
  const session = (userId: string, organizationId: string) => freshSessionClient(server, { userId, organizationId })
  as.owner = await session(org.owner.id, org.id)
  as.designer = await session(org.designer.id, org.id)
  as.reviewer = await session(org.reviewer.id, org.id)
  as.client = await session(org.client.id, org.id)
  as.otherOwner = await session(other.owner.id, other.id)
})
afterAll(() => server.close())

const POINTS = [
  { currentA: 27, minMeltS: 120, maxClearS: 1800 },
  { currentA: 40, minMeltS: 0.8, maxClearS: 5 },
  { currentA: 70, minMeltS: 0.1, maxClearS: 0.5 },
  { currentA: 200, minMeltS: 0.003, maxClearS: 0.02 },
]
const device = (overrides: object = {}) => ({
  name: 'Workshop strip fuse 20 A',
  kind: 'fuse',
  ratingA: 20,
  dcVoltageRatingV: 32,
  interruptingRatingA: 2000,
  source: 'Maker datasheet rev. B, figure 2',
  points: POINTS,
  ...overrides,
})
const paths = (res: { body: { error: { fields: { path: string }[] } } }) => res.body.error.fields.map((f) => f.path)
const count = async () => ((await as.owner.get('/api/devices')).body as CustomDevice[]).length

describe('/api/devices', () => {
  it('creates, lists, reads, changes and deletes a device', async () => {
    const created = await as.designer.post('/api/devices', device())
    expect(created.status, JSON.stringify(created.body)).toBe(201)
    const d = created.body as CustomDevice
    expect(d).toMatchObject({ name: 'Workshop strip fuse 20 A', kind: 'fuse', ratingA: 20, ignitionProtected: false, timeDelay: false, createdBy: org.designer.id })
    expect(d.points).toEqual(POINTS)

    // Every non-client role reads the library.
    const list = await as.reviewer.get('/api/devices')
    expect(list.status).toBe(200)
    expect((list.body as CustomDevice[]).map((x) => x.id)).toContain(d.id)
    expect((await as.reviewer.get(`/api/devices/${d.id}`)).body).toEqual(d)

    // A partial change keeps the other fields.
    const renamed = await as.owner.patch(`/api/devices/${d.id}`, { name: 'Strip fuse 20 A', ignitionProtected: true })
    expect(renamed.status).toBe(200)
    expect(renamed.body).toMatchObject({ name: 'Strip fuse 20 A', ignitionProtected: true, ratingA: 20, dcVoltageRatingV: 32, points: POINTS })

    // The stored points still build a band through them (datasheetBand: log–log through the points).
    const band = customDeviceBand(renamed.body as CustomDevice)
    expect(band.ok).toBe(true)
    if (band.ok) {
      expect(band.band.maxClearS(40)).toBeCloseTo(5, 9)
      expect(band.band.minMeltS(70)).toBeCloseTo(0.1, 9)
    }

    expect((await as.designer.delete(`/api/devices/${d.id}`)).status).toBe(204)
    expect((await as.designer.get(`/api/devices/${d.id}`)).status).toBe(404)
    expect((await as.designer.delete(`/api/devices/${d.id}`)).status).toBe(404)
  })

  it('accepts currents as multiples of the rating', async () => {
    const points = POINTS.map(({ currentA, ...times }) => ({ multiple: currentA / 20, ...times }))
    const res = await as.designer.post('/api/devices', device({ name: 'By multiples', points }))
    expect(res.status).toBe(201)
    expect(res.body.points[1]).toEqual({ multiple: 2, minMeltS: 0.8, maxClearS: 5 })
  })

  it('answers 400 with field paths for bad fields and bad points, and saves nothing', async () => {
    const before = await count()
    const bad = await as.designer.post('/api/devices', device({ name: ' ', kind: 'relay', ratingA: -5, source: '' }))
    expect(bad.status).toBe(400)
    expect(bad.body.error.code).toBe('invalid_request')
    expect(paths(bad).sort()).toEqual(['kind', 'name', 'ratingA', 'source'])
    expect(bad.body.error.fields.find((f: { path: string }) => f.path === 'kind').message).toBe('Choose fuse or breaker')

    // datasheetBand's checks, at the cell that breaks them.
    const notRising = await as.designer.post('/api/devices', device({ points: [POINTS[0], { currentA: 25, minMeltS: 0.8, maxClearS: 5 }, POINTS[2]] }))
    expect(notRising.status).toBe(400)
    expect(notRising.body.error.fields).toEqual([{ path: 'points.1.currentA', message: 'Currents must rise from one point to the next' }])

    const timeRises = await as.designer.post('/api/devices', device({ points: [POINTS[0], POINTS[1], { currentA: 70, minMeltS: 0.1, maxClearS: 9 }] }))
    expect(timeRises.body.error.fields).toEqual([{ path: 'points.2.maxClearS', message: 'Time must not rise as the current rises (maximum clearing)' }])

    const crossed = await as.designer.post('/api/devices', device({ points: [POINTS[0], { currentA: 40, minMeltS: 8, maxClearS: 5 }, POINTS[2]] }))
    expect(crossed.body.error.fields).toEqual([{ path: 'points', message: 'Minimum melting time is after maximum clearing time at 40 A' }])

    const noCurrent = await as.designer.post('/api/devices', device({ points: [{ minMeltS: 1 }, POINTS[1], POINTS[2]] }))
    expect(paths(noCurrent)).toEqual(['points.0.currentA'])

    const oneMinMelt = await as.designer.post('/api/devices', device({ points: [{ currentA: 30, maxClearS: 100 }, { currentA: 60, minMeltS: 0.5, maxClearS: 2 }] }))
    expect(oneMinMelt.body.error.fields).toEqual([{ path: 'points', message: 'Give at least two points with a minimum melting time' }])

    // PATCH checks the merged device as a whole.
    const d = (await as.designer.post('/api/devices', device({ name: 'Patch target' }))).body as CustomDevice
    const badPatch = await as.designer.patch(`/api/devices/${d.id}`, { points: [POINTS[2], POINTS[1]] })
    expect(badPatch.status).toBe(400)
    expect(paths(badPatch)).toEqual(['points.1.currentA'])
    expect((await as.designer.get(`/api/devices/${d.id}`)).body.points).toEqual(POINTS)
    expect((await as.designer.patch(`/api/devices/${d.id}`, {})).status).toBe(400)
    expect(await count()).toBe(before + 1)
  })
})

describe('POST /api/devices/import-csv', () => {
  const meta = { name: 'Imported fuse 20 A', kind: 'fuse', ratingA: 20, source: 'Maker datasheet rev. B, table 4' }
  const CSV = 'currentA,minMeltS,maxClearS\n27,120,1800\n40,0.8,5\n70,0.1,0.5\n200,0.003,0.02\n'

  it('creates a device from CSV points', async () => {
    const res = await as.designer.post('/api/devices/import-csv', { ...meta, csv: CSV })
    expect(res.status, JSON.stringify(res.body)).toBe(201)
    expect(res.body).toMatchObject({ name: 'Imported fuse 20 A', points: POINTS })
  })

  it('previews the points without saving (header spellings, a blank time, decimal commas)', async () => {
    const before = await count()
    const csv = 'Current (A),Min melt (s),Max clear (s)\n27,120,1800\n40,"0,8",5\n300,,"0,01"\n'
    const res = await as.designer.post('/api/devices/import-csv', { csv, preview: true })
    expect(res.status, JSON.stringify(res.body)).toBe(200)
    expect(res.body.points).toEqual([{ currentA: 27, minMeltS: 120, maxClearS: 1800 }, { currentA: 40, minMeltS: 0.8, maxClearS: 5 }, { currentA: 300, maxClearS: 0.01 }])
    expect(await count()).toBe(before)
  })

  it('reports bad cells by line and column and saves nothing', async () => {
    const before = await count()
    const csv = 'currentA,minMeltS,maxClearS\n27,120,1800\n40,abc,5\n-70,0.1,0.5\n90,,\n'
    const res = await as.designer.post('/api/devices/import-csv', { ...meta, csv })
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual([
      { path: 'line 3.minMeltS', message: 'Line 3, column "minMeltS": "abc" is not a positive time in s' },
      { path: 'line 4.currentA', message: 'Line 4, column "currentA": "-70" is not a positive current in A' },
      { path: 'line 5.minMeltS', message: 'Line 5, column "minMeltS": enter a minimum melting or a maximum clearing time' },
    ])
    expect(res.body.error.message).toBe('The CSV has 3 problems; nothing was saved')

    // The band's checks come back at the CSV line of the point.
    const unsorted = await as.designer.post('/api/devices/import-csv', { ...meta, csv: 'currentA,minMeltS,maxClearS\n27,120,1800\n70,0.1,0.5\n40,0.8,5\n' })
    expect(unsorted.status).toBe(400)
    expect(unsorted.body.error.fields).toEqual([{ path: 'line 4.currentA', message: 'Line 4, column "currentA": Currents must rise from one point to the next' }])

    const noHeader = await as.designer.post('/api/devices/import-csv', { ...meta, csv: 'amps,seconds\n27,120\n' })
    expect(paths(noHeader)).toEqual(['line 1.minMeltS'])
    const ragged = await as.designer.post('/api/devices/import-csv', { ...meta, csv: 'currentA,minMeltS,maxClearS\n27,120\n' })
    expect(ragged.status).toBe(400)
    expect(paths(ragged)).toEqual(['line 2'])
    const noMeta = await as.designer.post('/api/devices/import-csv', { csv: CSV })
    expect(paths(noMeta).sort()).toEqual(['kind', 'name', 'ratingA', 'source'])
    expect(await count()).toBe(before)
  })
})

describe('roles and organisations', () => {
  it('lets only owners and designers write, hides the library from clients, and needs a session', async () => {
    expect((await as.reviewer.post('/api/devices', device())).status).toBe(403)
    const reviewerMsg = (await as.reviewer.post('/api/devices', device())).body.error.message
    expect(reviewerMsg).toBe('Your role (reviewer) cannot edit the device library')
    expect((await as.client.get('/api/devices')).body.error.message).toBe('Your role (client) cannot see the device library')
    expect((await apiClient(server.baseUrl).get('/api/devices')).status).toBe(401)
  })

  it("answers 404 for another organisation's device and never lists it", async () => {
    const d = (await as.owner.post('/api/devices', device({ name: 'Ours only' }))).body as CustomDevice
    expect((await as.otherOwner.get(`/api/devices/${d.id}`)).status).toBe(404)
    expect((await as.otherOwner.patch(`/api/devices/${d.id}`, { name: 'Taken' })).status).toBe(404)
    expect((await as.otherOwner.delete(`/api/devices/${d.id}`)).status).toBe(404)
    expect(((await as.otherOwner.get('/api/devices')).body as CustomDevice[]).map((x) => x.id)).not.toContain(d.id)
    expect((await as.owner.get(`/api/devices/${d.id}`)).body.name).toBe('Ours only')
    expect((await as.owner.get('/api/devices/not-a-uuid')).status).toBe(400)
  })
})
