import type { Attachment } from '@shared/api/uploads.schemas'
import { ApiError, http } from './http'

export const listAttachments = (projectId: string, partId?: string) =>
  http.get<Attachment[]>(`/projects/${projectId}/attachments${partId ? `?partId=${encodeURIComponent(partId)}` : ''}`)
export const deleteAttachment = (projectId: string, id: string) => http.delete(`/projects/${projectId}/attachments/${id}`)
export const attachmentUrl = (projectId: string, id: string) => `/api/projects/${projectId}/attachments/${id}/download`

/** multipart upload (the JSON client cannot send files). */
export async function uploadAttachment(projectId: string, file: File, partId?: string): Promise<Attachment> {
  const form = new FormData()
  if (partId) form.append('partId', partId)
  form.append('file', file)
  let res: Response
  try {
    res = await fetch(`/api/projects/${projectId}/attachments`, { method: 'POST', credentials: 'same-origin', body: form })
  } catch {
    throw new ApiError(0, 'network', 'Cannot reach the Ampwright server. Check your connection and try again.')
  }
  const body = (await res.json().catch(() => null)) as (Attachment & { error?: { code?: string; message?: string } }) | null
  if (!res.ok) throw new ApiError(res.status, (body?.error?.code ?? 'internal') as ApiError['code'], body?.error?.message ?? `The server answered ${res.status}`)
  return body as Attachment
}
