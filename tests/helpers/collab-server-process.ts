// The app with its /collab endpoint as a separate process, for tests that kill it (SIGKILL) and for the
// bench (which reads its CPU time and peak memory over IPC). Started as
//   node --import tsx tests/helpers/collab-server-process.ts   (env: DATABASE_URL, PORT, AMPWRIGHT_JWT_SECRET)
// Prints "ready <port>" once listening. IPC: { type: 'usage' } → { type: 'usage', cpuUserUs, cpuSystemUs, maxRssKb,
// updateLatency (arrival → broadcast in the server), commits: { commits, rows } }.
import http from 'node:http'
import type { AddressInfo } from 'node:net'
import { createApp } from '../../server/app'
import { attachCollabServer } from '../../server/collab/collabServer'
import { createDocumentHub } from '../../server/collab/documentHub'
import { loadConfig } from '../../server/config'
import { connectDatabase } from '../../server/db/client'
import { createMailer } from '../../server/mail/mailer'

const config = loadConfig(process.env, { serveClient: false })
const database = connectDatabase(config.databaseUrl, { max: Number(process.env.COLLAB_DB_POOL) || 10 })
// No mail is sent by these tests: an address nothing listens on.
const mailer = createMailer({ ...config.smtp, host: '127.0.0.1', port: 9 })
const compactEvery = Number(process.env.COLLAB_COMPACT_EVERY) || undefined
const hub = createDocumentHub({ db: database.db, options: compactEvery ? { compactEvery } : {} })
const server = http.createServer(createApp({ db: database.db, config, mailer, hub }))
attachCollabServer(server, { db: database.db, config, hub })
server.listen(config.port, '127.0.0.1', () => {
  console.log(`ready ${(server.address() as AddressInfo).port}`)
})
process.on('message', (message: { type?: string }) => {
  if (message?.type !== 'usage') return
  const cpu = process.cpuUsage()
  process.send?.({
    type: 'usage',
    cpuUserUs: cpu.user,
    cpuSystemUs: cpu.system,
    maxRssKb: process.resourceUsage().maxRSS,
    updateLatency: hub.latency.summary(),
    commits: { commits: hub.committer.stats.commits, rows: hub.committer.stats.rows, commitMs: hub.committer.stats.commitMs.summary() },
  })
})
