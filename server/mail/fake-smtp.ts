// A local SMTP server that accepts every message and stores it in outbox_messages, so invitations and
// password resets work without a mail relay (development, demos, tests). Loopback only.
import { SMTPServer } from 'smtp-server'
import { simpleParser, type AddressObject } from 'mailparser'
import type { Db } from '../db/client'
import { outboxMessages } from '../db/schema'

export interface FakeSmtp {
  port: number
  close(): Promise<void>
}

const MAX_MESSAGE_BYTES = 1024 * 1024

function addressesOf(field: AddressObject | AddressObject[] | undefined): string[] {
  const objects = field === undefined ? [] : Array.isArray(field) ? field : [field]
  return objects.flatMap((object) => object.value.map((entry) => entry.address ?? '')).filter(Boolean)
}

function textOf(field: AddressObject | AddressObject[] | undefined): string {
  const objects = field === undefined ? [] : Array.isArray(field) ? field : [field]
  return objects.map((object) => object.text).join(', ')
}

export async function startFakeSmtp(db: Db, options: { port?: number } = {}): Promise<FakeSmtp> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    size: MAX_MESSAGE_BYTES,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          const envelopeTo = session.envelope.rcptTo.map((rcpt) => rcpt.address)
          const recipients = [...new Set([...addressesOf(parsed.to), ...envelopeTo].map((a) => a.toLowerCase()))]
          await db.insert(outboxMessages).values({
            from: textOf(parsed.from),
            to: textOf(parsed.to) || envelopeTo.join(', '),
            recipients,
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : null,
          })
        })
        .then(() => callback(), (error: Error) => callback(error))
    },
  })
  server.on('error', (error) => console.error('[fake-smtp]', error.message))
  await new Promise<void>((resolve, reject) => {
    server.server.once('error', reject)
    server.listen(options.port ?? 0, '127.0.0.1', () => resolve())
  })
  const address = server.server.address()
  const port = typeof address === 'object' && address ? address.port : 0
  return {
    port,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  }
}
