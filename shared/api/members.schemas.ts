import { z } from 'zod'
import { roleSchema, type Role } from './roles'

export const invitationInputSchema = z.object({
  email: z.string().trim().toLowerCase().email('Enter a valid e-mail address').max(254),
  role: roleSchema,
})
export type InvitationInput = z.infer<typeof invitationInputSchema>

export const memberRoleUpdateSchema = z.object({ role: roleSchema })

export interface Member {
  userId: string
  name: string
  email: string
  role: Role
  joinedAt: string
}

export interface Invitation {
  id: string
  email: string
  role: Role
  expiresAt: string
  invitedBy: string
  createdAt: string
}

/** A message captured by the local fake SMTP server (development and tests). */
export interface OutboxMessage {
  id: string
  from: string
  to: string
  subject: string
  text: string
  receivedAt: string
}
