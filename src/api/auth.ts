import type { AcceptInvitationInput, Session, SignInInput, SignUpInput } from '@shared/api/auth.schemas'
import type { Role } from '@shared/api/roles'
import { http } from './http'

export const getSession = () => http.get<Session>('/auth/me', { expectUnauthenticated: true })
export const signIn = (input: SignInInput) => http.post<Session>('/auth/login', input, { expectUnauthenticated: true })
export const signUp = (input: SignUpInput) => http.post<Session>('/auth/signup', input)
export const signOut = () => http.post<void>('/auth/logout', undefined, { expectUnauthenticated: true })

export const requestPasswordReset = (email: string) => http.post<void>('/auth/password-reset/request', { email })
export const resetPassword = (token: string, password: string) =>
  http.post<void>('/auth/password-reset', { token, password })

export interface InvitationLookup {
  email: string
  role: Role
  organizationName: string
}
export const lookupInvitation = (token: string) =>
  http.get<InvitationLookup>(`/invitations/lookup/${encodeURIComponent(token)}`)
export const acceptInvitation = (input: AcceptInvitationInput) => http.post<Session>('/invitations/accept', input)
