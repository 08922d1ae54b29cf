import type { Request, RequestHandler } from 'express'
import { ipKeyGenerator, rateLimit } from 'express-rate-limit'
import { AppError } from '../errors'

/**
 * Limit failed attempts per client address + e-mail (successes do not count), so one person's
 * typos cannot lock a whole office behind one NAT out, but guessing one account's password is slow.
 * Memory store: one counter per app instance (see README's scaling plan for a shared store).
 */
export function emailRateLimit(opts: { limit: number; windowMs: number; countSuccesses?: boolean }): RequestHandler {
  return rateLimit({
    windowMs: opts.windowMs,
    limit: opts.limit,
    skipSuccessfulRequests: !opts.countSuccesses,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    keyGenerator: (req: Request) => {
      const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : ''
      return `${ipKeyGenerator(req.ip ?? 'unknown')}|${email}`
    },
    handler: (_req, _res, next, options) => {
      next(new AppError('rate_limited', 'Too many attempts; wait a few minutes and try again', { retryAfterSeconds: Math.ceil(options.windowMs / 1000) }))
    },
  })
}
