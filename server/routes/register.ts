import { Router } from 'express'
import type { User } from 'lucia'
import { assertAccess } from '../auth/middleware'
import type { AppDeps } from '../deps'
import { AppError, validationError } from '../errors'
import type { AnyRoute } from './define'

const BODY_METHODS = new Set(['post', 'put', 'patch'])

/** Mount every route of the list on a router: access check, then validation, then the handler. */
export function buildApiRouter(routes: readonly AnyRoute[], deps: AppDeps): Router {
  const router = Router()
  for (const route of routes) {
    const handlers = [
      // Access first: an anonymous caller gets 401 before anything about the request is judged.
      ((_req, res, next) => {
        try {
          if (route.access !== 'public') assertAccess(res.locals.user as User | null, route.access)
          next()
        } catch (e) {
          next(e)
        }
      }) as import('express').RequestHandler,
      ...(route.before?.(deps) ?? []),
      (async (req, res) => {
        let body: unknown = undefined
        if (route.body) {
          if (BODY_METHODS.has(route.method) && req.get('Content-Length') !== '0' && req.get('Content-Type') && !req.is('application/json')) {
            throw new AppError('unsupported_media_type', 'Send the body as application/json')
          }
          const parsed = route.body.safeParse(req.body ?? {})
          if (!parsed.success) throw validationError(parsed.error, 'body')
          body = parsed.data
        }
        let params: unknown = req.params
        if (route.params) {
          const parsed = route.params.safeParse(req.params)
          // A malformed id cannot name an existing row: answer like any unknown id.
          if (!parsed.success) throw new AppError('not_found', 'Not found', { location: 'params' })
          params = parsed.data
        }
        let query: unknown = req.query
        if (route.query) {
          const parsed = route.query.safeParse(req.query)
          if (!parsed.success) throw validationError(parsed.error, 'query')
          query = parsed.data
        }
        await route.handle({ req, res, deps, user: res.locals.user ?? null, params, query, body })
      }) as import('express').RequestHandler,
    ]
    router[route.method](route.path, ...handlers)
  }
  return router
}
