// Who may open /collab/<projectId>: the session cookie is checked exactly as requireSession checks it
// (authenticateSessionToken), the project must be visible to the user (a client: only shared ones;
// another organisation's project is 404), and the role decides between editing and read-only.
// A browser cannot read the HTTP status of a refused WebSocket handshake, so refusals about the
// session or the access are answered in-band: the handshake completes and the socket is closed at
// once with a 44xx code the app explains. A foreign Origin or a malformed path stays an HTTP refusal.
import type { IncomingMessage } from 'node:http'
import { z } from 'zod'
import { can, type Role } from '../../shared/api/roles'
import { COLLAB_CLOSE, COLLAB_PATH_PREFIX } from '../../shared/collab/protocol'
import type { AppConfig } from '../config'
import type { Db } from '../db/client'
import { authenticateSessionToken } from '../modules/auth/sessions'
import { findVisibleProject } from '../modules/projects/projects.repository'
import { SESSION_COOKIE } from '../security/session-token'

export interface CollabAccess {
  projectId: string
  user: { id: string; name: string }
  organizationId: string
  role: Role
  /** Reviewers and clients watch: their document updates are dropped. Read from `role`, so it follows role changes. */
  readonly readOnly: boolean
  /** When the session ends (the connection is closed with 4401 then). */
  expiresAt: Date
  /** The session the connection was opened with: signing out closes it (4401). */
  sessionId: string
}

export type UpgradeCheck =
  | { ok: true; access: CollabAccess }
  /** `closeCode`: accept the handshake and close with it (the app explains it); otherwise an HTTP status. */
  | { ok: false; status: 400 | 401 | 403 | 404; message: string; closeCode?: number }

export const CLOSE_MESSAGES = {
  signIn: 'Sign in to continue',
  sessionEnded: 'Your session has ended. Sign in again.',
  accessRemoved: 'You no longer have access to this design',
  notFound: 'Project not found',
} as const

const projectIdSchema = z.string().uuid()

/** The project id of a /collab/<id> request path; undefined for any other path. */
export function collabProjectId(url: string | undefined): string | undefined {
  const pathname = new URL(url ?? '/', 'http://localhost').pathname
  if (!pathname.startsWith(COLLAB_PATH_PREFIX)) return undefined
  return pathname.slice(COLLAB_PATH_PREFIX.length)
}

function cookieValue(header: string | undefined, name: string): string | undefined {
  for (const pair of (header ?? '').split(';')) {
    const index = pair.indexOf('=')
    if (index < 0 || pair.slice(0, index).trim() !== name) continue
    try {
      return decodeURIComponent(pair.slice(index + 1).trim())
    } catch {
      return undefined
    }
  }
  return undefined
}

/** Browsers always send Origin with a WebSocket handshake: it must be our own (as for state-changing API requests). */
function originAllowed(req: IncomingMessage, config: AppConfig): boolean {
  const origin = req.headers.origin
  if (origin === undefined) return true
  try {
    const source = new URL(origin)
    return source.host === req.headers.host || source.origin === new URL(config.publicUrl).origin || config.allowedOrigins.includes(source.origin)
  } catch {
    return false
  }
}

export async function authenticateUpgrade(deps: { db: Db; config: AppConfig }, req: IncomingMessage): Promise<UpgradeCheck> {
  const projectId = collabProjectId(req.url)
  if (projectId === undefined || !projectIdSchema.safeParse(projectId).success) {
    return { ok: false, status: 404, message: 'No such collaboration endpoint' }
  }
  if (!originAllowed(req, deps.config)) {
    return { ok: false, status: 403, message: 'This connection did not come from the Ampwright app and was refused' }
  }
  const token = cookieValue(req.headers.cookie, SESSION_COOKIE)
  if (!token) return { ok: false, status: 401, message: CLOSE_MESSAGES.signIn, closeCode: COLLAB_CLOSE.sessionEnded }
  const session = await authenticateSessionToken(deps, token)
  if (!session.ok) return { ok: false, status: 401, message: CLOSE_MESSAGES.sessionEnded, closeCode: COLLAB_CLOSE.sessionEnded }
  const { auth } = session
  const actor = { userId: auth.user.id, organizationId: auth.organization.id, role: auth.role }
  if (!can(auth.role, 'project.read')) {
    return { ok: false, status: 403, message: `Your role (${auth.role}) cannot view projects`, closeCode: COLLAB_CLOSE.accessRemoved }
  }
  if (!(await findVisibleProject(deps.db, actor, projectId))) {
    return { ok: false, status: 404, message: CLOSE_MESSAGES.notFound, closeCode: COLLAB_CLOSE.notFound }
  }
  return {
    ok: true,
    access: {
      projectId,
      user: { id: auth.user.id, name: auth.user.name },
      organizationId: auth.organization.id,
      role: auth.role,
      get readOnly() {
        return !can(this.role, 'design.write')
      },
      expiresAt: auth.expiresAt,
      sessionId: auth.sessionId,
    },
  }
}
