// A device from the organisation's library, chosen for a fuse: the library entry is read through the
// API, copied with embedLibraryDevice (what the part inspector's picker does), saved in the design and
// analysed from the design alone. A copy whose points cannot describe a device is refused with its
// field path. The device is our own invention (examples/library-device-pump.json uses the same points).
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { CustomDevice } from '../../shared/api/devices.schemas'
import type { Design } from '../../shared/design/schema'
import { embedLibraryDevice } from '../../shared/protection/timeCurrent'
import { motorStartNuisance } from '../../server/cli/examples/timeCurrent'
import { createOrganization, createProject, TEST_PASSWORD, type TestOrganization } from '../helpers/factories'
import { signedInClient, type Api } from '../helpers/http'
import { startTestServer, type TestServer } from '../helpers/server'

let server: TestServer
let org: TestOrganization
let designer: Api

beforeAll(async () => {
  server = await startTestServer()
  org = await createOrganization(server.db, 'Library designs')
  designer = await signedInClient(server.baseUrl, org.designer.email, TEST_PASSWORD)
})
afterAll(() => server.close())

const LIBRARY_ENTRY = {
  name: 'Workshop time-delay fuse 15 A', kind: 'fuse', ratingA: 15, dcVoltageRatingV: 32, interruptingRatingA: 2000,
  timeDelay: true, source: 'Invented datasheet, figure 1',
  points: [
    { currentA: 18, minMeltS: 3600 },
    { currentA: 22, maxClearS: 3600 },
    { multiple: 2, minMeltS: 60, maxClearS: 600 },
    { currentA: 48, minMeltS: 2.5, maxClearS: 20 },
    { multiple: 10, minMeltS: 0.05, maxClearS: 0.3 },
    { currentA: 300, minMeltS: 0.008, maxClearS: 0.03 },
  ],
}

/** The pump circuit with its fuse set to `customDevice` (and the device's markings). */
function withLibraryFuse(customDevice: unknown): { design: Design; index: number } {
  const design = motorStartNuisance()
  const index = design.parts.findIndex((p) => p.id === 'branch-device')
  Object.assign(design.parts[index].params, { ratingA: 15, dcVoltageRatingV: 32, interruptingRatingA: 2000, customDevice })
  return { design, index }
}

describe('a library device in a saved design', () => {
  it('saves the copy of a library entry, and the analysis uses its band', async () => {
    await designer.post('/api/devices', LIBRARY_ENTRY).expect(201)
    const [entry] = (await designer.get('/api/devices').expect(200)).body as CustomDevice[]
    const { design } = withLibraryFuse(embedLibraryDevice(entry))
    const id = await createProject(server.db, org)
    await designer.put(`/api/projects/${id}/design`, { design, baseRevision: 1 }).expect(200)
    const saved = (await designer.get(`/api/projects/${id}/design`).expect(200)).body.design as Design
    const fuse = saved.parts.find((p) => p.id === 'branch-device')
    expect(fuse?.type === 'fuse' && fuse.params.customDevice).toMatchObject({
      libraryId: entry.id, ratingA: 15, timeDelay: true,
      maxClearPoints: [{ currentA: 22, timeS: 3600 }, { currentA: 30, timeS: 600 }, { currentA: 48, timeS: 20 }, { currentA: 150, timeS: 0.3 }, { currentA: 300, timeS: 0.03 }],
    })
    // 48 A for 0.5 s: the library device may melt only after 2.5 s (its own point); the blade band would open.
    const analysed = await designer.post('/api/analyze', { design: saved }).expect(200)
    expect(analysed.body.findings.filter((f: { ruleId: string }) => f.ruleId === 'motor-start-nuisance-open')).toEqual([])
    const generic = await designer.post('/api/analyze', { design: motorStartNuisance() }).expect(200)
    expect(generic.body.findings.map((f: { ruleId: string }) => f.ruleId)).toContain('motor-start-nuisance-open')
  })

  it('answers 400 at the point whose time rises, and when the part rating is not the device rating', async () => {
    const id = await createProject(server.db, org)
    const copy = embedLibraryDevice({ id: 'lib-x', ...LIBRARY_ENTRY, kind: 'fuse' })
    copy.maxClearPoints[2] = { currentA: 48, timeS: 900 }
    const { design, index } = withLibraryFuse(copy)
    const res = await designer.put(`/api/projects/${id}/design`, { design, baseRevision: 1 })
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual([
      { path: `design.parts[${index}].params.customDevice.maxClearPoints[2].timeS`, message: 'Time must not rise as the current rises' },
    ])
    const mismatch = withLibraryFuse(embedLibraryDevice({ id: 'lib-x', ...LIBRARY_ENTRY, kind: 'fuse' }))
    ;(mismatch.design.parts[mismatch.index].params as { ratingA: number }).ratingA = 20
    const res2 = await designer.put(`/api/projects/${id}/design`, { design: mismatch.design, baseRevision: 1 })
    expect(res2.status).toBe(400)
    expect(res2.body.error.fields[0].path).toBe(`design.parts[${mismatch.index}].params.ratingA`)
    expect((await designer.get(`/api/projects/${id}/design`)).body.revision).toBe(1)
  })
})
