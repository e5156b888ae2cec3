import { Router } from 'express'
import {
  passwordResetRequestSchema,
  passwordResetSchema,
  signInSchema,
  signUpSchema,
} from '../../../shared/api/auth.schemas'
import { authOf } from '../../http/auth'
import { loginRateLimit, passwordResetRateLimit } from '../../http/rate-limits'
import type { RouteDeps } from '../../http/route-deps'
import { validate } from '../../http/validate'
import { loadSessionContext, signIn, signUp } from './auth.service'
import { requestPasswordReset, resetPassword } from './password-reset.service'
import { deleteSession } from './sessions.repository'
import { clearSessionCookie, issueSessionCookie, toSession } from './session-cookie'

export function authRoutes(deps: RouteDeps): Router {
  const router = Router()

  const signUpInput = validate({ body: signUpSchema })
  router.post('/signup', signUpInput, async (req, res) => {
    const ids = await signUp(deps, signUpInput.data(req).body)
    const expiresAt = await issueSessionCookie(res, deps, ids)
    res.status(201).json(toSession(await loadSessionContext(deps, ids), expiresAt))
  })

  const signInInput = validate({ body: signInSchema })
  router.post('/login', loginRateLimit(deps.config), signInInput, async (req, res) => {
    const ids = await signIn(deps, signInInput.data(req).body)
    const expiresAt = await issueSessionCookie(res, deps, ids)
    res.json(toSession(await loadSessionContext(deps, ids), expiresAt))
  })

  router.post('/logout', deps.requireSession, async (req, res) => {
    const { sessionId, user } = authOf(req)
    await deleteSession(deps.db, sessionId)
    deps.hub.access.emit({ kind: 'sessionEnded', userId: user.id, sessionId })
    clearSessionCookie(res, deps.config)
    res.status(204).end()
  })

  router.get('/me', deps.requireSession, (req, res) => {
    const auth = authOf(req)
    res.json(toSession(auth, auth.expiresAt))
  })

  const resetRequestInput = validate({ body: passwordResetRequestSchema })
  router.post('/password-reset/request', passwordResetRateLimit(deps.config), resetRequestInput, async (req, res) => {
    await requestPasswordReset(deps, resetRequestInput.data(req).body.email)
    res.status(202).json({ ok: true })
  })

  const resetInput = validate({ body: passwordResetSchema })
  router.post('/password-reset', resetInput, async (req, res) => {
    await resetPassword(deps, resetInput.data(req).body)
    res.status(204).end()
  })

  return router
}
