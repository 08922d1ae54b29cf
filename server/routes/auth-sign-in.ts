import { eq } from 'drizzle-orm'
import { signInBodySchema } from '../../shared/schema/api/auth'
import { burnVerification, verifyPassword } from '../auth/password'
import { emailRateLimit } from '../auth/rate-limit'
import { organisations, users } from '../db/schema/index'
import { AppError } from '../errors'
import { defineRoute } from './define'

export { signInBodySchema }

/** E-mail + password -> session cookie. Same answer and timing for unknown e-mail and wrong password. */
export const signInRoute = defineRoute({
  method: 'post',
  path: '/api/auth/sign-in',
  access: 'public',
  summary: 'Sign in with e-mail and password',
  body: signInBodySchema,
  before: (deps) => [emailRateLimit({ limit: deps.config.signInLimit, windowMs: deps.config.signInWindowMs })],
  async handle({ res, deps, body }) {
    const [row] = await deps.db
      .select({ user: users, organisationName: organisations.name })
      .from(users)
      .innerJoin(organisations, eq(organisations.id, users.organisationId))
      .where(eq(users.email, body.email))
      .limit(1)
    const ok =
      row && row.user.passwordHash && row.user.status === 'active'
        ? await verifyPassword(row.user.passwordHash, body.password)
        : await burnVerification(body.password)
    if (!ok || !row) throw new AppError('unauthenticated', 'E-mail or password is wrong')
    const session = await deps.auth.createSession(row.user.id, {})
    res.append('Set-Cookie', deps.auth.createSessionCookie(session.id).serialize())
    res.json({
      user: {
        id: row.user.id,
        email: row.user.email,
        displayName: row.user.displayName,
        role: row.user.role,
        organisation: { id: row.user.organisationId, name: row.organisationName },
      },
    })
  },
})
