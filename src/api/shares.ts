import type { Approval, ApprovalInput, CreatedShareLink, EmailedShareLink, ShareLink, ShareLinkEmailInput, ShareLinkInput, SharedProjectView } from '@shared/api/shares.schemas'
import { http } from './http'

const enc = encodeURIComponent

// Public side: a share token instead of a session.
export const getShared = (token: string) => http.get<SharedProjectView>(`/shared/${enc(token)}`)
export const approveShared = (token: string, input: ApprovalInput) => http.post<Approval>(`/shared/${enc(token)}/approvals`, input)
export const sharedExportUrl = (token: string, file: 'diagram.svg' | 'diagram.pdf' | 'report.pdf', download = false) =>
  `/api/shared/${enc(token)}/exports/${file}${download ? '?download=1' : ''}`

// The team's side.
export const listShareLinks = (projectId: string) => http.get<ShareLink[]>(`/projects/${projectId}/share-links`)
export const createShareLink = (projectId: string, input: ShareLinkInput) => http.post<CreatedShareLink>(`/projects/${projectId}/share-links`, input)
export const revokeShareLink = (projectId: string, linkId: string) => http.delete(`/projects/${projectId}/share-links/${linkId}`)
export const listApprovals = (projectId: string) => http.get<Approval[]>(`/projects/${projectId}/approvals`)
export const emailShareLink = (projectId: string, linkId: string, input: ShareLinkEmailInput) =>
  http.post<EmailedShareLink>(`/projects/${projectId}/share-links/${linkId}/email`, input)
