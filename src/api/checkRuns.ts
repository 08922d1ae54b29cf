/** Batch check of a project on the server, with progress (server-sent events, polling as fallback). */
import { checkRunResponseSchema, checkRunSchema, type CheckRun } from '../../shared/schema/api/checkRuns'
import { request } from './client'

const enc = encodeURIComponent

export const checkRunsApi = {
  /** Start (or join the running) batch check of a project. */
  start: async (projectId: string): Promise<CheckRun> => (await request('POST', `/api/projects/${enc(projectId)}/check-runs`, { schema: checkRunResponseSchema })).run,
  get: async (runId: string): Promise<CheckRun> => (await request('GET', `/api/check-runs/${enc(runId)}`, { schema: checkRunResponseSchema })).run,
  /**
   * Follow a run until it ends, calling `onProgress` with each update. Uses the event stream;
   * if the stream fails, polls every 500 ms instead. Resolves with the final run.
   */
  follow(runId: string, onProgress: (run: CheckRun) => void, signal?: AbortSignal): Promise<CheckRun> {
    return new Promise((resolve, reject) => {
      let settled = false
      const finish = (run: CheckRun) => {
        if (settled) return
        settled = true
        onProgress(run)
        resolve(run)
      }
      const poll = async () => {
        try {
          while (!settled && !signal?.aborted) {
            const run = await checkRunsApi.get(runId)
            if (run.status !== 'running') return finish(run)
            onProgress(run)
            await new Promise((r) => setTimeout(r, 500))
          }
        } catch (e) {
          if (!settled) reject(e)
        }
      }
      if (typeof EventSource === 'undefined') return void poll()
      const es = new EventSource(`/api/check-runs/${enc(runId)}/events`, { withCredentials: true })
      const parse = (ev: MessageEvent) => checkRunSchema.safeParse(JSON.parse(ev.data))
      es.addEventListener('progress', (ev) => {
        const p = parse(ev as MessageEvent)
        if (p.success) onProgress(p.data)
      })
      es.addEventListener('end', (ev) => {
        es.close()
        const p = parse(ev as MessageEvent)
        if (p.success) finish(p.data)
        else void poll()
      })
      es.onerror = () => {
        es.close()
        if (!settled) void poll()
      }
      signal?.addEventListener('abort', () => es.close())
    })
  },
}
