import { ROLES, ROLE_LABELS } from '@shared/api/roles'

export const ROLE_HINTS = {
  owner: 'Everything, including members and deleting projects',
  designer: 'Creates and edits projects and designs',
  reviewer: 'Reads everything in the organisation, edits nothing',
  client: 'Sees only the projects shared with them, read-only',
} as const

export const roleItems = ROLES.map((value) => ({ value, title: ROLE_LABELS[value], subtitle: ROLE_HINTS[value] }))
