// Tokens sent by e-mail (invitations, password resets). Only their SHA-256 is stored, so a read of the
// database does not let anyone accept an invitation or reset a password.
import { createHash, randomBytes } from 'node:crypto'

export function newOneTimeToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url')
  return { token, tokenHash: hashOneTimeToken(token) }
}

export function hashOneTimeToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex')
}
