// Live co-editing through the real /collab endpoint: real y-websocket providers from Node (ws as their
// WebSocket, the session cookie in the handshake), the real PostgreSQL, the API reading the same state.
import { count, eq } from 'drizzle-orm'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import * as Y from 'yjs'
import { createDesignMutations, readDesignFromDoc } from '../../shared/collab/designYDoc'
import { createDemoDesign } from '../../shared/design/demo'
import type { Design, Part } from '../../shared/design/schema'
import { designStates, designUpdates } from '../../server/db/schema'
import { connectProvider, RawCollabClient, waitFor, type ProviderClient } from '../helpers/collab'
import { createOrganization, createProject, type TestOrganization } from '../helpers/factories'
import { freshSessionClient, type Api } from '../helpers/http'
import { startTestServer, type TestServer } from '../helpers/server'

let server: TestServer
let org: TestOrganization
let owner: Api
let designer: Api
let reviewer: Api
let client: Api
const open: { close(): unknown }[] = []

beforeAll(async () => {
  server = await startTestServer()
  org = await createOrganization(server.db, 'Collab')
  const session = (user: { id: string }) => freshSessionClient(server, { userId: user.id, organizationId: org.id })
  owner = await session(org.owner)
  designer = await session(org.designer)
  reviewer = await session(org.reviewer)
  client = await session(org.client)
})
afterAll(async () => {
  for (const c of open) await c.close()
  await server.close()
})

const track = <T extends { close(): unknown }>(c: T): T => (open.push(c), c)
const provider = async (api: Api, projectId: string) => track(await connectProvider(server.baseUrl, projectId, api.cookie!))
const raw = async (api: Api, projectId: string) => track(await RawCollabClient.open(server.baseUrl, projectId, api.cookie!))
const demoProject = () => createProject(server.db, org, { document: createDemoDesign(), sharedWith: [org.client] })

/** A copy of the demo's first part under a new id (an edit that is easy to count). */
function extraPart(id: string, x: number): Part {
  const template = createDemoDesign().parts[0]
  return { ...template, id, label: `Added ${id}`, position: { x, y: 400 } } as Part
}

/**
 * The design with parts and conductors in id order: Y.Map keys iterate in the order their items were
 * integrated, which differs between replicas that received the same edits in a different order.
 */
function canonical(design: Design): Design {
  const byId = (x: { id: string }, y: { id: string }) => x.id.localeCompare(y.id)
  return { ...design, parts: [...design.parts].sort(byId), conductors: [...design.conductors].sort(byId) }
}
const stateOf = (c: ProviderClient) => JSON.stringify(canonical(readDesignFromDoc(c.doc)))
const logRows = async (projectId: string) =>
  (await server.db.select({ n: count() }).from(designUpdates).where(eq(designUpdates.projectId, projectId)))[0].n

describe('two editors', () => {
  it('edit the same design concurrently and converge to one document, which the API then returns', async () => {
    const projectId = await demoProject()
    const a = await provider(owner, projectId)
    const b = await provider(designer, projectId)
    expect(readDesignFromDoc(a.doc).parts).toHaveLength(createDemoDesign().parts.length)
    const editsA = createDesignMutations(a.doc)
    const editsB = createDesignMutations(b.doc)
    // Interleaved edits, some on the same part field (last writer wins, but both sides agree).
    for (let i = 0; i < 20; i++) {
      editsA.addParts([extraPart(`a-${i}`, i * 10)])
      editsB.addParts([extraPart(`b-${i}`, i * 10)])
      editsA.setPartLabel('roof-array', `Array by A ${i}`)
      editsB.setPartLabel('roof-array', `Array by B ${i}`)
      editsB.moveParts({ [`a-${Math.max(0, i - 1)}`]: { x: 1000 + i, y: 5 } })
    }
    await waitFor(() => stateOf(a) === stateOf(b) && readDesignFromDoc(a.doc).parts.length === 63, 'convergence')
    const parts = readDesignFromDoc(a.doc).parts
    for (let i = 0; i < 20; i++) {
      expect(parts.some((p) => p.id === `a-${i}`)).toBe(true)
      expect(parts.some((p) => p.id === `b-${i}`)).toBe(true)
    }
    // The API view is the stored state: the same document once every edit is stored.
    // Every edit reached the other editor only after it was stored, so the API returns the same design.
    const stored = (await owner.get(`/api/projects/${projectId}/design`)).body.design
    expect(canonical(stored)).toEqual(canonical(readDesignFromDoc(a.doc)))
  })

  it('see each other’s presence (awareness), and a PUT of the design reaches a connected editor live', async () => {
    const projectId = await demoProject()
    const a = await provider(owner, projectId)
    const b = await provider(designer, projectId)
    a.provider.awareness.setLocalState({ user: { id: org.owner.id, name: org.owner.name, colour: '#1e88e5' }, selection: ['mppt'], pointer: { x: 10, y: 20 } })
    await waitFor(() => [...b.provider.awareness.getStates().values()].some((s) => s.user?.id === org.owner.id), 'presence')
    const seen = [...b.provider.awareness.getStates().values()].find((s) => s.user?.id === org.owner.id)
    expect(seen).toEqual({ user: { id: org.owner.id, name: org.owner.name, colour: '#1e88e5' }, selection: ['mppt'], pointer: { x: 10, y: 20 } })

    const current = (await designer.get(`/api/projects/${projectId}/design`)).body
    const renamed = { ...current.design, name: 'Saved through the API' }
    const saved = await designer.put(`/api/projects/${projectId}/design`, { design: renamed, baseRevision: current.revision })
    expect(saved.status).toBe(200)
    await waitFor(() => readDesignFromDoc(b.doc).name === 'Saved through the API', 'the saved design on the live editor')
    expect(readDesignFromDoc(a.doc).name).toBe('Saved through the API')
  })
})

describe('read-only connections (reviewer, client)', () => {
  it.each([['reviewer'], ['client']] as const)(
    'a %s’s crafted updates are neither stored nor broadcast, while their awareness is',
    async (role) => {
      const projectId = await demoProject()
      const watcher = await provider(designer, projectId)
      const intruder = await raw(role === 'reviewer' ? reviewer : client, projectId)
      await intruder.flush()
      const before = JSON.stringify(readDesignFromDoc(watcher.doc))
      const rowsBefore = await logRows(projectId)
      const dropsBefore = server.collab.stats.droppedUpdates

      // As an update message and as a sync step 2 (both carry document content).
      intruder.edit((doc) => doc.getMap<Y.Map<unknown>>('parts').get('roof-array')!.set('label', 'Changed by a watcher'))
      intruder.edit((doc) => doc.getMap('meta').set('name', 'Renamed by a watcher'))
      intruder.sendAwareness({ user: { id: 'x', name: `${role} watching`, colour: '#43a047' }, selection: [], pointer: null })
      await intruder.flush()
      await waitFor(
        () => [...watcher.provider.awareness.getStates().values()].some((s) => s.user?.name === `${role} watching`),
        'the watcher’s presence',
      )
      expect(server.collab.stats.droppedUpdates - dropsBefore).toBe(2)
      expect(JSON.stringify(readDesignFromDoc(watcher.doc))).toBe(before)
      expect(await logRows(projectId)).toBe(rowsBefore)
      const stored = (await owner.get(`/api/projects/${projectId}/design`)).body.design
      expect(stored.name).not.toBe('Renamed by a watcher')
      expect(stored.parts.find((p: Part) => p.id === 'roof-array').label).not.toBe('Changed by a watcher')

      // The same crafted update from an editor is stored and broadcast (the filter, not the message, decides).
      const editor = await raw(designer, projectId)
      await editor.flush()
      editor.edit((doc) => doc.getMap('meta').set('name', 'Renamed by an editor'))
      await editor.flush()
      await waitFor(() => readDesignFromDoc(watcher.doc).name === 'Renamed by an editor', 'the editor’s change')
      expect(await logRows(projectId)).toBe(rowsBefore + 1)
    },
  )

  it('a read-only provider still receives every change live', async () => {
    const projectId = await demoProject()
    const editor = await provider(designer, projectId)
    const watcher = await provider(reviewer, projectId)
    createDesignMutations(editor.doc).setName('Watched live')
    await waitFor(() => readDesignFromDoc(watcher.doc).name === 'Watched live', 'the change on the watcher')
  })
})

describe('storage', () => {
  it('converts a design stored only as JSON on first open, once, and keeps its content', async () => {
    const demo = createDemoDesign()
    const projectId = await createProject(server.db, org, { document: demo })
    expect(await server.db.select().from(designStates).where(eq(designStates.projectId, projectId))).toHaveLength(0)
    const [a, b] = await Promise.all([provider(owner, projectId), provider(designer, projectId)])
    expect(readDesignFromDoc(a.doc)).toEqual(demo)
    expect(readDesignFromDoc(b.doc)).toEqual(demo)
    expect(await server.db.select().from(designStates).where(eq(designStates.projectId, projectId))).toHaveLength(1)
  })

  it('compacts the log when the last editor leaves; the design loads the same from the compacted state', async () => {
    const projectId = await demoProject()
    const editor = await raw(designer, projectId)
    await editor.flush()
    for (let i = 0; i < 12; i++) {
      editor.edit((doc) => {
        const parts = doc.getMap<Y.Map<unknown>>('parts')
        parts.get('roof-array')!.set('label', `Label ${i}`)
      })
    }
    await editor.flush()
    // One row per update (updates arriving during a commit share the next statement, not a row).
    expect(await logRows(projectId)).toBe(12)
    const expected = readDesignFromDoc(editor.doc)
    await editor.close()
    await waitFor(() => !server.hub.isOpen(projectId), 'the room to close')
    expect(await logRows(projectId)).toBe(0)
    const [state] = await server.db.select().from(designStates).where(eq(designStates.projectId, projectId))
    expect(state.compactedThrough).toBeGreaterThan(0)
    expect(canonical((await owner.get(`/api/projects/${projectId}/design`)).body.design)).toEqual(canonical(expected))
    expect(expected.parts.find((p) => p.id === 'roof-array')!.label).toBe('Label 11')
    const again = await provider(owner, projectId)
    expect(canonical(readDesignFromDoc(again.doc))).toEqual(canonical(expected))
  })
})
