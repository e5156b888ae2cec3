import { z } from 'zod'

/** Roles inside one organisation. The permission matrix is in README.md and `can()` below. */
export const ROLES = ['owner', 'designer', 'reviewer', 'client'] as const
export const roleSchema = z.enum(ROLES)
export type Role = z.infer<typeof roleSchema>

export const ROLE_LABELS: Record<Role, string> = {
  owner: 'Owner',
  designer: 'Designer',
  reviewer: 'Reviewer',
  client: 'Client',
}

/** Every action a route can demand. One source of truth for the server guard and the menus. */
export type Action =
  | 'project.read' // read projects (a client: only those shared with them)
  | 'project.readAll' // see every project of the organisation
  | 'project.write' // create, rename, edit, duplicate, archive
  | 'project.delete'
  | 'project.share' // share a project with a client member
  | 'design.write'
  | 'member.read'
  | 'member.manage' // invite, change role, remove
  | 'outbox.read'

const MATRIX: Record<Action, readonly Role[]> = {
  'project.read': ['owner', 'designer', 'reviewer', 'client'],
  'project.readAll': ['owner', 'designer', 'reviewer'],
  'project.write': ['owner', 'designer'],
  'project.delete': ['owner'],
  'project.share': ['owner', 'designer'],
  'design.write': ['owner', 'designer'],
  'member.read': ['owner', 'designer', 'reviewer'],
  'member.manage': ['owner'],
  'outbox.read': ['owner'],
}

export function can(role: Role, action: Action): boolean {
  return MATRIX[action].includes(role)
}

export const PERMISSION_MATRIX = MATRIX
