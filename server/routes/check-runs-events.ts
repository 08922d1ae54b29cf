import type { CheckRun } from '../../shared/schema/api/checkRuns'
import { idParamsSchema } from '../../shared/schema/api/common'
import { getRun, runJson } from '../checks/runs'
import { notFound } from '../errors'
import { SIGN_READERS } from '../signs/access'
import { defineRoute } from './define'

/**
 * Batch check progress as server-sent events: a `progress` event with the run after every sign
 * and an `end` event when it finishes; the stream then closes.
 */
export const checkRunEventsRoute = defineRoute({
  method: 'get',
  path: '/api/check-runs/:id/events',
  access: SIGN_READERS,
  summary: 'Batch check progress (server-sent events)',
  params: idParamsSchema,
  async handle({ req, res, user, params }) {
    const run = getRun(user.organisationId, params.id)
    if (!run) throw notFound('Check run')
    res.status(200).set({ 'Content-Type': 'text/event-stream; charset=utf-8', 'Cache-Control': 'no-cache, no-transform', Connection: 'keep-alive', 'X-Accel-Buffering': 'no' })
    res.flushHeaders()
    const send = (event: string, data: CheckRun) => res.write(`event: ${event}\ndata: ${JSON.stringify(data)}\n\n`)
    send('progress', runJson(run))
    if (run.status !== 'running') {
      send('end', runJson(run))
      res.end()
      return
    }
    const onProgress = (r: CheckRun) => send('progress', r)
    const onEnd = (r: CheckRun) => {
      send('end', r)
      cleanup()
      res.end()
    }
    const cleanup = () => {
      run.events.off('progress', onProgress)
      run.events.off('end', onEnd)
    }
    run.events.on('progress', onProgress)
    run.events.on('end', onEnd)
    req.on('close', cleanup)
  },
})
