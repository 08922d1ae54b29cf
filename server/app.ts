import path from 'node:path'
import { existsSync } from 'node:fs'
import { fileURLToPath } from 'node:url'
import express, { type Express } from 'express'
import helmet from 'helmet'
import { sql } from 'drizzle-orm'
import { createAuth } from './auth/lucia'
import { loadSession, requireSameOrigin } from './auth/middleware'
import type { Config } from './config'
import type { Database } from './db/client'
import type { AppDeps } from './deps'
import { AppError, errorHandler } from './errors'
import type { Mailer } from './mail/transport'
import type { AnyRoute } from './routes/define'
import { routes as defaultRoutes } from './routes/index'
import { buildApiRouter } from './routes/register'

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..')
/** B612 and any other bundled fonts: served to the browser, read by the server. */
export const FONTS_DIR = path.join(ROOT, 'fonts')
export const CLIENT_DIST = path.join(ROOT, 'dist')

export interface CreateAppOptions {
  db: Database
  config: Config
  mailer: Mailer
  /** Defaults to `SELECT 1` on `db`. */
  pingDb?: () => Promise<void>
  /** Defaults to server/routes/index.ts. */
  routes?: readonly AnyRoute[]
  log?: (msg: string, err?: unknown) => void
}

/** Build the Express app: security headers, JSON API under /api, fonts, and the built client. */
export function createApp(opts: CreateAppOptions): { app: Express; deps: AppDeps } {
  const log = opts.log ?? ((msg: string, err?: unknown) => console.error(`[touchproof] ${msg}`, err ?? ''))
  const deps: AppDeps = {
    db: opts.db,
    config: opts.config,
    mailer: opts.mailer,
    auth: createAuth(opts.db, { secureCookies: opts.config.secureCookies, sessionDays: opts.config.sessionDays }),
    pingDb: opts.pingDb ?? (async () => void (await opts.db.execute(sql`SELECT 1`))),
    log,
  }

  const app = express()
  app.disable('x-powered-by')
  if (process.env.TRUST_PROXY) app.set('trust proxy', process.env.TRUST_PROXY)

  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // PrimeVue injects its theme as <style> elements, so styles need 'unsafe-inline'; scripts never do.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'font-src': ["'self'", 'data:'],
          'upgrade-insecure-requests': opts.config.secureCookies ? [] : null,
        },
      },
      strictTransportSecurity: opts.config.secureCookies,
    }),
  )

  const api = express.Router()
  api.use(express.json({ limit: '2mb' }))
  api.use(requireSameOrigin())
  const session = loadSession(deps.auth)
  // Health must answer while the database is down, so it does not read the session.
  api.use((req, res, next) => (req.path === '/health' ? next() : session(req, res, next)))
  app.use('/api', api)
  app.use(buildApiRouter(opts.routes ?? defaultRoutes, deps))
  app.use('/api', (_req, _res, next) => next(new AppError('not_found', 'No such API route')))

  app.use('/fonts', express.static(FONTS_DIR, { maxAge: '30d', fallthrough: false }))

  if (opts.config.serveClient && existsSync(CLIENT_DIST)) {
    app.use('/assets', express.static(path.join(CLIENT_DIST, 'assets'), { immutable: true, maxAge: '1y', fallthrough: false }))
    app.use(express.static(CLIENT_DIST, { index: false }))
    // Client-side routes: any other GET that wants HTML gets the app shell.
    app.get('/*rest', (req, res, next) => {
      if (!req.accepts('html')) return next()
      res.sendFile(path.join(CLIENT_DIST, 'index.html'))
    })
  }

  app.use((_req, _res, next) => next(new AppError('not_found', 'Not found')))
  app.use(errorHandler(log))
  return { app, deps }
}
