import { eq } from 'drizzle-orm'
import { RESET_TTL_MINUTES } from '../../shared/schema/api/invitations'
import { passwordResetRequestBodySchema } from '../../shared/schema/api/auth'
import { emailRateLimit } from '../auth/rate-limit'
import { issueUserToken } from '../auth/tokens'
import { users } from '../db/schema/index'
import { resetMail } from '../mail/templates'
import { defineRoute } from './define'

export { passwordResetRequestBodySchema }

/** Ask for a reset link. Always 202, whether or not the e-mail has an account. */
export const passwordResetRequestRoute = defineRoute({
  method: 'post',
  path: '/api/auth/password-reset',
  access: 'public',
  summary: 'Request a password-reset mail',
  body: passwordResetRequestBodySchema,
  before: (deps) => [emailRateLimit({ limit: 5, windowMs: deps.config.signInWindowMs, countSuccesses: true })],
  async handle({ res, deps, body }) {
    const [user] = await deps.db.select().from(users).where(eq(users.email, body.email)).limit(1)
    if (user && user.status === 'active') {
      const { token } = await issueUserToken(deps.db, { organisationId: user.organisationId, userId: user.id, kind: 'reset', ttlMs: RESET_TTL_MINUTES * 60_000 })
      const link = `${deps.config.publicUrl}/reset-password?token=${token}`
      // Not awaited: waiting for the mail server would make known addresses answer measurably slower.
      void deps.mailer.send(resetMail({ to: user.email, displayName: user.displayName, link, minutes: RESET_TTL_MINUTES })).catch((e) => deps.log('reset mail failed', e))
    }
    res.status(202).json({ status: 'accepted' })
  },
})
