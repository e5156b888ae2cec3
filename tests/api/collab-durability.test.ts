// Fault test: the server runs as a child process and is killed with SIGKILL (no shutdown hook runs).
// Every update the server acknowledged (answered a later sync step 1 of the same connection, which it
// does only after storing) must be in the design after a restart; updates still in flight at the kill
// may be lost, but only as a whole suffix (the log is committed in order).
import { randomBytes } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import * as Y from 'yjs'
import { createDemoDesign } from '../../shared/design/demo'
import type { Part } from '../../shared/design/schema'
import { loadConfig, type AppConfig } from '../../server/config'
import { connectDatabase, type Database } from '../../server/db/client'
import { startSession } from '../../server/modules/auth/sessions'
import { SESSION_COOKIE } from '../../server/security/session-token'
import { startChildServer, type ChildServer } from '../helpers/childServer'
import { RawCollabClient } from '../helpers/collab'
import { createOrganization, createProject, type TestOrganization } from '../helpers/factories'

const ITERATIONS = 4
const jwtSecret = randomBytes(32).toString('hex')
let database: Database
let config: AppConfig
let org: TestOrganization
let child: ChildServer | undefined

beforeAll(async () => {
  config = loadConfig({ ...process.env, AMPWRIGHT_JWT_SECRET: jwtSecret })
  database = connectDatabase(config.databaseUrl, { max: 2 })
  org = await createOrganization(database.db, 'Durability')
})
afterAll(async () => {
  await child?.kill()
  await database.close()
})

const start = async () => (child = await startChildServer({ databaseUrl: config.databaseUrl, jwtSecret }))
const cookieOf = async (userId: string) =>
  `${SESSION_COOKIE}=${(await startSession({ db: database.db, config }, { userId, organizationId: org.id })).token}`

function addPart(doc: Y.Doc, id: string, index: number): void {
  const template = createDemoDesign().parts[0]
  const part: Part = { ...template, id, label: `Kill test ${index}`, position: { x: index * 20, y: 600 } } as Part
  const map = new Y.Map<unknown>()
  for (const [key, value] of Object.entries(part)) if (key !== 'params') map.set(key, value)
  const params = new Y.Map<unknown>()
  for (const [key, value] of Object.entries(part.params)) params.set(key, value)
  map.set('params', params)
  doc.getMap('parts').set(id, map)
}

/** Indices of `prefix-i` parts present in the design the restarted server returns. */
async function storedIndices(server: ChildServer, projectId: string, prefix: string, cookie: string): Promise<number[]> {
  const res = await fetch(`${server.baseUrl}/api/projects/${projectId}/design`, { headers: { Cookie: cookie } })
  expect(res.status).toBe(200)
  const { design } = (await res.json()) as { design: { parts: { id: string }[] } }
  return design.parts
    .filter((p) => p.id.startsWith(prefix))
    .map((p) => Number(p.id.slice(prefix.length)))
    .sort((a, b) => a - b)
}

const range = (n: number) => Array.from({ length: n }, (_, i) => i)
const randomInt = (min: number, max: number) => min + Math.floor(Math.random() * (max - min + 1))

describe('SIGKILL of the server', () => {
  it.each(range(ITERATIONS).map((i) => [i]))(
    'iteration %i: acknowledged updates survive; a kill mid-stream loses at most an unacknowledged suffix',
    async (iteration) => {
      const projectId = await createProject(database.db, org, { document: createDemoDesign() })
      const cookie = await cookieOf(org.designer.id)
      const total = randomInt(20, 60)
      const acknowledgedCount = iteration % 2 === 0 ? total : randomInt(1, total - 1)
      const killDelayMs = randomInt(0, 20)
      const context = `total=${total} acknowledged=${acknowledgedCount} killDelayMs=${killDelayMs}`
      const prefix = `kill-${iteration}-`

      const server = await start()
      const client = await RawCollabClient.open(server.baseUrl, projectId, cookie)
      await client.flush()
      for (let i = 0; i < acknowledgedCount; i++) client.edit((doc) => addPart(doc, `${prefix}${i}`, i))
      await client.flush() // answered only after all of the above are stored
      for (let i = acknowledgedCount; i < total; i++) client.edit((doc) => addPart(doc, `${prefix}${i}`, i))
      if (acknowledgedCount === total) await client.close() // the client leaves, the server dies right after
      await new Promise((resolve) => setTimeout(resolve, killDelayMs))
      await server.kill()
      await client.close()

      const restarted = await start()
      const present = await storedIndices(restarted, projectId, prefix, cookie)
      // Every acknowledged update, and what survived of the rest is a prefix: nothing half-applied.
      expect(present.slice(0, acknowledgedCount), context).toEqual(range(acknowledgedCount))
      expect(present, context).toEqual(range(present.length))
      // The restarted server also serves it live.
      const reader = await RawCollabClient.open(restarted.baseUrl, projectId, cookie)
      await reader.flush()
      expect(reader.doc.getMap('parts').has(`${prefix}${acknowledgedCount - 1}`), context).toBe(true)
      await reader.close()
      await restarted.kill()
    },
    60_000,
  )
})
