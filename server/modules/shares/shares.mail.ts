// The share-link and approval e-mails (plain text, like the invitation e-mails).
import type { OutgoingMail } from '../../mail/mailer'

export function shareLinkMail(input: { to: string; projectName: string; senderName: string; link: string; expiresAt: Date }): OutgoingMail {
  return {
    to: input.to,
    subject: `${input.senderName} shared the design "${input.projectName}" with you`,
    text: [
      `Hello,`,
      ``,
      `${input.senderName} shared the DC system design "${input.projectName}" with you on Ampwright.`,
      `You can view the diagram, the findings and the report, download them, and record your approval here:`,
      input.link,
      ``,
      `The link is read-only and works until ${input.expiresAt.toUTCString()}. Anyone with the link can view the design, so keep it to yourself.`,
      `Ampwright results are design aids; the installer remains responsible; local codes, the authority having jurisdiction and licensed practice prevail.`,
    ].join('\n'),
  }
}

export function approvalMail(input: {
  to: string
  recipientName: string
  projectName: string
  approverName: string
  revisionName: string
  approvedAt: Date
  link: string
}): OutgoingMail {
  return {
    to: input.to,
    subject: `${input.approverName} approved "${input.projectName}" (${input.revisionName})`,
    text: [
      `Hello ${input.recipientName},`,
      ``,
      `${input.approverName} approved the design "${input.projectName}", ${input.revisionName}, on ${input.approvedAt.toUTCString()} through a share link.`,
      `See the project and its approvals here:`,
      input.link,
    ].join('\n'),
  }
}
