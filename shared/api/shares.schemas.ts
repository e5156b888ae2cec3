import { z } from 'zod'

// Share links (read-only access to one project by an unguessable token), client approvals, and the
// shapes the API returns. Used by the API's validation and the client's forms.

export const SHARE_LINK_MAX_DAYS = 365
export const SHARE_LINK_DEFAULT_DAYS = 14

export const shareLinkInputSchema = z.object({
  label: z.string().trim().max(80, 'Keep the label under 80 characters').default(''),
  expiresInDays: z
    .number({ error: 'Enter the number of days the link works' })
    .int('Whole days only')
    .min(1, 'A link works for at least 1 day')
    .max(SHARE_LINK_MAX_DAYS, `A link works for at most ${SHARE_LINK_MAX_DAYS} days`)
    .default(SHARE_LINK_DEFAULT_DAYS),
  /** Send the link to this address right away. */
  email: z.string().trim().toLowerCase().email('Enter a valid e-mail address').max(254).optional(),
})

/** Send (or send again) an existing link: at most this many e-mails per link per hour. */
export const SHARE_LINK_MAILS_PER_HOUR = 5

export const shareLinkEmailInputSchema = z.object({
  email: z.string({ error: 'Enter the e-mail address to send the link to' }).trim().toLowerCase().email('Enter a valid e-mail address').max(254, 'Keep the address under 254 characters'),
})
export type ShareLinkEmailInput = z.input<typeof shareLinkEmailInputSchema>
export type ShareLinkInput = z.input<typeof shareLinkInputSchema>

export const approvalInputSchema = z.object({
  name: z.string({ error: 'Enter your name' }).trim().min(1, 'Enter your name').max(120, 'Keep the name under 120 characters'),
  revisionId: z.string().uuid('Not a valid revision id').optional(),
  revisionName: z.string().trim().max(120, 'Keep the revision name under 120 characters').optional(),
})
export type ApprovalInput = z.input<typeof approvalInputSchema>

export type ShareLinkStatus = 'active' | 'expired' | 'revoked'

export interface ShareLink {
  id: string
  label: string
  status: ShareLinkStatus
  expiresAt: string
  revokedAt: string | null
  createdAt: string
  createdBy: string | null
  /** The server kept the token (encrypted) and can e-mail this link; false for links made before that. */
  canEmail: boolean
}

/** Answer to sending an existing link by e-mail. */
export interface EmailedShareLink extends ShareLink {
  emailedTo: string
}

/** Returned once, at creation: the only time the token exists outside the recipient's hands. */
export interface CreatedShareLink extends ShareLink {
  token: string
  url: string
  emailedTo: string | null
}

export interface Approval {
  id: string
  name: string
  revisionId: string | null
  revisionName: string
  designRevision: number
  createdAt: string
  via: 'share-link' | 'account'
}

export interface SharedProjectView {
  project: { name: string; clientName: string }
  link: { label: string; expiresAt: string }
  revision: number
  updatedAt: string
  /** Named revisions the client may approve. */
  revisions: { id: string; name: string; createdAt: string }[]
  design: unknown
  findings: unknown[]
  cautions: string[]
  approvals: Approval[]
}
