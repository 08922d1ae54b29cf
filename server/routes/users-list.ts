import { asc, eq } from 'drizzle-orm'
import { userListResponseSchema } from '../../shared/schema/api/users'
import { users } from '../db/schema/index'
import { defineRoute } from './define'
import { userJson } from './serialize'

export { userListResponseSchema }

/** The organisation's users (admin only). */
export const listUsersRoute = defineRoute({
  method: 'get',
  path: '/api/users',
  access: ['admin'],
  summary: 'List users of the organisation',
  async handle({ res, deps, user }) {
    const rows = await deps.db.select().from(users).where(eq(users.organisationId, user.organisationId)).orderBy(asc(users.displayName))
    res.json({ users: rows.map(userJson) })
  },
})
