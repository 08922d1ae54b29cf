import { and, eq, isNull } from 'drizzle-orm'
import { setPasswordBodySchema } from '../../shared/schema/api/auth'
import { audit } from '../audit'
import { hashPassword } from '../auth/password'
import { findLiveToken, hashToken } from '../auth/tokens'
import { sessions, users, userTokens } from '../db/schema/index'
import { AppError } from '../errors'
import { defineRoute } from './define'

export { setPasswordBodySchema }

/** Spend an invitation or reset token: set the password, activate the account, end old sessions. */
export const setPasswordRoute = defineRoute({
  method: 'post',
  path: '/api/auth/set-password',
  access: 'public',
  summary: 'Set a password with a one-time link',
  body: setPasswordBodySchema,
  async handle({ res, deps, body }) {
    const passwordHash = await hashPassword(body.password)
    const email = await deps.db.transaction(async (tx) => {
      const token = await findLiveToken(tx, body.token)
      if (!token) throw new AppError('not_found', 'This link has expired or was already used')
      // Mark used first, guarded by usedAt IS NULL, so two clicks cannot both succeed.
      const [spent] = await tx.update(userTokens).set({ usedAt: new Date() }).where(and(eq(userTokens.tokenHash, hashToken(body.token)), isNull(userTokens.usedAt)))
      if (spent.affectedRows !== 1) throw new AppError('not_found', 'This link has expired or was already used')
      const [user] = await tx.select().from(users).where(eq(users.id, token.userId))
      if (!user || user.status === 'disabled') throw new AppError('not_found', 'This link has expired or was already used')
      await tx.update(users).set({ passwordHash, status: 'active' }).where(eq(users.id, user.id))
      await tx.delete(sessions).where(eq(sessions.userId, user.id))
      await audit(tx, { organisationId: user.organisationId, actorUserId: user.id, action: token.kind === 'invite' ? 'user.accept-invitation' : 'user.reset-password', subjectType: 'user', subjectId: user.id })
      return user.email
    })
    res.json({ status: 'password-set', email })
  },
})
