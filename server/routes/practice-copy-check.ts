import { eq, sql } from 'drizzle-orm'
import { judgePractice } from '../../shared/lessons/practice'
import { idParamsSchema } from '../../shared/schema/api/common'
import { practiceCopies } from '../db/schema/index'
import { notFound } from '../errors'
import { lessonCatalogue } from '../lessons/catalogue'
import { lessonEngine } from '../lessons/engine'
import { copyJson, loadOwnCopy } from '../lessons/records'
import { defineRoute } from './define'

/**
 * "Check my fix": the server runs the engine on the stored copy and says which
 * planted faults remain and whether anything else now fails, by name and section
 * only. The first solved check stamps `solvedAt`.
 */
export const checkPracticeCopyRoute = defineRoute({
  method: 'post',
  path: '/api/practice-copies/:id/check',
  access: 'signed-in',
  summary: 'Check the caller’s practice copy',
  params: idParamsSchema,
  async handle({ res, deps, user, params }) {
    const cat = lessonCatalogue()
    const row = await loadOwnCopy(deps.db, user.id, params.id)
    const found = cat.practice(row.practiceId)
    if (!found) throw notFound('Practice sign')
    const engine = await lessonEngine()
    const verdict = judgePractice(found.practice, engine.check(row.document, found.practice.standard))
    const now = new Date()
    await deps.db
      .update(practiceCopies)
      .set({
        checks: sql`${practiceCopies.checks} + 1`,
        lastVerdict: verdict,
        lastCheckedAt: now,
        // COALESCE keeps the first solve time.
        ...(verdict.solved ? { solvedAt: sql`COALESCE(${practiceCopies.solvedAt}, ${now})` } : {}),
        // A check is not an edit: keep updated_at (and the version) as they were.
        updatedAt: row.updatedAt,
      })
      .where(eq(practiceCopies.id, row.id))
    res.json({ verdict, copy: copyJson(await loadOwnCopy(deps.db, user.id, params.id), cat) })
  },
})
