import { z } from 'zod'
import { idSchema, roleSchema } from './common'

/** Minimum password length (NIST SP 800-63B asks for at least 8; we ask a little more). */
export const PASSWORD_MIN_LENGTH = 10

export const emailSchema = z.email().max(254).transform((s) => s.trim().toLowerCase())
export const passwordSchema = z.string().min(PASSWORD_MIN_LENGTH, `must be at least ${PASSWORD_MIN_LENGTH} characters`).max(200)

export const signInBodySchema = z.object({
  email: emailSchema,
  // Sign-in accepts any non-empty password so old, shorter ones still get a proper "wrong" answer.
  password: z.string().min(1).max(200),
})
export type SignInBody = z.infer<typeof signInBodySchema>

export const organisationSummarySchema = z.object({ id: idSchema, name: z.string() })

export const currentUserSchema = z.object({
  id: idSchema,
  email: z.string(),
  displayName: z.string(),
  role: roleSchema,
  organisation: organisationSummarySchema,
})
export type CurrentUser = z.infer<typeof currentUserSchema>

export const meResponseSchema = z.object({ user: currentUserSchema })

export const passwordResetRequestBodySchema = z.object({ email: emailSchema })

/** A one-time token from an invitation or password-reset mail. */
export const tokenSchema = z.string().min(20).max(100).regex(/^[A-Za-z0-9_-]+$/, 'must be a token')

export const setPasswordBodySchema = z.object({ token: tokenSchema, password: passwordSchema })

export const tokenParamsSchema = z.object({ token: tokenSchema })

/** What the accept-invitation / reset page shows before the password is chosen. */
export const tokenInfoSchema = z.object({
  kind: z.enum(['invite', 'reset']),
  email: z.string(),
  displayName: z.string(),
  organisationName: z.string(),
  expiresAt: z.string(),
})
export type TokenInfo = z.infer<typeof tokenInfoSchema>
