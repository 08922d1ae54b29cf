import { defineRoute } from './define'

/** Liveness + database reachability; 503 while MariaDB is away (the process keeps running). */
export const healthRoute = defineRoute({
  method: 'get',
  path: '/api/health',
  access: 'public',
  summary: 'Service and database status',
  async handle({ res, deps }) {
    try {
      await deps.pingDb()
      res.json({ status: 'ok', db: 'ok' })
    } catch {
      res.status(503).json({ status: 'degraded', db: 'down' })
    }
  },
})
