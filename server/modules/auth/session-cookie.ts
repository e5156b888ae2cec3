import type { CookieOptions, Response } from 'express'
import type { Session } from '../../../shared/api/auth.schemas'
import type { AppConfig } from '../../config'
import type { AuthContext } from '../../http/auth'
import type { DbOrTx } from '../../db/client'
import { SESSION_COOKIE } from '../../security/session-token'
import { startSession } from './sessions'

function cookieOptions(config: AppConfig): CookieOptions {
  return { httpOnly: true, sameSite: 'lax', secure: config.secureCookies, path: '/' }
}

/** Starts a session for the user and sets it as the httpOnly cookie; returns its expiry. */
export async function issueSessionCookie(
  res: Response,
  deps: { db: DbOrTx; config: AppConfig },
  ids: { userId: string; organizationId: string },
): Promise<Date> {
  const { token, expiresAt } = await startSession(deps, ids)
  res.cookie(SESSION_COOKIE, token, { ...cookieOptions(deps.config), maxAge: deps.config.sessionTtlSeconds * 1000 })
  return expiresAt
}

export function clearSessionCookie(res: Response, config: AppConfig): void {
  res.clearCookie(SESSION_COOKIE, cookieOptions(config))
}

export function toSession(context: Pick<AuthContext, 'user' | 'organization' | 'role'>, expiresAt: Date): Session {
  return {
    user: context.user,
    organization: context.organization,
    role: context.role,
    expiresAt: expiresAt.toISOString(),
  }
}
