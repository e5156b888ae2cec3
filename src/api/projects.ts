import type { Page, Project, ProjectInput, ProjectUpdate, projectListQuerySchema } from '@shared/api/projects.schemas'
import type { z } from 'zod'
import { http } from './http'

const byId = (id: string) => `/projects/${encodeURIComponent(id)}`

export const listProjects = (query: Partial<z.output<typeof projectListQuerySchema>>, signal?: AbortSignal) =>
  http.get<Page<Project>>('/projects', { query: { ...query }, signal })
export const getProject = (id: string) => http.get<Project>(byId(id))
export const createProject = (input: ProjectInput) => http.post<Project>('/projects', input)
export const updateProject = (id: string, update: ProjectUpdate) => http.patch<Project>(byId(id), update)
export const createDemoProject = () => http.post<Project>('/projects/demo')
export const duplicateProject = (id: string) => http.post<Project>(`${byId(id)}/duplicate`)
export const deleteProject = (id: string) => http.delete(byId(id))

export interface ProjectShare {
  userId: string
  name: string
  email: string
}
export const listShares = (id: string) => http.get<ProjectShare[]>(`${byId(id)}/shares`)
export const addShare = (id: string, userId: string) => http.post<unknown>(`${byId(id)}/shares`, { userId })
export const removeShare = (id: string, userId: string) =>
  http.delete(`${byId(id)}/shares/${encodeURIComponent(userId)}`)
