import { and, eq, ne } from 'drizzle-orm'
import { idParamsSchema } from '../../shared/schema/api/common'
import { updateUserBodySchema } from '../../shared/schema/api/users'
import { audit } from '../audit'
import { sessions, users } from '../db/schema/index'
import { AppError, notFound } from '../errors'
import { defineRoute } from './define'
import { userJson } from './serialize'

export { updateUserBodySchema }

/** Admin changes a user's role or disables / re-enables them. An organisation keeps at least one active admin. */
export const updateUserRoute = defineRoute({
  method: 'patch',
  path: '/api/users/:id',
  access: ['admin'],
  summary: "Change a user's role or disable the account",
  params: idParamsSchema,
  body: updateUserBodySchema,
  async handle({ res, deps, user, params, body }) {
    const row = await deps.db.transaction(async (tx) => {
      const [target] = await tx.select().from(users).where(and(eq(users.id, params.id), eq(users.organisationId, user.organisationId))).for('update')
      if (!target) throw notFound('User')
      const losesAdmin = target.role === 'admin' && target.status === 'active' && ((body.role && body.role !== 'admin') || body.disabled === true)
      if (losesAdmin) {
        const others = await tx
          .select({ id: users.id })
          .from(users)
          .where(and(eq(users.organisationId, user.organisationId), eq(users.role, 'admin'), eq(users.status, 'active'), ne(users.id, target.id)))
        if (others.length === 0) throw new AppError('conflict', 'The organisation needs at least one active admin')
      }
      const status = body.disabled === undefined ? target.status : body.disabled ? 'disabled' : target.passwordHash ? 'active' : 'invited'
      await tx.update(users).set({ role: body.role ?? target.role, status }).where(and(eq(users.id, target.id), eq(users.organisationId, user.organisationId)))
      if (status === 'disabled') await tx.delete(sessions).where(eq(sessions.userId, target.id))
      await audit(tx, { organisationId: user.organisationId, actorUserId: user.id, action: 'user.update', subjectType: 'user', subjectId: target.id, details: body })
      const [updated] = await tx.select().from(users).where(eq(users.id, target.id))
      return updated!
    })
    res.json({ user: userJson(row) })
  },
})
