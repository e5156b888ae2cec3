import type { Invitation, InvitationInput, Member } from '@shared/api/members.schemas'
import type { Role } from '@shared/api/roles'
import { http } from './http'

export const listMembers = () => http.get<Member[]>('/members')
export const updateMemberRole = (userId: string, role: Role) =>
  http.patch<Member>(`/members/${encodeURIComponent(userId)}`, { role })
export const removeMember = (userId: string) => http.delete(`/members/${encodeURIComponent(userId)}`)

export const listInvitations = () => http.get<Invitation[]>('/invitations')
export const createInvitation = (input: InvitationInput) => http.post<Invitation>('/invitations', input)
export const revokeInvitation = (id: string) => http.delete(`/invitations/${encodeURIComponent(id)}`)
