import { and, eq, isNull } from 'drizzle-orm'
import { idParamsSchema } from '../../shared/schema/api/common'
import { INVITATION_TTL_HOURS } from '../../shared/schema/api/invitations'
import { audit } from '../audit'
import { issueUserToken } from '../auth/tokens'
import { organisations, users, userTokens } from '../db/schema/index'
import { AppError, notFound } from '../errors'
import { invitationMail } from '../mail/templates'
import { defineRoute } from './define'
import { userJson } from './serialize'

/**
 * Send a fresh invitation link to someone who has not accepted yet (the old link may have
 * expired or been lost). Earlier unused invitation links stop working.
 */
export const resendInvitationRoute = defineRoute({
  method: 'post',
  path: '/api/users/:id/invitation',
  access: ['admin'],
  summary: 'Send a new invitation link',
  params: idParamsSchema,
  async handle({ res, deps, user, params }) {
    const { target, token, orgName } = await deps.db.transaction(async (tx) => {
      const [target] = await tx.select().from(users).where(and(eq(users.id, params.id), eq(users.organisationId, user.organisationId))).for('update')
      if (!target) throw notFound('User')
      if (target.status !== 'invited') throw new AppError('conflict', 'This person has already accepted the invitation (or is disabled)')
      await tx
        .update(userTokens)
        .set({ usedAt: new Date() })
        .where(and(eq(userTokens.userId, target.id), eq(userTokens.kind, 'invite'), isNull(userTokens.usedAt)))
      const { token } = await issueUserToken(tx, { organisationId: user.organisationId, userId: target.id, kind: 'invite', ttlMs: INVITATION_TTL_HOURS * 3_600_000 })
      await audit(tx, { organisationId: user.organisationId, actorUserId: user.id, action: 'user.reinvite', subjectType: 'user', subjectId: target.id })
      const [org] = await tx.select({ name: organisations.name }).from(organisations).where(eq(organisations.id, user.organisationId))
      return { target, token, orgName: org!.name }
    })
    const link = `${deps.config.publicUrl}/accept-invitation?token=${token}`
    let mailSent = true
    try {
      await deps.mailer.send(invitationMail({ to: target.email, displayName: target.displayName, organisationName: orgName, inviterName: user.displayName, link, hours: INVITATION_TTL_HOURS }))
    } catch (e) {
      deps.log('invitation mail failed', e)
      mailSent = false
    }
    res.json({ user: userJson(target), mailSent })
  },
})
