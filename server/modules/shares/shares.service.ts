import type { Approval, ApprovalInput, CreatedShareLink, ShareLink, SharedProjectView } from '../../../shared/api/shares.schemas'
import type { z } from 'zod'
import type { shareLinkInputSchema, approvalInputSchema } from '../../../shared/api/shares.schemas'
import { designCautions } from '../../../shared/export'
import type { AppConfig } from '../../config'
import type { Db } from '../../db/client'
import type { Actor } from '../../http/actor'
import { HttpError, invalidRequest, notFound } from '../../http/errors'
import type { Mailer } from '../../mail/mailer'
import { hashOneTimeToken, newOneTimeToken } from '../../security/one-time-tokens'
import { exportContextForProject, type ExportContext } from '../exports/exportContext'
import { getProject } from '../projects/projects.service'
import { approvalMail, shareLinkMail } from './shares.mail'
import { cipherFor } from './shareTokenCipher'
import {
  findLinkByTokenHash,
  findShareLink,
  insertApproval,
  insertShareLink,
  listApprovals,
  listNamedRevisions,
  listShareLinks,
  revokeShareLink,
  usersByIds,
  type ShareLinkRow,
} from './shareLinks.repository'

interface Deps {
  db: Db
  config: AppConfig
  mailer: Mailer
}

const DAY_MS = 24 * 60 * 60 * 1000
export const SHARE_MAIL_NOT_SENT = 'The share link was made, but the e-mail could not be sent. Copy the link and send it yourself.'

export function statusOf(row: { expiresAt: Date; revokedAt: Date | null }, now = new Date()): ShareLink['status'] {
  if (row.revokedAt) return 'revoked'
  return row.expiresAt.getTime() <= now.getTime() ? 'expired' : 'active'
}

export function toShareLink(row: ShareLinkRow): ShareLink {
  return {
    id: row.id,
    label: row.label,
    status: statusOf(row),
    expiresAt: row.expiresAt.toISOString(),
    revokedAt: row.revokedAt?.toISOString() ?? null,
    createdAt: row.createdAt.toISOString(),
    createdBy: row.createdByName ?? null,
    canEmail: row.canEmail,
  }
}

type ApprovalRow = Awaited<ReturnType<typeof listApprovals>>[number]
function toApproval(row: ApprovalRow): Approval {
  return {
    id: row.id,
    name: row.name,
    revisionId: row.revisionId,
    revisionName: row.revisionName,
    designRevision: row.designRevision,
    createdAt: row.createdAt.toISOString(),
    via: row.shareLinkId ? 'share-link' : 'account',
  }
}

export const shareUrl = (config: AppConfig, token: string) => `${config.publicUrl}/s/${token}`

export async function createShareLink(
  deps: Deps,
  actor: Actor & { name: string },
  projectId: string,
  input: z.output<typeof shareLinkInputSchema>,
): Promise<CreatedShareLink> {
  const project = await getProject(deps.db, actor, projectId)
  const { token, tokenHash } = newOneTimeToken()
  const expiresAt = new Date(Date.now() + input.expiresInDays * DAY_MS)
  const tokenCiphertext = cipherFor(deps.config).encrypt(token, tokenHash)
  const id = await insertShareLink(deps.db, { projectId, label: input.label, tokenHash, tokenCiphertext, createdBy: actor.userId, expiresAt })
  const url = shareUrl(deps.config, token)
  let emailedTo: string | null = null
  if (input.email) {
    try {
      await deps.mailer.send(shareLinkMail({ to: input.email, projectName: project.name, senderName: actor.name, link: url, expiresAt }))
      emailedTo = input.email
    } catch (error) {
      console.error('[mail] share link e-mail not sent:', error instanceof Error ? error.message : error)
      throw new HttpError(502, 'internal', SHARE_MAIL_NOT_SENT)
    }
  }
  const row = await findShareLink(deps.db, projectId, id)
  if (!row) throw notFound('Share link')
  return { ...toShareLink(row), token, url, emailedTo }
}

export async function projectShareLinks(db: Db, actor: Actor, projectId: string): Promise<ShareLink[]> {
  await getProject(db, actor, projectId)
  return (await listShareLinks(db, projectId)).map(toShareLink)
}

export async function revokeLink(db: Db, actor: Actor, projectId: string, linkId: string): Promise<void> {
  await getProject(db, actor, projectId)
  if (!(await revokeShareLink(db, projectId, linkId))) throw notFound('Share link')
}

export async function projectApprovals(db: Db, actor: Actor, projectId: string): Promise<Approval[]> {
  await getProject(db, actor, projectId)
  return (await listApprovals(db, projectId)).map(toApproval)
}

// ---- Public side: everything below is reached with a token, checked on every request ----

export type SharedLink = NonNullable<Awaited<ReturnType<typeof findLinkByTokenHash>>>

/** The link behind a token: 404 if unknown, 410 if revoked or expired (with a message saying which). */
export async function resolveShareToken(db: Db, token: string): Promise<SharedLink> {
  const link = token.length <= 100 ? await findLinkByTokenHash(db, hashOneTimeToken(token)) : undefined
  if (!link) throw new HttpError(404, 'not_found', 'This share link does not exist. Ask the designer for a new one.')
  if (link.revokedAt) throw new HttpError(410, 'not_found', 'This share link was revoked by the designer. Ask them for a new one.')
  if (link.expiresAt.getTime() <= Date.now()) {
    throw new HttpError(410, 'not_found', `This share link expired on ${link.expiresAt.toUTCString()}. Ask the designer for a new one.`)
  }
  return link
}

export function sharedExportContext(db: Db, link: SharedLink): Promise<ExportContext> {
  return exportContextForProject(db, { id: link.projectId, name: link.projectName, clientName: link.clientName, createdByName: null })
}

export async function sharedView(db: Db, link: SharedLink): Promise<SharedProjectView> {
  const ctx = await sharedExportContext(db, link)
  const revisions = await listNamedRevisions(db, link.projectId)
  return {
    project: { name: link.projectName, clientName: link.clientName },
    link: { label: link.label, expiresAt: link.expiresAt.toISOString() },
    revision: ctx.revision,
    updatedAt: ctx.updatedAt.toISOString(),
    revisions: revisions.map((r) => ({ id: r.id, name: r.name, createdAt: r.createdAt.toISOString() })),
    design: ctx.design,
    findings: ctx.analysis.findings,
    cautions: designCautions(ctx.design),
    approvals: (await listApprovals(db, link.projectId)).map(toApproval),
  }
}

/** Records the approval and tells the designers (the project's creator and the link's creator) by e-mail. */
export async function approveShared(deps: Deps, link: SharedLink, input: z.output<typeof approvalInputSchema>): Promise<Approval> {
  const ctx = await sharedExportContext(deps.db, link)
  let revisionName = input.revisionName || `Saved revision ${ctx.revision}`
  if (input.revisionId) {
    const named = (await listNamedRevisions(deps.db, link.projectId)).find((r) => r.id === input.revisionId)
    if (!named) throw invalidRequest('No such revision of this design', [{ path: 'revisionId', message: 'No such revision of this design' }])
    revisionName = named.name
  }
  const row = await insertApproval(deps.db, {
    projectId: link.projectId,
    shareLinkId: link.id,
    name: input.name,
    revisionId: input.revisionId ?? null,
    revisionName,
    designRevision: ctx.revision,
  })
  const recipients = await usersByIds(deps.db, [link.projectCreatedBy, link.createdById].filter((id): id is string => Boolean(id)))
  const projectLink = `${deps.config.publicUrl}/projects/${link.projectId}`
  for (const user of recipients) {
    try {
      await deps.mailer.send(approvalMail({ to: user.email, recipientName: user.name, projectName: link.projectName, approverName: input.name,
        revisionName, approvedAt: row.createdAt, link: projectLink }))
    } catch (error) {
      // The approval is stored and the team sees it in the project; a lost notice must not undo it.
      console.error('[mail] approval notice not sent:', error instanceof Error ? error.message : error)
    }
  }
  return toApproval(row)
}

export type { ApprovalInput }
