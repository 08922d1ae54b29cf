import { idParamsSchema } from '../../shared/schema/api/common'
import { parseSchedule } from '../../shared/schedule/index'
import { existingSignNames } from '../schedule/build'
import { receiveScheduleFile, scheduleText } from '../schedule/upload'
import { SIGN_EDITORS } from '../signs/access'
import { defineRoute } from './define'
import { loadProject } from './projects-get'

/**
 * Preview a sign schedule CSV: the rows it would create and every problem by row, column and
 * reason. Writes nothing; always 200 when the file itself could be read.
 */
export const schedulePreviewRoute = defineRoute({
  method: 'post',
  path: '/api/projects/:id/schedule/preview',
  access: SIGN_EDITORS,
  summary: 'Preview a schedule CSV (row-level errors, nothing written)',
  params: idParamsSchema,
  before: receiveScheduleFile,
  async handle({ req, res, deps, user, params }) {
    const project = await loadProject(deps.db, user.organisationId, params.id)
    const text = scheduleText(req.file)
    const result = parseSchedule(text, project.unitSystem, await existingSignNames(deps.db, user.organisationId, project.id))
    res.json({ ...result, valid: result.errors.length === 0 })
  },
})
