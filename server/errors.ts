import type { ErrorRequestHandler } from 'express'
import { ZodError } from 'zod'
import type { ValidationIssue } from '../shared/schema/api/common'

/** Every error code the API answers with, and its HTTP status. */
export const ERROR_STATUS = {
  bad_request: 400,
  validation_failed: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  gone: 410,
  payload_too_large: 413,
  unsupported_media_type: 415,
  rate_limited: 429,
  internal: 500,
  db_unavailable: 503,
} as const
export type ErrorCode = keyof typeof ERROR_STATUS

/** An error that becomes the envelope `{ error: { code, message, details } }`. */
export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly details?: unknown,
  ) {
    super(message)
    this.name = 'AppError'
  }
  get status(): number {
    return ERROR_STATUS[this.code]
  }
}

export const notFound = (what = 'Resource') => new AppError('not_found', `${what} not found`)
export const forbidden = (message = 'Your role does not allow this') => new AppError('forbidden', message)
export const unauthenticated = () => new AppError('unauthenticated', 'Sign in first')
export const conflict = (message: string, details?: unknown) => new AppError('conflict', message, details)

/** Turn zod issues into `{ path, message }` with dotted paths (zod's flatten loses nesting). */
export function zodIssues(err: ZodError, prefix?: string): ValidationIssue[] {
  return err.issues.map((i) => ({
    path: [prefix, ...i.path.map(String)].filter((p) => p !== undefined && p !== '').join('.'),
    message: i.message,
  }))
}

/** A 400 naming each failing field in the message and in `details.issues`. */
export function validationError(err: ZodError, where: 'body' | 'params' | 'query'): AppError {
  const issues = zodIssues(err)
  const summary = issues.map((i) => `${i.path || where}: ${i.message}`).join('; ')
  return new AppError('validation_failed', `Invalid ${where}: ${summary}`, { location: where, issues })
}

const DB_DOWN_CODES = new Set([
  'ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', 'PROTOCOL_CONNECTION_LOST', 'ER_CON_COUNT_ERROR',
  'PROTOCOL_ENQUEUE_AFTER_FATAL_ERROR', 'ER_SERVER_SHUTDOWN', 'ENOTFOUND', 'EHOSTUNREACH',
])

/** True when the error (or the driver error drizzle wraps in `cause`) means MariaDB is unreachable. */
export function isDbUnavailable(err: unknown): boolean {
  let e: unknown = err
  for (let depth = 0; e && depth < 4; depth++) {
    const code = (e as { code?: unknown }).code
    if (typeof code === 'string' && DB_DOWN_CODES.has(code)) return true
    const errno = (e as { errno?: unknown }).errno
    if (errno === 1053 || errno === 2002 || errno === 2003 || errno === 2006 || errno === 2013) return true
    e = (e as { cause?: unknown }).cause
  }
  return false
}

/** MariaDB errno of a (possibly drizzle-wrapped) driver error. 1062 = duplicate key. */
export function dbErrno(err: unknown): number | undefined {
  let e: unknown = err
  for (let depth = 0; e && depth < 4; depth++) {
    const errno = (e as { errno?: unknown }).errno
    if (typeof errno === 'number') return errno
    e = (e as { cause?: unknown }).cause
  }
  return undefined
}

/** The one error handler: AppError, zod, body-parser and database failures become the envelope. */
export function errorHandler(log: (msg: string, err: unknown) => void = (m, e) => console.error(m, e)): ErrorRequestHandler {
  return (err, _req, res, _next) => {
    let appErr: AppError
    if (err instanceof AppError) appErr = err
    else if (err instanceof ZodError) appErr = validationError(err, 'body')
    else if (err?.type === 'entity.too.large') appErr = new AppError('payload_too_large', 'Request body is too large')
    else if (err?.type === 'entity.parse.failed') appErr = new AppError('bad_request', 'Request body is not valid JSON')
    else if (err?.type === 'charset.unsupported' || err?.type === 'encoding.unsupported')
      appErr = new AppError('unsupported_media_type', 'Unsupported body encoding')
    else if (typeof err?.status === 'number' && err.status >= 400 && err.status < 500) {
      const byStatus: Record<number, ErrorCode> = { 400: 'bad_request', 401: 'unauthenticated', 403: 'forbidden', 404: 'not_found', 413: 'payload_too_large', 415: 'unsupported_media_type', 429: 'rate_limited' }
      const code = byStatus[err.status as number] ?? 'bad_request'
      appErr = new AppError(code, code === 'not_found' ? 'Not found' : String(err.message ?? code))
    } else if (isDbUnavailable(err)) appErr = new AppError('db_unavailable', 'The database is unavailable; try again shortly')
    else {
      log('unhandled error', err)
      appErr = new AppError('internal', 'Something went wrong on our side')
    }
    if (res.headersSent) return
    res.status(appErr.status).json({ error: { code: appErr.code, message: appErr.message, details: appErr.details } })
  }
}
