// Starting and checking sessions. authenticateSessionToken is what every authenticated entry point
// uses (requireSession here; a WebSocket upgrade can call it too).
import type { AppConfig } from '../../config'
import type { DbOrTx } from '../../db/client'
import type { AuthContext } from '../../http/auth'
import { signSessionToken, verifySessionToken } from '../../security/session-token'
import { deleteExpiredSessionsOfUser, insertSession } from './sessions.repository'
import { findSessionContext } from './users.repository'

interface Deps {
  db: DbOrTx
  config: AppConfig
}

export async function startSession(deps: Deps, ids: { userId: string; organizationId: string }) {
  // Whole seconds, as the JWT's exp claim holds them.
  const expiresAt = new Date((Math.floor(Date.now() / 1000) + deps.config.sessionTtlSeconds) * 1000)
  await deleteExpiredSessionsOfUser(deps.db, ids.userId)
  const sessionId = await insertSession(deps.db, { userId: ids.userId, expiresAt })
  const token = await signSessionToken({ ...ids, sessionId, expiresAt }, deps.config.jwtSecret)
  return { token, expiresAt, sessionId }
}

export type SessionCheck =
  | { ok: true; auth: AuthContext }
  | { ok: false; reason: 'invalid' | 'ended' }

/** 'invalid': bad signature, malformed or expired token; 'ended': signed out, reset, or member removed. */
export async function authenticateSessionToken(deps: Deps, token: string): Promise<SessionCheck> {
  const claims = await verifySessionToken(token, deps.config.jwtSecret)
  if (!claims) return { ok: false, reason: 'invalid' }
  const context = await findSessionContext(deps.db, claims)
  if (!context) return { ok: false, reason: 'ended' }
  return { ok: true, auth: { ...context, sessionId: claims.sessionId, expiresAt: claims.expiresAt } }
}
