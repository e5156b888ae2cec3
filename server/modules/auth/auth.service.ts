import type { SignInInput, SignUpInput } from '../../../shared/api/auth.schemas'
import type { AppConfig } from '../../config'
import type { Db } from '../../db/client'
import { conflict, invalidCredentials } from '../../http/errors'
import { dummyPasswordHash, hashPassword, verifyPassword } from '../../security/passwords'
import {
  findMembershipOfUser,
  findMemberContext,
  findUserByEmail,
  insertMember,
  insertOrganization,
  isUniqueViolation,
} from './users.repository'

export interface AuthDeps {
  db: Db
  config: AppConfig
}

export const EMAIL_TAKEN_MESSAGE = 'An account with this e-mail address already exists'

/** Creates an organisation with the new user as its owner; returns the ids for the session. */
export async function signUp(deps: AuthDeps, input: SignUpInput) {
  if (await findUserByEmail(deps.db, input.email)) throw conflict(EMAIL_TAKEN_MESSAGE)
  const passwordHash = await hashPassword(input.password, deps.config.bcryptCost)
  try {
    return await deps.db.transaction(async (tx) => {
      const organization = await insertOrganization(tx, input.organizationName)
      const user = await insertMember(tx, {
        organizationId: organization.id,
        name: input.name,
        email: input.email,
        passwordHash,
        role: 'owner',
      })
      return { userId: user.id, organizationId: organization.id }
    })
  } catch (error) {
    if (isUniqueViolation(error)) throw conflict(EMAIL_TAKEN_MESSAGE)
    throw error
  }
}

/** The same error, after the same bcrypt work, for an unknown e-mail and a wrong password. */
export async function signIn(deps: AuthDeps, input: SignInInput) {
  const user = await findUserByEmail(deps.db, input.email)
  const hash = user?.passwordHash ?? (await dummyPasswordHash(deps.config.bcryptCost))
  const matches = await verifyPassword(input.password, hash)
  if (!user || !matches) throw invalidCredentials()
  const membership = await findMembershipOfUser(deps.db, user.id)
  if (!membership) throw invalidCredentials()
  return { userId: user.id, organizationId: membership.organizationId }
}

export async function loadSessionContext(deps: AuthDeps, ids: { userId: string; organizationId: string }) {
  const context = await findMemberContext(deps.db, ids.userId, ids.organizationId)
  if (!context) throw new Error('session context vanished right after it was created')
  return context
}
