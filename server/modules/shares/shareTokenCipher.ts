// Share tokens kept encrypted at rest beside their hash, so an owner can e-mail an existing link again.
// AES-256-GCM (NIST SP 800-38D) with a 96-bit random IV per token; the key is derived from the server
// secret with HKDF-SHA-256 (RFC 5869) under its own label, so it is never the session-signing key itself.
// The token's hash is the additional authenticated data: a ciphertext copied onto another row does not open.
import { createCipheriv, createDecipheriv, hkdfSync, randomBytes } from 'node:crypto'

const VERSION = 'v1'
const IV_BYTES = 12
const TAG_BYTES = 16
const KEY_INFO = 'ampwright share-link token v1'

export interface ShareTokenCipher {
  encrypt(token: string, tokenHash: string): string
  /** The token, or null when the ciphertext does not open with this server's key (secret changed, tampered). */
  decrypt(ciphertext: string, tokenHash: string): string | null
}

export function shareTokenCipher(serverSecret: Uint8Array): ShareTokenCipher {
  const key = Buffer.from(hkdfSync('sha256', serverSecret, Buffer.alloc(0), KEY_INFO, 32))
  return {
    encrypt(token, tokenHash) {
      const iv = randomBytes(IV_BYTES)
      const cipher = createCipheriv('aes-256-gcm', key, iv, { authTagLength: TAG_BYTES })
      cipher.setAAD(Buffer.from(tokenHash, 'utf8'))
      const body = Buffer.concat([cipher.update(token, 'utf8'), cipher.final()])
      return [VERSION, iv.toString('base64url'), cipher.getAuthTag().toString('base64url'), body.toString('base64url')].join('.')
    },
    decrypt(ciphertext, tokenHash) {
      const [version, iv, tag, body] = ciphertext.split('.')
      if (version !== VERSION || !iv || !tag || body === undefined) return null
      try {
        const decipher = createDecipheriv('aes-256-gcm', key, Buffer.from(iv, 'base64url'), { authTagLength: TAG_BYTES })
        decipher.setAAD(Buffer.from(tokenHash, 'utf8'))
        decipher.setAuthTag(Buffer.from(tag, 'base64url'))
        return Buffer.concat([decipher.update(Buffer.from(body, 'base64url')), decipher.final()]).toString('utf8')
      } catch {
        return null
      }
    },
  }
}

const bySecret = new WeakMap<Uint8Array, ShareTokenCipher>()

/** The cipher of this server's secret (derived once per secret). */
export function cipherFor(config: { jwtSecret: Uint8Array }): ShareTokenCipher {
  let cipher = bySecret.get(config.jwtSecret)
  if (!cipher) bySecret.set(config.jwtSecret, (cipher = shareTokenCipher(config.jwtSecret)))
  return cipher
}
