// Open /collab connections follow member and share changes made through the API at once (raw sockets,
// the real PostgreSQL): a demoted designer's later updates are dropped and not stored; a removed member,
// a client whose share was removed, and a member made client without a share are closed with 4403;
// signing out closes the connections opened with that session (4401), not the user's other sessions.
import { count, eq } from 'drizzle-orm'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import * as Y from 'yjs'
import { readDesignFromDoc } from '../../shared/collab/designYDoc'
import { COLLAB_CLOSE } from '../../shared/collab/protocol'
import { createDemoDesign } from '../../shared/design/demo'
import { designUpdates } from '../../server/db/schema'
import { RawCollabClient, waitFor } from '../helpers/collab'
import { createMember, createOrganization, createProject, type TestOrganization, type TestUser } from '../helpers/factories'
import { freshSessionClient, type Api } from '../helpers/http'
import { startTestServer, type TestServer } from '../helpers/server'

let server: TestServer
let org: TestOrganization
let owner: Api
const open: RawCollabClient[] = []

beforeAll(async () => {
  server = await startTestServer()
  org = await createOrganization(server.db, 'Collab access')
  owner = await freshSessionClient(server, { userId: org.owner.id, organizationId: org.id })
})
afterAll(async () => {
  for (const c of open) await c.close()
  await server.close()
})

const cookieOf = async (user: TestUser) => (await freshSessionClient(server, { userId: user.id, organizationId: org.id })).cookie!
const connect = async (user: TestUser, projectId: string) => {
  const client = await RawCollabClient.open(server.baseUrl, projectId, await cookieOf(user))
  open.push(client)
  await client.flush()
  return client
}
const logRows = async (projectId: string) =>
  (await server.db.select({ n: count() }).from(designUpdates).where(eq(designUpdates.projectId, projectId)))[0].n
const rename = (client: RawCollabClient, name: string) => client.edit((doc) => doc.getMap('meta').set('name', name))

describe('a role change reaches open connections', () => {
  it('a designer made reviewer mid-connection: later updates are dropped and not stored; made designer again, they are stored', async () => {
    const projectId = await createProject(server.db, org, { document: createDemoDesign() })
    const member = await createMember(server.db, org.id, 'designer', 'demoted-designer')
    const editor = await connect(member, projectId)
    const watcher = await connect(org.owner, projectId)

    rename(editor, 'Before the demotion')
    await editor.flush()
    await waitFor(() => readDesignFromDoc(watcher.doc).name === 'Before the demotion', 'the first edit on the watcher')
    const rowsBefore = await logRows(projectId)
    expect(rowsBefore).toBe(1)

    expect((await owner.patch(`/api/members/${member.id}`, { role: 'reviewer' })).status).toBe(200)
    const dropsBefore = server.collab.stats.droppedUpdates
    rename(editor, 'After the demotion')
    editor.edit((doc) => doc.getMap<Y.Map<unknown>>('parts').get('roof-array')!.set('label', 'Moved by a reviewer'))
    await editor.flush()
    await waitFor(() => editor.authNotices.length === 1, 'the notice of the new role')
    expect(editor.authNotices).toEqual(['reviewer:read-only'])
    expect(server.collab.stats.droppedUpdates - dropsBefore).toBe(2)
    expect(await logRows(projectId)).toBe(rowsBefore)
    // The watcher's sync answer comes after everything stored before it: the dropped edits are not there.
    await watcher.flush()
    expect(readDesignFromDoc(watcher.doc).name).toBe('Before the demotion')
    const stored = (await owner.get(`/api/projects/${projectId}/design`)).body.design
    expect(stored.name).toBe('Before the demotion')
    expect(editor.closed).toBe(false) // still watching live

    expect((await owner.patch(`/api/members/${member.id}`, { role: 'designer' })).status).toBe(200)
    await waitFor(() => editor.authNotices.length === 2, 'the notice of the restored role')
    expect(editor.authNotices[1]).toBe('designer:edit')
    // The old connection's doc still holds the dropped edits (later edits there build on them), so the
    // app asks for a reload; a fresh connection — what a reload opens — edits and is stored again.
    const reloaded = await connect(member, projectId)
    rename(reloaded, 'Editing again')
    await reloaded.flush()
    expect(await logRows(projectId)).toBe(rowsBefore + 1)
    await waitFor(() => readDesignFromDoc(watcher.doc).name === 'Editing again', 'the edit after the promotion')
  })

  it('a member made client with no share of the project is closed with 4403', async () => {
    const projectId = await createProject(server.db, org, { document: createDemoDesign() })
    const member = await createMember(server.db, org.id, 'reviewer', 'made-client')
    const connection = await connect(member, projectId)
    expect((await owner.patch(`/api/members/${member.id}`, { role: 'client' })).status).toBe(200)
    await waitFor(() => connection.closed, 'the connection to close')
    expect(connection.closeCode).toBe(COLLAB_CLOSE.accessRemoved)
    expect(connection.closeReason).toBe('You no longer have access to this design')
  })

  it('a member made client who has a share of the project keeps watching, read-only', async () => {
    const member = await createMember(server.db, org.id, 'designer', 'shared-designer')
    const projectId = await createProject(server.db, org, { document: createDemoDesign(), sharedWith: [member] })
    const connection = await connect(member, projectId)
    expect((await owner.patch(`/api/members/${member.id}`, { role: 'client' })).status).toBe(200)
    await waitFor(() => connection.authNotices.length === 1, 'the notice of the new role')
    expect(connection.authNotices).toEqual(['client:read-only'])
    // A round trip after the visibility check: still open.
    await connection.flush()
    expect(connection.closed).toBe(false)
  })
})

describe('lost access closes open connections with 4403', () => {
  it('a removed member', async () => {
    const projectId = await createProject(server.db, org, { document: createDemoDesign() })
    const member = await createMember(server.db, org.id, 'designer', 'removed-designer')
    const connection = await connect(member, projectId)
    const other = await connect(org.reviewer, projectId)
    expect((await owner.delete(`/api/members/${member.id}`)).status).toBe(204)
    await waitFor(() => connection.closed, 'the connection to close')
    expect(connection.closeCode).toBe(COLLAB_CLOSE.accessRemoved)
    await other.flush()
    expect(other.closed).toBe(false)
  })

  it("a client whose share of the project was removed; the client's other shared project stays open", async () => {
    const client = await createMember(server.db, org.id, 'client', 'unshared-client')
    const projectId = await createProject(server.db, org, { document: createDemoDesign(), sharedWith: [client] })
    const otherProjectId = await createProject(server.db, org, { document: createDemoDesign(), sharedWith: [client] })
    const connection = await connect(client, projectId)
    const elsewhere = await connect(client, otherProjectId)
    const reviewer = await connect(org.reviewer, projectId)
    expect((await owner.delete(`/api/projects/${projectId}/shares/${client.id}`)).status).toBe(204)
    await waitFor(() => connection.closed, 'the connection to close')
    expect(connection.closeCode).toBe(COLLAB_CLOSE.accessRemoved)
    await Promise.all([elsewhere.flush(), reviewer.flush()])
    expect(elsewhere.closed).toBe(false)
    expect(reviewer.closed).toBe(false)
  })
})

describe('signing out closes the connections of that session', () => {
  it("closes with 4401 the connection opened with the signed-out session; the user's other session stays open", async () => {
    const projectId = await createProject(server.db, org, { document: createDemoDesign() })
    const member = await createMember(server.db, org.id, 'designer', 'signing-out-designer')
    const laptop = await freshSessionClient(server, { userId: member.id, organizationId: org.id })
    const tablet = await freshSessionClient(server, { userId: member.id, organizationId: org.id })
    const onLaptop = await RawCollabClient.open(server.baseUrl, projectId, laptop.cookie!)
    const onTablet = await RawCollabClient.open(server.baseUrl, projectId, tablet.cookie!)
    open.push(onLaptop, onTablet)
    await Promise.all([onLaptop.flush(), onTablet.flush()])

    expect((await laptop.post('/api/auth/logout', {})).status).toBe(204)
    await waitFor(() => onLaptop.closed, 'the signed-out connection to close')
    expect(onLaptop.closeCode).toBe(COLLAB_CLOSE.sessionEnded)
    expect(onLaptop.closeReason).toBe('Your session has ended. Sign in again.')
    await onTablet.flush()
    expect(onTablet.closed).toBe(false)
  })
})
