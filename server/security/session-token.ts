// The session is an HS256 JWT carrying the user and organisation ids, the session id (jti) and the
// expiry. The role is not in it: requireSession reads the role and checks that the session row still
// exists on every request, so a role change, a sign-out or a removal applies at once.
import { SignJWT, jwtVerify } from 'jose'

export const SESSION_COOKIE = 'aw_session'

export interface SessionClaims {
  userId: string
  organizationId: string
  sessionId: string
  expiresAt: Date
}

export async function signSessionToken(claims: SessionClaims, secret: Uint8Array): Promise<string> {
  return new SignJWT({ org: claims.organizationId })
    .setProtectedHeader({ alg: 'HS256' })
    .setSubject(claims.userId)
    .setJti(claims.sessionId)
    .setIssuedAt()
    .setExpirationTime(Math.floor(claims.expiresAt.getTime() / 1000))
    .sign(secret)
}

/** The claims of a valid, unexpired token; undefined for anything else (bad signature, expired, malformed). */
export async function verifySessionToken(token: string, secret: Uint8Array): Promise<SessionClaims | undefined> {
  try {
    const { payload } = await jwtVerify(token, secret, { algorithms: ['HS256'] })
    const { sub, org, jti, exp } = payload
    if (typeof sub !== 'string' || typeof org !== 'string' || typeof jti !== 'string' || typeof exp !== 'number') {
      return undefined
    }
    return { userId: sub, organizationId: org, sessionId: jti, expiresAt: new Date(exp * 1000) }
  } catch {
    return undefined
  }
}
