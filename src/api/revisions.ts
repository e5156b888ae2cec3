import type { Revision } from '@shared/api/revisions.schemas'
import { http } from './http'

const revisionsPath = (projectId: string) => `/projects/${encodeURIComponent(projectId)}/revisions`

export const listRevisions = (projectId: string) => http.get<Revision[]>(revisionsPath(projectId))

export const nameRevision = (projectId: string, name: string) => http.post<Revision>(revisionsPath(projectId), { name })

/** Restoring records a new revision; the history is kept. */
export const restoreRevision = (projectId: string, revisionId: string) =>
  http.post<Revision>(`${revisionsPath(projectId)}/${encodeURIComponent(revisionId)}/restore`, {})

