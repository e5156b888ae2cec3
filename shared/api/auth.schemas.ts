import { z } from 'zod'
import { roleSchema } from './roles'

export const PASSWORD_MIN_LENGTH = 10
export const PASSWORD_MAX_LENGTH = 128
export const NAME_MAX_LENGTH = 100

const email = z.string().trim().toLowerCase().email('Enter a valid e-mail address').max(254)
const password = z
  .string()
  .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters`)
  .max(PASSWORD_MAX_LENGTH, `Use at most ${PASSWORD_MAX_LENGTH} characters`)
const personName = z.string().trim().min(1, 'Enter your name').max(NAME_MAX_LENGTH)

export const signUpSchema = z.object({
  name: personName,
  email,
  password,
  organizationName: z.string().trim().min(1, 'Enter the organisation name').max(NAME_MAX_LENGTH),
})
export type SignUpInput = z.infer<typeof signUpSchema>

export const signInSchema = z.object({
  email,
  password: z.string().min(1, 'Enter your password').max(PASSWORD_MAX_LENGTH),
})
export type SignInInput = z.infer<typeof signInSchema>

export const passwordResetRequestSchema = z.object({ email })
export const passwordResetSchema = z.object({ token: z.string().min(20).max(200), password })
export const acceptInvitationSchema = z.object({
  token: z.string().min(20).max(200),
  name: personName,
  password,
})
export type AcceptInvitationInput = z.infer<typeof acceptInvitationSchema>

/** What `GET /api/auth/me` and a successful sign-in return. */
export const sessionSchema = z.object({
  user: z.object({ id: z.string(), name: z.string(), email: z.string() }),
  organization: z.object({ id: z.string(), name: z.string() }),
  role: roleSchema,
  expiresAt: z.string(),
})
export type Session = z.infer<typeof sessionSchema>
