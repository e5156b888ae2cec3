// The plain-text e-mails Ampwright sends. Links are built from config.publicUrl.
import { ROLE_LABELS, type Role } from '../../shared/api/roles'
import type { OutgoingMail } from './mailer'

export function invitationMail(input: {
  to: string
  organizationName: string
  inviterName: string
  role: Role
  link: string
  expiresAt: Date
}): OutgoingMail {
  return {
    to: input.to,
    subject: `${input.inviterName} invited you to ${input.organizationName} on Ampwright`,
    text: [
      `Hello,`,
      ``,
      `${input.inviterName} invited you to join ${input.organizationName} on Ampwright as ${ROLE_LABELS[input.role].toLowerCase()}.`,
      ``,
      `Accept the invitation and choose your password here:`,
      input.link,
      ``,
      `The link works once and expires on ${input.expiresAt.toUTCString()}.`,
      `If you did not expect this invitation, ignore this e-mail.`,
    ].join('\n'),
  }
}

export function passwordResetMail(input: { to: string; name: string; link: string }): OutgoingMail {
  return {
    to: input.to,
    subject: 'Reset your Ampwright password',
    text: [
      `Hello ${input.name},`,
      ``,
      `Someone (hopefully you) asked to reset the password of your Ampwright account.`,
      `Choose a new password here:`,
      input.link,
      ``,
      `The link works once and expires in one hour.`,
      `If you did not ask for this, ignore this e-mail: your password stays as it is.`,
    ].join('\n'),
  }
}
