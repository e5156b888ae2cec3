// Live co-editing under load: DESIGNS designs × CLIENTS clients each, every client moving its own part
// EDITS_PER_S times a second for the run (COLLAB_BENCH_SECONDS, default 30) over loopback, against the
// server in a child process (the real app, fsync'd PostgreSQL in its own database `ampwright_bench`).
// Prints update propagation latency (send → seen by each other client of the design, so it includes
// the commit to PostgreSQL before the broadcast), the server's CPU and peak memory, and lost updates
// (edits some other client never saw, plus final positions the stored design does not hold).
// Also printed, to read the figures on a shared machine: the server's own arrival → broadcast time,
// rows per commit (group commit), and this process's CPU and event-loop delay (the clients' side).
import { randomBytes } from 'node:crypto'
import { monitorEventLoopDelay } from 'node:perf_hooks'
import * as Y from 'yjs'
import { createDemoDesign } from '../../shared/design/demo'
import { loadConfig } from '../../server/config'
import { connectDatabase } from '../../server/db/client'
import { prepareDatabase } from '../../server/db/prepare'
import { startSession } from '../../server/modules/auth/sessions'
import { readStoredDesign } from '../../server/modules/designs/design-state'
import { SESSION_COOKIE } from '../../server/security/session-token'
import { startChildServer } from '../helpers/childServer'
import { RawCollabClient, waitFor } from '../helpers/collab'
import { createOrganization, createProject } from '../helpers/factories'

const DESIGNS = 20
const CLIENTS = 5
const EDITS_PER_S = 10
const SECONDS = Number(process.env.COLLAB_BENCH_SECONDS) || 30

const percentile = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))]

interface BenchClient {
  design: number
  index: number
  partId: string
  raw: RawCollabClient
  sent: number
  sentAt: Map<number, number>
  /** Edits of each other client this one saw. */
  seen: Map<number, number>
}

export async function run(): Promise<void> {
  const base = loadConfig()
  const databaseUrl = base.databaseUrl.replace(/\/[^/?]+(\?|$)/, '/ampwright_bench$1')
  await prepareDatabase({ databaseUrl, adminDatabaseUrl: base.adminDatabaseUrl, fresh: true, seed: false, bcryptCost: 4 })
  const jwtSecret = randomBytes(32).toString('hex')
  const config = loadConfig({ ...process.env, DATABASE_URL: databaseUrl, AMPWRIGHT_JWT_SECRET: jwtSecret })
  const database = connectDatabase(databaseUrl, { max: 2 })
  const org = await createOrganization(database.db, 'Bench')
  const projects = await Promise.all(Array.from({ length: DESIGNS }, () => createProject(database.db, org, { document: createDemoDesign() })))
  const { token } = await startSession({ db: database.db, config }, { userId: org.designer.id, organizationId: org.id })
  const cookie = `${SESSION_COOKIE}=${token}`
  const partIds = createDemoDesign().parts.slice(0, CLIENTS).map((p) => p.id)

  const server = await startChildServer({ databaseUrl, jwtSecret })
  const latencies: number[] = []
  const clients: BenchClient[] = []
  for (let d = 0; d < DESIGNS; d++) {
    for (let i = 0; i < CLIENTS; i++) {
      const raw = await RawCollabClient.open(server.baseUrl, projects[d], cookie)
      await raw.flush()
      clients.push({ design: d, index: i, partId: partIds[i], raw, sent: 0, sentAt: new Map(), seen: new Map() })
    }
  }
  const byDesign = (d: number) => clients.filter((c) => c.design === d)
  for (const client of clients) {
    const peers = byDesign(client.design)
    client.raw.doc.getMap<Y.Map<unknown>>('parts').observeDeep((events, transaction) => {
      if (transaction.origin !== 'server') return
      const now = performance.now()
      for (const event of events) {
        if (!(event instanceof Y.YMapEvent) || !event.keysChanged.has('position')) continue
        const position = (event.target as Y.Map<unknown>).get('position') as { x: number; y: number }
        const sender = peers[position.y]
        const sentAt = sender?.sentAt.get(position.x)
        if (!sender || sentAt === undefined) continue
        latencies.push(now - sentAt)
        client.seen.set(sender.index, (client.seen.get(sender.index) ?? 0) + 1)
      }
    })
  }

  const before = await server.usage()
  const loopDelay = monitorEventLoopDelay({ resolution: 10 })
  loopDelay.enable()
  const clientCpuBefore = process.cpuUsage()
  const startedAt = performance.now()
  const timers = clients.map((client) => {
    const tick = () => {
      const seq = ++client.sent
      client.sentAt.set(seq, performance.now())
      client.raw.edit((doc) => doc.getMap<Y.Map<unknown>>('parts').get(client.partId)!.set('position', { x: seq, y: client.index }))
    }
    // Spread the clients over the interval so they do not all send in the same millisecond.
    let interval: NodeJS.Timeout | undefined
    const start = setTimeout(() => {
      tick()
      interval = setInterval(tick, 1000 / EDITS_PER_S)
    }, Math.random() * (1000 / EDITS_PER_S))
    return () => {
      clearTimeout(start)
      clearInterval(interval)
    }
  })
  await new Promise((resolve) => setTimeout(resolve, SECONDS * 1000))
  timers.forEach((stop) => stop())
  const runSeconds = (performance.now() - startedAt) / 1000
  const after = await server.usage()
  const clientCpu = process.cpuUsage(clientCpuBefore)
  loopDelay.disable()

  await Promise.all(clients.map((c) => c.raw.flush(30_000)))
  const expected = (client: BenchClient) => byDesign(client.design).filter((p) => p !== client).reduce((n, p) => n + p.sent, 0)
  const seenAll = (client: BenchClient) => [...client.seen.values()].reduce((a, b) => a + b, 0)
  await waitFor(() => clients.every((c) => seenAll(c) >= expected(c)), 'every edit to arrive', 10_000).catch(() => undefined)
  let lost = clients.reduce((n, c) => n + Math.max(0, expected(c) - seenAll(c)), 0)
  const totalSent = clients.reduce((n, c) => n + c.sent, 0)

  await Promise.all(clients.map((c) => c.raw.close()))
  // The stored designs hold every client's last move.
  for (let d = 0; d < DESIGNS; d++) {
    const stored = await readStoredDesign(database.db, projects[d])
    for (const client of byDesign(d)) {
      const part = stored?.design.parts.find((p) => p.id === client.partId)
      if (part?.position.x !== client.sent || part.position.y !== client.index) lost++
    }
  }
  await server.kill()
  await database.close()

  const sorted = latencies.sort((a, b) => a - b)
  const cpuS = (after.cpuUserUs + after.cpuSystemUs - before.cpuUserUs - before.cpuSystemUs) / 1e6
  console.log(`${DESIGNS} designs × ${CLIENTS} clients × ${EDITS_PER_S} edits/s for ${runSeconds.toFixed(1)} s: ${totalSent} edits, ${sorted.length} deliveries`)
  console.log(
    `propagation latency  p50 ${percentile(sorted, 50).toFixed(1)} ms   p95 ${percentile(sorted, 95).toFixed(1)} ms   max ${sorted.at(-1)!.toFixed(1)} ms`,
  )
  console.log(`server CPU           ${cpuS.toFixed(1)} s over the run (${((100 * cpuS) / runSeconds).toFixed(0)} % of one core)`)
  console.log(`server peak memory   ${(after.maxRssKb / 1024).toFixed(0)} MB resident`)
  console.log(`lost updates         ${lost}`)
  const inServer = after.updateLatency
  console.log(
    `in the server        arrival → broadcast p50 ${inServer.p50Ms.toFixed(1)} ms   p95 ${inServer.p95Ms.toFixed(1)} ms   max ${inServer.maxMs.toFixed(1)} ms (${inServer.count} updates)`,
  )
  const commits = after.commits.commits - before.commits.commits
  const rows = after.commits.rows - before.commits.rows
  const commitMs = after.commits.commitMs
  console.log(
    `group commit         ${commits} commits for ${rows} updates (${(rows / Math.max(1, commits)).toFixed(1)} per commit); ` +
      `each statement p50 ${commitMs.p50Ms.toFixed(1)} ms p95 ${commitMs.p95Ms.toFixed(1)} ms max ${commitMs.maxMs.toFixed(1)} ms`,
  )
  const clientCpuS = (clientCpu.user + clientCpu.system) / 1e6
  console.log(
    `bench clients        CPU ${clientCpuS.toFixed(1)} s (${((100 * clientCpuS) / runSeconds).toFixed(0)} % of one core), event-loop delay p50 ${(loopDelay.percentile(50) / 1e6).toFixed(1)} ms p99 ${(loopDelay.percentile(99) / 1e6).toFixed(1)} ms`,
  )
  console.log(`machine load         ${(await import('node:os')).loadavg().map((l) => l.toFixed(1)).join(' ')} (1/5/15 min)`)
}
