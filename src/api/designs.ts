import type { Design } from '@shared/design/schema'
import { http } from './http'

export interface StoredDesign {
  /** Raw document as stored; the editor runs it through parseDesign before opening it. */
  design: unknown
  revision: number
  updatedAt: string
}

export interface SavedRevision {
  revision: number
  updatedAt: string
}

const designPath = (projectId: string) => `/projects/${encodeURIComponent(projectId)}/design`

export const getDesign = (projectId: string, signal?: AbortSignal) =>
  http.get<StoredDesign>(designPath(projectId), { signal })

/** 409 conflict when `baseRevision` is no longer the stored one (someone else saved in between). */
export const putDesign = (projectId: string, design: Design, baseRevision: number) =>
  http.put<SavedRevision>(designPath(projectId), { design, baseRevision })
