import { z } from 'zod'
import { idSchema, isoDateSchema, roleSchema } from './common'
import { emailSchema } from './auth'

export const userStatusSchema = z.enum(['invited', 'active', 'disabled'])
export type UserStatus = z.infer<typeof userStatusSchema>

export const userSchema = z.object({
  id: idSchema,
  email: z.string(),
  displayName: z.string(),
  role: roleSchema,
  status: userStatusSchema,
  createdAt: isoDateSchema,
})
export type User = z.infer<typeof userSchema>

export const userListResponseSchema = z.object({ users: z.array(userSchema) })
export const userResponseSchema = z.object({ user: userSchema })

/** Admin changes a user's role or disables / re-enables the account. */
export const updateUserBodySchema = z
  .object({ role: roleSchema.optional(), disabled: z.boolean().optional() })
  .strict()
  .refine((b) => b.role !== undefined || b.disabled !== undefined, { message: 'give role or disabled' })

export { emailSchema }
