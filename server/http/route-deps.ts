import type { RequestHandler } from 'express'
import type { AppConfig } from '../config'
import type { DocumentHub } from '../collab/documentHub'
import type { Db } from '../db/client'
import type { Mailer } from '../mail/mailer'
import type { ObjectStorage } from '../storage/objectStorage'

/** What every feature router receives from createApp. */
export interface RouteDeps {
  db: Db
  config: AppConfig
  mailer: Mailer
  requireSession: RequestHandler
  /** Uploaded files; absent when no storage was configured (uploads then answer 503). */
  storage?: ObjectStorage
  /** Open designs: every change to a design's Yjs state goes through its room. */
  hub: DocumentHub
}
