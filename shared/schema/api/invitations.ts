import { z } from 'zod'
import { roleSchema } from './common'
import { emailSchema } from './auth'
import { userSchema } from './users'

/** How long an invitation link stays valid. */
export const INVITATION_TTL_HOURS = 72
/** How long a password-reset link stays valid. */
export const RESET_TTL_MINUTES = 60

export const inviteUserBodySchema = z.object({
  email: emailSchema,
  displayName: z.string().trim().min(1, 'must not be empty').max(120),
  role: roleSchema,
})
export type InviteUserBody = z.input<typeof inviteUserBodySchema>

export const inviteUserResponseSchema = z.object({ user: userSchema })
