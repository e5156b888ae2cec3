import nodemailer from 'nodemailer'
import type { SmtpConfig } from '../config'

export interface OutgoingMail {
  to: string
  subject: string
  text: string
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>
  close(): void
}

/** A nodemailer SMTP transport. Give it the fake server's host and port when SMTP_HOST is unset. */
export function createMailer(smtp: Pick<SmtpConfig, 'user' | 'pass' | 'from'> & { host: string; port: number }): Mailer {
  const isLocal = smtp.host === '127.0.0.1' || smtp.host === 'localhost'
  const transport = nodemailer.createTransport({
    host: smtp.host,
    port: smtp.port,
    secure: smtp.port === 465,
    // The local fake speaks plain SMTP; a real relay must use TLS.
    ignoreTLS: isLocal,
    requireTLS: !isLocal && smtp.port !== 465,
    auth: smtp.user ? { user: smtp.user, pass: smtp.pass ?? '' } : undefined,
  })
  return {
    async send(mail) {
      await transport.sendMail({ from: smtp.from, to: mail.to, subject: mail.subject, text: mail.text })
    },
    close: () => transport.close(),
  }
}
