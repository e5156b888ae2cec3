import type { AcceptInvitationInput } from '../../../shared/api/auth.schemas'
import type { Invitation, InvitationInput } from '../../../shared/api/members.schemas'
import type { AppConfig } from '../../config'
import type { Db } from '../../db/client'
import type { Actor } from '../../http/actor'
import { conflict, HttpError, notFound } from '../../http/errors'
import type { Mailer } from '../../mail/mailer'
import { invitationMail } from '../../mail/messages'
import { hashOneTimeToken, newOneTimeToken } from '../../security/one-time-tokens'
import { hashPassword } from '../../security/passwords'
import { findUserByEmail, insertMember, isUniqueViolation } from '../auth/users.repository'
import {
  deleteOpenInvitation,
  deleteOpenInvitationsFor,
  findInvitation,
  findPendingByTokenHash,
  insertInvitation,
  listPendingInvitations,
  markInvitationAccepted,
  type InvitationRow,
} from './invitations.repository'

const INVITATION_TTL_MS = 7 * 24 * 60 * 60 * 1000

export const ALREADY_REGISTERED = 'This e-mail address already has an Ampwright account'
export const INVITATION_NOT_SENT = 'The invitation e-mail could not be sent, so no invitation was made. Check the mail settings and try again.'

interface Deps {
  db: Db
  config: AppConfig
  mailer: Mailer
}

function toInvitation(row: InvitationRow): Invitation {
  return {
    id: row.id,
    email: row.email,
    role: row.role,
    expiresAt: row.expiresAt.toISOString(),
    invitedBy: row.invitedByName ?? '',
    createdAt: row.createdAt.toISOString(),
  }
}

export async function pendingInvitations(db: Db, actor: Actor): Promise<Invitation[]> {
  return (await listPendingInvitations(db, actor.organizationId)).map(toInvitation)
}

export async function invite(
  deps: Deps,
  actor: Actor & { name: string; organizationName: string },
  input: InvitationInput,
): Promise<Invitation> {
  if (await findUserByEmail(deps.db, input.email)) throw conflict(ALREADY_REGISTERED)
  const { token, tokenHash } = newOneTimeToken()
  const expiresAt = new Date(Date.now() + INVITATION_TTL_MS)
  const id = await deps.db.transaction(async (tx) => {
    await deleteOpenInvitationsFor(tx, actor.organizationId, input.email)
    return insertInvitation(tx, { ...input, organizationId: actor.organizationId, tokenHash, invitedBy: actor.userId, expiresAt })
  })
  const link = `${deps.config.publicUrl}/accept-invitation?token=${encodeURIComponent(token)}`
  const mail = invitationMail({
    to: input.email,
    organizationName: actor.organizationName,
    inviterName: actor.name,
    role: input.role,
    link,
    expiresAt,
  })
  try {
    await deps.mailer.send(mail)
  } catch (error) {
    // Nobody can accept an invitation whose link never arrived: take it back and say so.
    console.error('[mail] invitation e-mail not sent:', error instanceof Error ? error.message : error)
    await deleteOpenInvitation(deps.db, actor.organizationId, id)
    throw new HttpError(500, 'internal', INVITATION_NOT_SENT)
  }
  const row = await findInvitation(deps.db, actor.organizationId, id)
  if (!row) throw notFound('Invitation')
  return toInvitation(row)
}

export async function revokeInvitation(db: Db, actor: Actor, id: string): Promise<void> {
  if (!(await deleteOpenInvitation(db, actor.organizationId, id))) throw notFound('Invitation')
}

export async function lookupInvitation(db: Db, token: string) {
  const row = await findPendingByTokenHash(db, hashOneTimeToken(token))
  if (!row) throw notFound('Invitation')
  return { email: row.email, role: row.role, organizationName: row.organizationName }
}

/** Creates the invited user in the inviting organisation; the invitation can be used once. */
export async function acceptInvitation(deps: Omit<Deps, 'mailer'>, input: AcceptInvitationInput) {
  const passwordHash = await hashPassword(input.password, deps.config.bcryptCost)
  try {
    return await deps.db.transaction(async (tx) => {
      const invitation = await findPendingByTokenHash(tx, hashOneTimeToken(input.token), { lock: true })
      if (!invitation) throw notFound('Invitation')
      if (await findUserByEmail(tx, invitation.email)) throw conflict(ALREADY_REGISTERED)
      const user = await insertMember(tx, {
        organizationId: invitation.organizationId,
        name: input.name,
        email: invitation.email,
        passwordHash,
        role: invitation.role,
      })
      await markInvitationAccepted(tx, invitation.id)
      return { userId: user.id, organizationId: invitation.organizationId }
    })
  } catch (error) {
    if (isUniqueViolation(error)) throw conflict(ALREADY_REGISTERED)
    throw error
  }
}
