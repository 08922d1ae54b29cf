import { eq } from 'drizzle-orm'
import { tokenParamsSchema } from '../../shared/schema/api/auth'
import { findLiveToken } from '../auth/tokens'
import { organisations, users } from '../db/schema/index'
import { AppError } from '../errors'
import { defineRoute } from './define'

/** What an invitation / reset link is for, so the page can greet the person. 404 once used or expired. */
export const tokenInfoRoute = defineRoute({
  method: 'get',
  path: '/api/auth/tokens/:token',
  access: 'public',
  summary: 'Describe a one-time link',
  params: tokenParamsSchema,
  async handle({ res, deps, params }) {
    const token = await findLiveToken(deps.db, params.token)
    if (!token) throw new AppError('not_found', 'This link has expired or was already used')
    const [row] = await deps.db
      .select({ email: users.email, displayName: users.displayName, organisationName: organisations.name })
      .from(users)
      .innerJoin(organisations, eq(organisations.id, users.organisationId))
      .where(eq(users.id, token.userId))
    if (!row) throw new AppError('not_found', 'This link has expired or was already used')
    res.json({ kind: token.kind, ...row, expiresAt: token.expiresAt.toISOString() })
  },
})
