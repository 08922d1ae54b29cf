import { and, eq, sql } from 'drizzle-orm'
import { idParamsSchema } from '../../shared/schema/api/common'
import { z } from 'zod'
import { practiceCopies } from '../db/schema/index'
import { conflict, notFound } from '../errors'
import { lessonCatalogue } from '../lessons/catalogue'
import { copyJson, loadOwnCopy } from '../lessons/records'
import { defineRoute } from './define'

/** Start over: put the original practice document back (solved marks stay in progress). */
export const restartPracticeCopyRoute = defineRoute({
  method: 'post',
  path: '/api/practice-copies/:id/restart',
  access: 'signed-in',
  summary: 'Reset the caller’s practice copy to the original',
  params: idParamsSchema,
  body: z.object({ version: z.number().int().min(1) }),
  async handle({ res, deps, user, params, body }) {
    const cat = lessonCatalogue()
    const row = await loadOwnCopy(deps.db, user.id, params.id)
    const found = cat.practice(row.practiceId)
    if (!found) throw notFound('Practice sign')
    const result = await deps.db
      .update(practiceCopies)
      .set({ document: structuredClone(found.practice.document), lastVerdict: null, version: sql`${practiceCopies.version} + 1` })
      .where(and(eq(practiceCopies.id, row.id), eq(practiceCopies.version, body.version)))
    if (result[0].affectedRows !== 1) throw conflict('The practice copy changed in another window; reload and try again', { currentVersion: row.version })
    res.json({ copy: copyJson(await loadOwnCopy(deps.db, user.id, params.id), cat) })
  },
})
