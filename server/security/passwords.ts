import bcrypt from 'bcryptjs'

export function hashPassword(password: string, cost: number): Promise<string> {
  return bcrypt.hash(password, cost)
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash)
}

/** The cost factor recorded in a bcrypt hash ("$2b$12$..." → 12). */
export function bcryptCostOf(hash: string): number {
  return Number(hash.split('$')[2])
}

// Compared against when the e-mail is unknown, so a sign-in takes as long whether or not the account exists.
let dummyHash: Promise<string> | undefined
export function dummyPasswordHash(cost: number): Promise<string> {
  dummyHash ??= bcrypt.hash('not-a-real-password-but-equally-slow', cost)
  return dummyHash
}
