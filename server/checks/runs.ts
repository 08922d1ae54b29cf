import { EventEmitter } from 'node:events'
import { and, eq, sql } from 'drizzle-orm'
import { parseLayout } from '../../shared/schema/layout'
import type { CheckRun } from '../../shared/schema/api/checkRuns'
import type { StandardId } from '../../shared/standards/types'
import type { Database } from '../db/client'
import { newId } from '../db/ids'
import { signs } from '../db/schema/index'
import { checkDocument, checkSummary } from '../signs/check'

interface RunState extends CheckRun {
  organisationId: string
  events: EventEmitter
  startedMs: number
}

/** Runs by id, kept in this process for an hour after they finish (progress is polled or streamed). */
const runs = new Map<string, RunState>()
const KEEP_MS = 60 * 60 * 1000
const MAX_RUNS = 200

function prune(now = Date.now()) {
  for (const [id, r] of runs) if (r.status !== 'running' && r.finishedAt && now - Date.parse(r.finishedAt) > KEEP_MS) runs.delete(id)
  while (runs.size > MAX_RUNS) {
    const oldest = [...runs.values()].find((r) => r.status !== 'running')
    if (!oldest) break
    runs.delete(oldest.id)
  }
}

/** The public view of a run. */
export function runJson(r: RunState): CheckRun {
  const { organisationId: _o, events: _e, startedMs: _s, ...rest } = r
  return { ...rest, elapsedMs: r.status === 'running' ? Date.now() - r.startedMs : r.elapsedMs, summary: { ...r.summary, errors: [...r.summary.errors] } }
}

/** A run of the organisation, or undefined (another organisation's run is invisible). */
export function getRun(organisationId: string, id: string): RunState | undefined {
  const r = runs.get(id)
  return r && r.organisationId === organisationId ? r : undefined
}

/** The running run of a project, if one is going. */
export function runningRunFor(organisationId: string, projectId: string): RunState | undefined {
  return [...runs.values()].find((r) => r.organisationId === organisationId && r.projectId === projectId && r.status === 'running')
}

/** A check is not an edit: keep `updated_at` as it was (the column's $onUpdate would bump it). */
const KEEP_UPDATED_AT = sql`${signs.updatedAt}`

const yieldToEventLoop = () => new Promise<void>((resolve) => setImmediate(resolve))

/**
 * Start checking every sign of a project against its standard, one sign at a time (yielding to
 * the event loop between signs so the server keeps answering). Each sign's `lastCheck` is stored
 * unless the sign changed meanwhile. Returns at once; progress is read with `getRun`.
 */
export async function startRun(db: Database, args: { organisationId: string; projectId: string; standard: StandardId }): Promise<RunState> {
  prune()
  const list = await db
    .select({ id: signs.id, name: signs.name, revision: signs.currentRevision })
    .from(signs)
    .where(and(eq(signs.organisationId, args.organisationId), eq(signs.projectId, args.projectId)))
  const run: RunState = {
    id: newId(),
    organisationId: args.organisationId,
    projectId: args.projectId,
    standard: args.standard,
    status: 'running',
    total: list.length,
    done: 0,
    startedAt: new Date().toISOString(),
    finishedAt: null,
    summary: { signsFailing: 0, signsAdvisory: 0, signsMeeting: 0, fails: 0, advisory: 0, errors: [] },
    elapsedMs: 0,
    events: new EventEmitter(),
    startedMs: Date.now(),
  }
  run.events.setMaxListeners(50)
  runs.set(run.id, run)
  void (async () => {
    try {
      for (const item of list) {
        await yieldToEventLoop()
        try {
          const [row] = await db.select({ document: signs.document, revision: signs.currentRevision }).from(signs).where(eq(signs.id, item.id)).limit(1)
          if (row) {
            const parsed = parseLayout(row.document)
            if (!parsed.ok) throw new Error(`the stored layout is not valid: ${parsed.issues[0]?.path} ${parsed.issues[0]?.message}`)
            const report = await checkDocument(db, args.organisationId, parsed.doc, args.standard)
            await db.update(signs).set({ lastCheck: checkSummary(report, row.revision), updatedAt: KEEP_UPDATED_AT }).where(and(eq(signs.id, item.id), eq(signs.currentRevision, row.revision)))
            const s = report.summary
            run.summary.fails += s.fails
            run.summary.advisory += s.advisory
            if (s.fails > 0) run.summary.signsFailing++
            else if (s.advisory > 0) run.summary.signsAdvisory++
            else run.summary.signsMeeting++
          }
        } catch (e) {
          run.summary.errors.push({ signId: item.id, name: item.name, reason: (e as Error).message })
        }
        run.done++
        run.events.emit('progress', runJson(run))
      }
      run.status = 'done'
    } catch {
      run.status = 'failed'
    } finally {
      run.finishedAt = new Date().toISOString()
      run.elapsedMs = Date.now() - run.startedMs
      run.events.emit('progress', runJson(run))
      run.events.emit('end', runJson(run))
    }
  })()
  return run
}
