// requireSession: verifies the session cookie and loads the user and their current role from the
// database on every request (a removed user or a changed role takes effect at once).
// requirePermission(action): 403 unless the role may perform the action (shared/api/roles.ts).
import type { Request, RequestHandler } from 'express'
import { can, type Action, type Role } from '../../shared/api/roles'
import type { AppConfig } from '../config'
import type { Db } from '../db/client'
import { authenticateSessionToken } from '../modules/auth/sessions'
import { SESSION_COOKIE } from '../security/session-token'
import { forbidden, unauthenticated } from './errors'

export interface AuthContext {
  user: { id: string; name: string; email: string }
  organization: { id: string; name: string }
  role: Role
  sessionId: string
  expiresAt: Date
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      auth?: AuthContext
    }
  }
}

/** The signed-in context; only call it behind requireSession. */
export function authOf(req: Request): AuthContext {
  if (!req.auth) throw unauthenticated()
  return req.auth
}

export function createRequireSession(deps: { db: Db; config: AppConfig }): RequestHandler {
  return async (req, _res, next) => {
    const token: unknown = req.cookies?.[SESSION_COOKIE]
    if (typeof token !== 'string' || token === '') throw unauthenticated()
    const check = await authenticateSessionToken(deps, token)
    if (!check.ok) {
      throw unauthenticated(
        check.reason === 'invalid' ? 'Your session has expired. Sign in again.' : 'Your session has ended. Sign in again.',
      )
    }
    req.auth = check.auth
    next()
  }
}

const ACTION_PHRASES: Record<Action, string> = {
  'project.read': 'view projects',
  'project.readAll': 'see every project',
  'project.write': 'edit projects',
  'project.delete': 'delete projects',
  'project.share': 'share projects',
  'design.write': 'edit designs',
  'member.read': 'see the members',
  'member.manage': 'manage members',
  'outbox.read': 'read the outbox',
}

export function permissionMessage(role: Role, action: Action, phrase = ACTION_PHRASES[action]): string {
  return `Your role (${role}) cannot ${phrase}`
}

/** 403 unless the role may do `action`; `phrase` overrides the wording ("cannot <phrase>"). */
export function requirePermission(action: Action, phrase?: string): RequestHandler {
  return (req, _res, next) => {
    const { role } = authOf(req)
    if (!can(role, action)) throw forbidden(permissionMessage(role, action, phrase))
    next()
  }
}
