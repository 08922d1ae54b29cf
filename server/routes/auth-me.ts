import { eq } from 'drizzle-orm'
import { meResponseSchema } from '../../shared/schema/api/auth'
import { organisations } from '../db/schema/index'
import { defineRoute } from './define'

export { meResponseSchema }

/** The signed-in user and their organisation. */
export const meRoute = defineRoute({
  method: 'get',
  path: '/api/auth/me',
  access: 'signed-in',
  summary: 'Who is signed in',
  async handle({ res, deps, user }) {
    const [org] = await deps.db.select({ name: organisations.name }).from(organisations).where(eq(organisations.id, user.organisationId))
    res.json({
      user: {
        id: user.id,
        email: user.email,
        displayName: user.displayName,
        role: user.role,
        organisation: { id: user.organisationId, name: org?.name ?? '' },
      },
    })
  },
})
