import type { CookieOptions, Response } from 'express'
import type { Session } from '../../../shared/api/auth.schemas'
import type { AppConfig } from '../../config'
import type { AuthContext } from '../../http/auth'
import { SESSION_COOKIE, signSessionToken } from '../../security/session-token'

function cookieOptions(config: AppConfig): CookieOptions {
  return { httpOnly: true, sameSite: 'lax', secure: config.secureCookies, path: '/' }
}

/** Signs a session for the user and sets it as the httpOnly cookie; returns its expiry. */
export async function issueSessionCookie(
  res: Response,
  config: AppConfig,
  ids: { userId: string; organizationId: string },
): Promise<Date> {
  const { token, expiresAt } = await signSessionToken(ids, config.jwtSecret, config.sessionTtlSeconds)
  res.cookie(SESSION_COOKIE, token, { ...cookieOptions(config), maxAge: config.sessionTtlSeconds * 1000 })
  return expiresAt
}

export function clearSessionCookie(res: Response, config: AppConfig): void {
  res.clearCookie(SESSION_COOKIE, cookieOptions(config))
}

export function toSession(context: Omit<AuthContext, 'expiresAt'>, expiresAt: Date): Session {
  return {
    user: context.user,
    organization: context.organization,
    role: context.role,
    expiresAt: expiresAt.toISOString(),
  }
}
