import { defineRoute } from './define'

/** Ends the current session and clears the cookie. */
export const signOutRoute = defineRoute({
  method: 'post',
  path: '/api/auth/sign-out',
  access: 'signed-in',
  summary: 'Sign out (ends this session)',
  async handle({ res, deps }) {
    const session = res.locals.session as { id: string } | null
    if (session) await deps.auth.invalidateSession(session.id)
    res.append('Set-Cookie', deps.auth.createBlankSessionCookie().serialize())
    res.status(204).end()
  },
})
