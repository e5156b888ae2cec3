import type { Request } from 'express'
import { z } from 'zod'
import type { Role } from '../../shared/api/roles'
import { authOf } from './auth'

/** Who is asking: every query is scoped to their organisation (and, for clients, their shares). */
export interface Actor {
  userId: string
  organizationId: string
  role: Role
}

export function actorOf(req: Request): Actor {
  const auth = authOf(req)
  return { userId: auth.user.id, organizationId: auth.organization.id, role: auth.role }
}

/** A uuid path parameter (anything else would be a database error, so it is a 400 here). */
export const idParam = z.string().uuid('Not a valid id')
