// A real Ampwright server for API and browser tests: the real app on 127.0.0.1 port 0, the real
// PostgreSQL named by DATABASE_URL (already migrated by `server/db/prepare.ts --fresh`) and the fake SMTP.
import { randomBytes } from 'node:crypto'
import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import http from 'node:http'
import type { AddressInfo } from 'node:net'
import { desc, sql } from 'drizzle-orm'
import type { Express } from 'express'
import { createApp } from '../../server/app'
import { attachCollabServer, type CollabServer } from '../../server/collab/collabServer'
import { createDocumentHub, type DocumentHub } from '../../server/collab/documentHub'
import { loadConfig, type AppConfig } from '../../server/config'
import { connectDatabase, type Db } from '../../server/db/client'
import { outboxMessages } from '../../server/db/schema'
import { startFakeSmtp } from '../../server/mail/fake-smtp'
import { createMailer } from '../../server/mail/mailer'
import { startLocalS3 } from '../../server/storage/localS3'

export interface TestServer {
  app: Express
  baseUrl: string
  db: Db
  config: AppConfig
  outbox: Outbox
  /** The open designs and the /collab WebSocket endpoint on the same HTTP server. */
  hub: DocumentHub
  collab: CollabServer
  close(): Promise<void>
}

export interface CapturedMail {
  from: string
  to: string
  subject: string
  text: string
}

export interface Outbox {
  /** Messages the fake SMTP captured for this address, newest first. */
  messagesTo(email: string): Promise<CapturedMail[]>
  /** The newest message to this address; fails the test if there is none. */
  latestTo(email: string): Promise<CapturedMail>
}

/** The token of the first link in an e-mail whose path is `path` (e.g. '/reset-password'). */
export function tokenFromLink(mail: CapturedMail, path: string, baseUrl: string): string {
  const escaped = (baseUrl + path).replace(/[.*+?^${}()|[\]\\/]/g, '\\$&')
  const match = new RegExp(`${escaped}\\?token=([A-Za-z0-9_%-]+)`).exec(mail.text)
  if (!match) throw new Error(`no ${path} link in the e-mail:\n${mail.text}`)
  return decodeURIComponent(match[1])
}

export async function startTestServer(
  options: { serveClient?: boolean; config?: Partial<AppConfig>; compactEvery?: number } = {},
): Promise<TestServer> {
  const databaseUrl = process.env.DATABASE_URL
  if (!databaseUrl) throw new Error('DATABASE_URL must name the (prepared) test database')
  const database = connectDatabase(databaseUrl, { max: 5 })
  const fakeSmtp = await startFakeSmtp(database.db)

  const server = http.createServer()
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve))
  const { port } = server.address() as AddressInfo
  const baseUrl = `http://127.0.0.1:${port}`

  const config = loadConfig(
    {
      ...process.env,
      PORT: String(port),
      AMPWRIGHT_JWT_SECRET: randomBytes(32).toString('hex'),
      AMPWRIGHT_PUBLIC_URL: baseUrl,
      SMTP_HOST: undefined,
    },
    { serveClient: options.serveClient ?? false, ...options.config },
  )
  const mailer = createMailer({ ...config.smtp, host: '127.0.0.1', port: fakeSmtp.port })
  const hub = createDocumentHub({ db: database.db, options: options.compactEvery ? { compactEvery: options.compactEvery } : {} })
  // Attachments go to an in-process S3 fake with its own temporary folder.
  const s3Dir = fs.mkdtempSync(path.join(os.tmpdir(), 'aw-s3-'))
  const localS3 = await startLocalS3({ directory: s3Dir, bucket: 'ampwright-test' })
  const app = createApp({ db: database.db, config, mailer, hub, storage: localS3.storage })
  server.on('request', app)
  const collab = attachCollabServer(server, { db: database.db, config, hub })

  const outbox: Outbox = {
    async messagesTo(email) {
      return database.db
        .select({ from: outboxMessages.from, to: outboxMessages.to, subject: outboxMessages.subject, text: outboxMessages.text })
        .from(outboxMessages)
        .where(sql`${email.toLowerCase()} = any(${outboxMessages.recipients})`)
        .orderBy(desc(outboxMessages.receivedAt), desc(outboxMessages.id))
    },
    async latestTo(email) {
      const [latest] = await outbox.messagesTo(email)
      if (!latest) throw new Error(`no e-mail was captured for ${email}`)
      return latest
    },
  }

  return {
    app,
    baseUrl,
    db: database.db,
    config,
    outbox,
    hub,
    collab,
    async close() {
      await collab.close()
      server.closeAllConnections()
      await new Promise<void>((resolve) => server.close(() => resolve()))
      mailer.close()
      await fakeSmtp.close()
      await localS3.close()
      fs.rmSync(s3Dir, { recursive: true, force: true })
      await database.close()
    },
  }
}
