import type { AppConfig } from '../../config'
import type { Db } from '../../db/client'
import { invalidRequest } from '../../http/errors'
import type { Mailer } from '../../mail/mailer'
import { passwordResetMail } from '../../mail/messages'
import { hashOneTimeToken, newOneTimeToken } from '../../security/one-time-tokens'
import { hashPassword } from '../../security/passwords'
import { insertPasswordReset, lockUsablePasswordReset, markPasswordResetsUsed } from './password-reset.repository'
import { deleteSessionsOfUser } from './sessions.repository'
import { findUserByEmail, updatePasswordHash } from './users.repository'

const RESET_TTL_MS = 60 * 60 * 1000

export const RESET_LINK_INVALID = 'This reset link is invalid, already used or expired. Ask for a new one.'

/** E-mails a reset link if the account exists; says nothing either way (the route answers 202). */
export async function requestPasswordReset(deps: { db: Db; config: AppConfig; mailer: Mailer }, email: string) {
  const user = await findUserByEmail(deps.db, email)
  if (!user) return
  const { token, tokenHash } = newOneTimeToken()
  await insertPasswordReset(deps.db, { userId: user.id, tokenHash, expiresAt: new Date(Date.now() + RESET_TTL_MS) })
  const link = `${deps.config.publicUrl}/reset-password?token=${encodeURIComponent(token)}`
  try {
    await deps.mailer.send(passwordResetMail({ to: user.email, name: user.name, link }))
  } catch (error) {
    // Logged, not reported: an error here would tell the caller that the account exists.
    console.error('[mail] password-reset e-mail not sent:', error instanceof Error ? error.message : error)
  }
}

export async function resetPassword(deps: { db: Db; config: AppConfig }, input: { token: string; password: string }) {
  const passwordHash = await hashPassword(input.password, deps.config.bcryptCost)
  await deps.db.transaction(async (tx) => {
    const reset = await lockUsablePasswordReset(tx, hashOneTimeToken(input.token))
    if (!reset) throw invalidRequest(RESET_LINK_INVALID, [{ path: 'token', message: RESET_LINK_INVALID }])
    await updatePasswordHash(tx, reset.userId, passwordHash)
    await markPasswordResetsUsed(tx, reset.userId)
    // Whoever knew the old password is signed out everywhere.
    await deleteSessionsOfUser(tx, reset.userId)
  })
}
