// Named revisions: record, list, open read-only, compare (with the analysis on both sides), restore.
// The designs are the invented demo system from shared/design/demo.ts and edits of it made here.
import { randomUUID } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { readDesignFromDoc } from '../../shared/collab/designYDoc'
import { createDemoDesign } from '../../shared/design/demo'
import type { Design } from '../../shared/design/schema'
import { connectProvider, waitFor } from '../helpers/collab'
import { createOrganization, createProject, type TestOrganization } from '../helpers/factories'
import { apiClient, freshSessionClient, type Api } from '../helpers/http'
import { startTestServer, type TestServer } from '../helpers/server'

let server: TestServer
let org: TestOrganization
let designer: Api
let reviewer: Api

beforeAll(async () => {
  server = await startTestServer()
  org = await createOrganization(server.db, 'Revisions')
  designer = await freshSessionClient(server, { userId: org.designer.id, organizationId: org.id })
  reviewer = await freshSessionClient(server, { userId: org.reviewer.id, organizationId: org.id })
})
afterAll(() => server.close())

const canonical = (design: Design): Design => {
  const byId = (x: { id: string }, y: { id: string }) => x.id.localeCompare(y.id)
  return { ...design, parts: [...design.parts].sort(byId), conductors: [...design.conductors].sort(byId) }
}

/** The demo with one conductor much longer, one conductor removed and one part added. */
function editedDemo(): { design: Design; lengthened: string; removed: string; added: string } {
  const design = createDemoDesign()
  const lengthened = design.conductors[0]
  const before = lengthened.lengthM
  lengthened.lengthM = before * 10
  const removed = design.conductors.splice(design.conductors.length - 1, 1)[0]
  const added = { ...design.parts[0], id: 'spare-array', label: 'Spare array, not wired', position: { x: 900, y: 900 } }
  design.parts.push(added as Design['parts'][number])
  return { design, lengthened: lengthened.id, removed: removed.id, added: added.id }
}

describe('revisions', () => {
  it('records, lists, opens, compares and restores; history is kept', async () => {
    const demo = createDemoDesign()
    const projectId = await createProject(server.db, org, { document: demo })
    const base = `/api/projects/${projectId}/revisions`

    const first = await designer.post(base, { name: '  issued for review ' })
    expect(first.status).toBe(201)
    expect(first.body).toMatchObject({ name: 'issued for review', author: { id: org.designer.id, name: org.designer.name }, restoredFrom: null })

    const edit = editedDemo()
    const current = (await designer.get(`/api/projects/${projectId}/design`)).body
    await designer.put(`/api/projects/${projectId}/design`, { design: edit.design, baseRevision: current.revision }).expect(200)
    const second = await designer.post(base, { name: 'as built' })
    expect(second.status).toBe(201)

    const list = await reviewer.get(base)
    expect(list.status).toBe(200)
    expect(list.body.map((r: { name: string }) => r.name)).toEqual(['as built', 'issued for review'])

    const opened = await reviewer.get(`${base}/${first.body.id}`)
    expect(opened.status).toBe(200)
    expect(canonical(opened.body.design)).toEqual(canonical(demo))

    const compare = await reviewer.get(`${base}/compare?from=${first.body.id}&to=${second.body.id}`)
    expect(compare.status).toBe(200)
    const diff = compare.body
    expect(diff.parts.added).toEqual([{ id: edit.added, label: 'Spare array, not wired', type: demo.parts[0].type }])
    expect(diff.parts.removed).toEqual([])
    expect(diff.conductors.removed.map((c: { id: string }) => c.id)).toEqual([edit.removed])
    const lengthChange = diff.conductors.changed.find((c: { id: string }) => c.id === edit.lengthened)
    const demoLength = demo.conductors[0].lengthM
    expect(lengthChange.fields).toEqual([{ field: 'lengthM', from: demoLength, to: demoLength * 10 }])
    // The unwired array and the tenfold conductor must change the findings in some way.
    expect(diff.findings.appeared.length + diff.findings.cleared.length).toBeGreaterThan(0)

    // The reverse comparison swaps every side.
    const reverse = (await reviewer.get(`${base}/compare?from=${second.body.id}&to=${first.body.id}`)).body
    expect(reverse.parts.removed).toEqual(diff.parts.added)
    expect(reverse.conductors.added).toEqual(diff.conductors.removed)
    expect(reverse.findings.appeared).toEqual(diff.findings.cleared)
    expect(reverse.findings.cleared).toEqual(diff.findings.appeared)

    // Restore with an editor connected: the change arrives live.
    const live = await connectProvider(server.baseUrl, projectId, designer.cookie!)
    expect(readDesignFromDoc(live.doc).parts.some((p) => p.id === edit.added)).toBe(true)
    const restored = await designer.post(`${base}/${first.body.id}/restore`)
    expect(restored.status).toBe(201)
    expect(restored.body).toMatchObject({ name: 'Restored from “issued for review”', restoredFrom: first.body.id })
    await waitFor(() => !readDesignFromDoc(live.doc).parts.some((p) => p.id === edit.added), 'the restore on the live editor')
    expect(canonical(readDesignFromDoc(live.doc))).toEqual(canonical(demo))
    live.close()
    expect(canonical((await designer.get(`/api/projects/${projectId}/design`)).body.design)).toEqual(canonical(demo))
    expect((await reviewer.get(base)).body.map((r: { name: string }) => r.name)).toEqual([
      'Restored from “issued for review”',
      'as built',
      'issued for review',
    ])
  })

  it('answers 400 with field paths, 403 for a watcher, 404 for another project’s revision, 401 without a session', async () => {
    const projectId = await createProject(server.db, org)
    const otherProject = await createProject(server.db, org)
    const base = `/api/projects/${projectId}/revisions`
    const empty = await designer.post(base, { name: '   ' })
    expect(empty.status).toBe(400)
    expect(empty.body.error).toEqual({
      code: 'invalid_request',
      message: 'Enter a name for the revision',
      fields: [{ path: 'name', message: 'Enter a name for the revision' }],
    })
    const badCompare = await designer.get(`${base}/compare?from=nope`)
    expect(badCompare.status).toBe(400)
    expect(badCompare.body.error.fields.map((f: { path: string }) => f.path).sort()).toEqual(['from', 'to'])

    const forbidden = await reviewer.post(base, { name: 'as built' })
    expect(forbidden.status).toBe(403)
    expect(forbidden.body.error.message).toBe('Your role (reviewer) cannot record or restore revisions')

    const theirs = await designer.post(`/api/projects/${otherProject}/revisions`, { name: 'elsewhere' })
    expect((await designer.get(`${base}/${theirs.body.id}`)).status).toBe(404)
    expect((await designer.post(`${base}/${theirs.body.id}/restore`)).status).toBe(404)
    expect((await designer.get(`${base}/${randomUUID()}`)).status).toBe(404)
    expect((await apiClient(server.baseUrl).get(base)).status).toBe(401)
  })
})
