// The Express application, without listen(): main.ts and the tests start it on a port of their choice.
import fs from 'node:fs'
import path from 'node:path'
import cookieParser from 'cookie-parser'
import express, { type Express } from 'express'
import { createDocumentHub, type DocumentHub } from './collab/documentHub'
import type { AppConfig } from './config'
import type { Db } from './db/client'
import { createRequireSession } from './http/auth'
import { errorMiddleware, HttpError, notFound } from './http/errors'
import { originCheck } from './http/origin'
import type { RouteDeps } from './http/route-deps'
import type { Mailer } from './mail/mailer'
import { createAnalyzeRouter } from './modules/analyze/analyze.routes'
import { authRoutes } from './modules/auth/auth.routes'
import { designsRoutes } from './modules/designs/designs.routes'
import { devicesRoutes } from './modules/devices/devices.routes'
import { designImportRoutes } from './modules/exports/designImport.routes'
import { exportsRoutes } from './modules/exports/exports.routes'
import { shareLinksRoutes } from './modules/shares/shareLinks.routes'
import { sharedRoutes } from './modules/shares/shared.routes'
import { invitationsRoutes } from './modules/invitations/invitations.routes'
import { membersRoutes } from './modules/members/members.routes'
import { outboxRoutes } from './modules/outbox/outbox.routes'
import { projectsRoutes } from './modules/projects/projects.routes'
import { uploadsRoutes } from './modules/uploads/uploads.routes'
import { loadImportRoutes } from './modules/loadImport/loadImport.routes'
import type { ObjectStorage } from './storage/objectStorage'
import { revisionsRoutes } from './modules/revisions/revisions.routes'

export interface AppDeps {
  db: Db
  config: AppConfig
  mailer: Mailer
  /** Shared with the /collab WebSocket endpoint (attachCollabServer); created here when absent. */
  hub?: DocumentHub
  /** Object storage for attachments (server/storage). */
  storage?: ObjectStorage
}

export function createApp({ db, config, mailer, hub = createDocumentHub({ db }), storage }: AppDeps): Express {
  const app = express()
  app.disable('x-powered-by')
  app.set('query parser', 'simple')
  app.use((_req, res, next) => {
    res.set({ 'X-Content-Type-Options': 'nosniff', 'Referrer-Policy': 'same-origin', 'X-Frame-Options': 'DENY' })
    next()
  })

  const deps: RouteDeps = { db, config, mailer, hub, storage, requireSession: createRequireSession({ db, config }) }
  const api = express.Router()
  api.use(express.json({ limit: config.jsonBodyLimit }))
  api.use(cookieParser())
  api.use(originCheck(config))
  api.use((_req, res, next) => {
    res.set('Cache-Control', 'no-store')
    next()
  })
  api.get('/health', (_req, res) => {
    res.json({ ok: true })
  })
  api.use('/auth', authRoutes(deps))
  api.use('/projects/:id/design/import-loads', loadImportRoutes(deps))
  api.use('/projects/:id/design/import', designImportRoutes(deps))
  api.use('/projects/:id/attachments', uploadsRoutes(deps))
  api.use('/projects/:id/design', designsRoutes(deps))
  api.use('/projects/:id/revisions', revisionsRoutes(deps))
  api.use('/projects/:id/exports', exportsRoutes(deps))
  api.use('/projects/:id', shareLinksRoutes(deps))
  api.use('/shared', sharedRoutes(deps))
  api.use('/projects', projectsRoutes(deps))
  api.use('/members', membersRoutes(deps))
  api.use('/devices', devicesRoutes(deps))
  api.use('/invitations', invitationsRoutes(deps))
  api.use('/outbox', outboxRoutes(deps))
  // Any signed-in role may analyse (the router defines POST /analyze itself).
  api.post('/analyze', deps.requireSession, createAnalyzeRouter())
  api.use(() => {
    throw notFound('API route')
  })
  app.use('/api', api)

  if (config.serveClient) serveClient(app, config.clientDir)
  app.use(errorMiddleware)
  return app
}

/** The built client (dist/) with an SPA fallback to index.html for every non-API path. */
function serveClient(app: Express, clientDir: string): void {
  const indexHtml = path.join(clientDir, 'index.html')
  app.use(express.static(clientDir, { index: false, maxAge: '1h' }))
  app.get('/{*splat}', (_req, res, next) => {
    if (!fs.existsSync(indexHtml)) {
      return next(new HttpError(404, 'not_found', 'The client is not built yet: run `npx vite build`'))
    }
    res.set('Cache-Control', 'no-cache')
    res.sendFile(indexHtml)
  })
}
