import { eq } from 'drizzle-orm'
import { INVITATION_TTL_HOURS, inviteUserBodySchema } from '../../shared/schema/api/invitations'
import { audit } from '../audit'
import { issueUserToken } from '../auth/tokens'
import { newId } from '../db/ids'
import { organisations, users } from '../db/schema/index'
import { AppError, dbErrno } from '../errors'
import { invitationMail } from '../mail/templates'
import { defineRoute } from './define'
import { userJson } from './serialize'

export { inviteUserBodySchema }

/** Admin invites someone: an `invited` user without password plus an e-mailed one-time link. */
export const inviteUserRoute = defineRoute({
  method: 'post',
  path: '/api/users',
  access: ['admin'],
  summary: 'Invite a user by e-mail',
  body: inviteUserBodySchema,
  async handle({ res, deps, user, body }) {
    const id = newId()
    const { row, token, orgName } = await deps.db
      .transaction(async (tx) => {
        await tx.insert(users).values({ id, organisationId: user.organisationId, email: body.email, displayName: body.displayName, role: body.role, status: 'invited' })
        const { token } = await issueUserToken(tx, { organisationId: user.organisationId, userId: id, kind: 'invite', ttlMs: INVITATION_TTL_HOURS * 3_600_000 })
        await audit(tx, { organisationId: user.organisationId, actorUserId: user.id, action: 'user.invite', subjectType: 'user', subjectId: id, details: { email: body.email, role: body.role } })
        const [row] = await tx.select().from(users).where(eq(users.id, id))
        const [org] = await tx.select({ name: organisations.name }).from(organisations).where(eq(organisations.id, user.organisationId))
        return { row: row!, token, orgName: org!.name }
      })
      .catch((e: unknown) => {
        if (dbErrno(e) === 1062) throw new AppError('conflict', 'Someone with this e-mail already has an account', { issues: [{ path: 'email', message: 'already registered' }] })
        throw e
      })
    const link = `${deps.config.publicUrl}/accept-invitation?token=${token}`
    try {
      await deps.mailer.send(invitationMail({ to: body.email, displayName: body.displayName, organisationName: orgName, inviterName: user.displayName, link, hours: INVITATION_TTL_HOURS }))
    } catch (e) {
      // The account exists; tell the admin the mail did not go out rather than pretending.
      deps.log('invitation mail failed', e)
      res.status(201).json({ user: userJson(row), mailSent: false })
      return
    }
    res.status(201).json({ user: userJson(row), mailSent: true })
  },
})
