import type { z } from 'zod'
import type { EmailedShareLink, shareLinkEmailInputSchema } from '../../../shared/api/shares.schemas'
import type { AppConfig } from '../../config'
import type { Db } from '../../db/client'
import type { Actor } from '../../http/actor'
import { conflict, HttpError, notFound } from '../../http/errors'
import type { Mailer } from '../../mail/mailer'
import { hashOneTimeToken } from '../../security/one-time-tokens'
import { getProject } from '../projects/projects.service'
import { findShareLink, findShareLinkToken } from './shareLinks.repository'
import { shareLinkMail } from './shares.mail'
import { shareUrl, statusOf, toShareLink } from './shares.service'
import { cipherFor } from './shareTokenCipher'

// Sending an existing link (again) to a client's address: only a live link, only one whose token the
// server kept encrypted, and the same e-mail as at creation.

export const LINK_REVOKED = 'This link was revoked, so it cannot be sent. Make a new link to share the design.'
export const LINK_NOT_KEPT = 'This link was made before links could be sent again, so its address is not kept. Make a new link to send it by e-mail.'
export const MAIL_NOT_SENT = 'The e-mail could not be sent. Try again later, or make a new link and copy it.'

export async function emailShareLink(
  deps: { db: Db; config: AppConfig; mailer: Mailer },
  actor: Actor & { name: string },
  projectId: string,
  linkId: string,
  input: z.output<typeof shareLinkEmailInputSchema>,
): Promise<EmailedShareLink> {
  const project = await getProject(deps.db, actor, projectId)
  const row = await findShareLink(deps.db, projectId, linkId)
  const stored = await findShareLinkToken(deps.db, projectId, linkId)
  if (!row || !stored) throw notFound('Share link')
  const status = statusOf(row)
  if (status === 'revoked') throw conflict(LINK_REVOKED)
  if (status === 'expired') {
    throw new HttpError(410, 'conflict', `This link expired on ${row.expiresAt.toUTCString()}, so it cannot be sent. Make a new link to share the design.`)
  }
  const token = stored.tokenCiphertext ? cipherFor(deps.config).decrypt(stored.tokenCiphertext, stored.tokenHash) : null
  // A ciphertext that no longer opens (the server secret changed) or does not match the hash is as good as none.
  if (!token || hashOneTimeToken(token) !== stored.tokenHash) throw conflict(LINK_NOT_KEPT)
  try {
    await deps.mailer.send(shareLinkMail({ to: input.email, projectName: project.name, senderName: actor.name, link: shareUrl(deps.config, token), expiresAt: row.expiresAt }))
  } catch (error) {
    console.error('[mail] share link e-mail not sent:', error instanceof Error ? error.message : error)
    throw new HttpError(502, 'internal', MAIL_NOT_SENT)
  }
  return { ...toShareLink(row), emailedTo: input.email }
}
