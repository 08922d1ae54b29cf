import { idParamsSchema } from '../../shared/schema/api/common'
import { lessonCatalogue } from '../lessons/catalogue'
import { copyJson, loadOwnCopy } from '../lessons/records'
import { defineRoute } from './define'

/** One of the caller's practice copies (404 for anybody else's). */
export const getPracticeCopyRoute = defineRoute({
  method: 'get',
  path: '/api/practice-copies/:id',
  access: 'signed-in',
  summary: 'The caller’s practice copy',
  params: idParamsSchema,
  async handle({ res, deps, user, params }) {
    res.json({ copy: copyJson(await loadOwnCopy(deps.db, user.id, params.id), lessonCatalogue()) })
  },
})
