import type { Request, RequestHandler } from 'express'
import type { Session, User } from 'lucia'
import { verifyRequestOrigin } from 'lucia'
import type { Role } from '../../shared/schema/api/common'
import { AppError, forbidden, unauthenticated } from '../errors'
import type { Auth } from './lucia'

/** What `loadSession` leaves on `res.locals`. */
export interface AuthLocals {
  user: User | null
  session: Session | null
}

/**
 * CSRF defence: every state-changing request must carry an Origin equal to our Host.
 * SameSite=Lax already keeps the cookie off cross-site POSTs; this closes the rest.
 */
export function requireSameOrigin(): RequestHandler {
  return (req, _res, next) => {
    if (req.method === 'GET' || req.method === 'HEAD' || req.method === 'OPTIONS') return next()
    const origin = req.get('Origin')
    const host = req.get('Host')
    if (!origin || !host || !verifyRequestOrigin(origin, [host])) {
      return next(new AppError('forbidden', 'Cross-origin request refused (Origin must match Host)'))
    }
    next()
  }
}

/** Read the session cookie, validate it, refresh or clear the cookie, and expose user + session. */
export function loadSession(auth: Auth): RequestHandler {
  return async (req, res, next) => {
    const sessionId = auth.readSessionCookie(req.get('Cookie') ?? '')
    res.locals.user = null
    res.locals.session = null
    if (!sessionId) return next()
    const { session, user } = await auth.validateSession(sessionId)
    if (session?.fresh) res.append('Set-Cookie', auth.createSessionCookie(session.id).serialize())
    if (!session) res.append('Set-Cookie', auth.createBlankSessionCookie().serialize())
    // A disabled account loses access at once, even with a live session.
    if (session && user && user.status === 'active') {
      res.locals.user = user
      res.locals.session = session
    }
    next()
  }
}

/** The signed-in user, or a 401. */
export function currentUser(res: { locals: Record<string, unknown> }): User {
  const user = res.locals.user as User | null
  if (!user) throw unauthenticated()
  return user
}

/** Throw 401 without a session and 403 when the role is not among `roles`. */
export function assertAccess(user: User | null, access: 'signed-in' | readonly Role[]): User {
  if (!user) throw unauthenticated()
  if (access !== 'signed-in' && !access.includes(user.role)) throw forbidden()
  return user
}

/** Client address for rate limiting (Express's `req.ip`; set `trust proxy` behind a balancer). */
export const clientIp = (req: Request) => req.ip ?? req.socket.remoteAddress ?? 'unknown'
