import type { RequestHandler } from 'express'
import { rateLimit } from 'express-rate-limit'
import { AppError } from '../errors'

/**
 * Limit requests per client address on the public proof pages: a token is unguessable (256
 * bits), but the pages must not become a free target for probing or load. Read once when the
 * app is built: PROOF_RATE_LIMIT requests per PROOF_RATE_WINDOW_MS (default 30 per minute).
 */
export function proofRateLimit(): RequestHandler {
  const windowMs = Number(process.env.PROOF_RATE_WINDOW_MS ?? 60_000)
  return rateLimit({
    windowMs,
    limit: Number(process.env.PROOF_RATE_LIMIT ?? 30),
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    handler: (_req, _res, next) => next(new AppError('rate_limited', 'Too many requests for proofs from your address; wait a minute and try again', { retryAfterSeconds: Math.ceil(windowMs / 1000) })),
  })
}
