import type { Revision } from '@shared/api/revisions.schemas'
import type { DesignDiff } from '@shared/collab/diffDesigns'
import { http } from './http'

const revisionsPath = (projectId: string) => `/projects/${encodeURIComponent(projectId)}/revisions`

export const listRevisions = (projectId: string) => http.get<Revision[]>(revisionsPath(projectId))

/** One revision with the design as it was recorded (read-only). */
export const getRevision = (projectId: string, revisionId: string) =>
  http.get<{ revision: Revision; design: unknown }>(`${revisionsPath(projectId)}/${encodeURIComponent(revisionId)}`)

export const nameRevision = (projectId: string, name: string) => http.post<Revision>(revisionsPath(projectId), { name })

/** Restoring records a new revision; the history is kept. */
export const restoreRevision = (projectId: string, revisionId: string) =>
  http.post<Revision>(`${revisionsPath(projectId)}/${encodeURIComponent(revisionId)}/restore`, {})


export type RevisionComparison = DesignDiff & { from: Revision; to: Revision }

/** What changed from one revision to another, with findings that appeared or cleared. */
export const compareRevisions = (projectId: string, from: string, to: string) =>
  http.get<RevisionComparison>(`${revisionsPath(projectId)}/compare?from=${encodeURIComponent(from)}&to=${encodeURIComponent(to)}`)
