// The session is an HS256 JWT carrying the user and organisation ids and the expiry. The role is not in
// it: requireSession reads the role from the database on every request, so a change applies at once.
import { SignJWT, jwtVerify } from 'jose'

export const SESSION_COOKIE = 'aw_session'

export interface SessionClaims {
  userId: string
  organizationId: string
  expiresAt: Date
}

export async function signSessionToken(
  claims: { userId: string; organizationId: string },
  secret: Uint8Array,
  ttlSeconds: number,
): Promise<{ token: string; expiresAt: Date }> {
  const nowS = Math.floor(Date.now() / 1000)
  const expS = nowS + ttlSeconds
  const token = await new SignJWT({ org: claims.organizationId })
    .setProtectedHeader({ alg: 'HS256' })
    .setSubject(claims.userId)
    .setIssuedAt(nowS)
    .setExpirationTime(expS)
    .sign(secret)
  return { token, expiresAt: new Date(expS * 1000) }
}

/** The claims of a valid, unexpired token; undefined for anything else (bad signature, expired, malformed). */
export async function verifySessionToken(token: string, secret: Uint8Array): Promise<SessionClaims | undefined> {
  try {
    const { payload } = await jwtVerify(token, secret, { algorithms: ['HS256'] })
    if (typeof payload.sub !== 'string' || typeof payload.org !== 'string' || typeof payload.exp !== 'number') {
      return undefined
    }
    return { userId: payload.sub, organizationId: payload.org, expiresAt: new Date(payload.exp * 1000) }
  } catch {
    return undefined
  }
}
