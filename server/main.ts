// `npm start` / `npm run serve`: prepare the database, start the local fake SMTP unless SMTP_HOST is set,
// and serve the API and the built client on 127.0.0.1:PORT.
import fs from 'node:fs'
import http from 'node:http'
import path from 'node:path'
import { createApp } from './app'
import { attachCollabServer } from './collab/collabServer'
import { createDocumentHub } from './collab/documentHub'
import { loadConfig } from './config'
import { connectDatabase } from './db/client'
import { prepareDatabase } from './db/prepare'
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from './db/seed'
import { startFakeSmtp, type FakeSmtp } from './mail/fake-smtp'
import { createMailer } from './mail/mailer'
import { startLocalS3, type LocalS3 } from './storage/localS3'
import { createS3Storage } from './storage/objectStorage'

function listen(server: http.Server, port: number, host: string): Promise<void> {
  return new Promise((resolve, reject) => {
    server.once('error', reject)
    server.listen(port, host, () => {
      server.off('error', reject)
      resolve()
    })
  })
}

async function main(): Promise<void> {
  const config = loadConfig(process.env, { serveClient: true })
  await prepareDatabase({
    databaseUrl: config.databaseUrl,
    adminDatabaseUrl: config.adminDatabaseUrl,
    bcryptCost: config.bcryptCost,
  })
  const database = connectDatabase(config.databaseUrl)

  let fakeSmtp: FakeSmtp | undefined
  let mailer
  if (config.smtp.host) {
    mailer = createMailer({ ...config.smtp, host: config.smtp.host })
  } else {
    fakeSmtp = await startFakeSmtp(database.db, { port: config.smtp.fakePort })
    mailer = createMailer({ ...config.smtp, host: '127.0.0.1', port: fakeSmtp.port })
  }

  // Attachments: a real bucket from S3_* variables, else the local fake with its files in .data/s3.
  let localS3: LocalS3 | undefined
  const storage = config.s3 ? createS3Storage(config.s3) : (localS3 = await startLocalS3({ directory: path.join(config.dataDir, 's3'), bucket: 'ampwright-local' })).storage

  if (!fs.existsSync(path.join(config.clientDir, 'index.html'))) {
    console.warn('[server] no client build in dist/: run `npx vite build` (npm start does) to get the app')
  }
  const hub = createDocumentHub({ db: database.db })
  const app = createApp({ db: database.db, config, mailer, hub, storage })
  const server = http.createServer(app)
  const collab = attachCollabServer(server, { db: database.db, config, hub })
  try {
    await listen(server, config.port, config.host)
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'EADDRINUSE') {
      console.error(`Port ${config.port} is already in use — stop the other server or set PORT=...`)
    } else {
      console.error('[server] could not listen:', error)
    }
    await fakeSmtp?.close()
    await localS3?.close()
    await database.close()
    process.exit(1)
  }

  const url = `http://${config.host}:${config.port}`
  console.log(`\nAmpwright is running at ${url}`)
  if (config.publicUrl !== url) console.log(`Links in e-mails use ${config.publicUrl}`)
  console.log(
    fakeSmtp
      ? `E-mail goes to the local fake SMTP server on 127.0.0.1:${fakeSmtp.port}; owners read it under Outbox.`
      : `E-mail goes to ${config.smtp.host}:${config.smtp.port}.`,
  )
  console.log(`\nDemo accounts (password for all: ${DEMO_PASSWORD}):`)
  for (const account of DEMO_ACCOUNTS) console.log(`  ${account.role.padEnd(9)} ${account.email}`)
  console.log('\nStop with Ctrl+C.')

  let stopping = false
  const shutdown = (signal: string) => {
    if (stopping) return
    stopping = true
    console.log(`\n[server] ${signal}: shutting down`)
    const force = setTimeout(() => process.exit(1), 10_000)
    force.unref()
    // Live editors first: their queued updates are stored and compacted before the pool ends.
    const collabClosed = collab.close().catch((error: unknown) => console.error('[collab] close failed:', error))
    server.close(async () => {
      await collabClosed
      mailer.close()
      await fakeSmtp?.close()
      await localS3?.close()
      await database.close()
      process.exit(0)
    })
    server.closeIdleConnections()
  }
  process.on('SIGINT', () => shutdown('SIGINT'))
  process.on('SIGTERM', () => shutdown('SIGTERM'))
}

main().catch((error: unknown) => {
  console.error('[server] failed to start:', error instanceof Error ? error.message : error)
  process.exit(1)
})
