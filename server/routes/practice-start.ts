import { and, eq } from 'drizzle-orm'
import { practiceParamsSchema } from '../../shared/schema/api/lessons'
import { dbErrno, notFound } from '../errors'
import { newId } from '../db/ids'
import { practiceCopies } from '../db/schema/index'
import { lessonCatalogue } from '../lessons/catalogue'
import { copyJson } from '../lessons/records'
import { defineRoute } from './define'

/**
 * Start practising: the caller's own copy of a practice sign, created from the
 * original on first use (201) and returned as it is afterwards (200).
 */
export const startPracticeRoute = defineRoute({
  method: 'post',
  path: '/api/practice/:practiceId/copy',
  access: 'signed-in',
  summary: 'Get or create the caller’s practice copy',
  params: practiceParamsSchema,
  async handle({ res, deps, user, params }) {
    const cat = lessonCatalogue()
    const found = cat.practice(params.practiceId)
    if (!found) throw notFound('Practice sign')
    const existing = async () =>
      (await deps.db.select().from(practiceCopies).where(and(eq(practiceCopies.userId, user.id), eq(practiceCopies.practiceId, params.practiceId))).limit(1))[0]
    let row = await existing()
    let created = false
    if (!row) {
      try {
        await deps.db.insert(practiceCopies).values({
          id: newId(),
          organisationId: user.organisationId,
          userId: user.id,
          practiceId: params.practiceId,
          document: structuredClone(found.practice.document),
        })
        created = true
      } catch (e) {
        // Two tabs starting at once: the unique index keeps one copy; use it.
        if (dbErrno(e) !== 1062) throw e
      }
      row = await existing()
    }
    res.status(created ? 201 : 200).json({ copy: copyJson(row!, cat) })
  },
})
