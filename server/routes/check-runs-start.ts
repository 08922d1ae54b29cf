import { idParamsSchema } from '../../shared/schema/api/common'
import { audit } from '../audit'
import { runJson, runningRunFor, startRun } from '../checks/runs'
import { SIGN_READERS } from '../signs/access'
import { defineRoute } from './define'
import { loadProject } from './projects-get'

/**
 * Start a batch check of every sign of a project on the server (202 with the run; poll
 * GET /api/check-runs/:id or stream /events). A run already going for the project is returned
 * instead of starting a second one (200).
 */
export const startCheckRunRoute = defineRoute({
  method: 'post',
  path: '/api/projects/:id/check-runs',
  access: SIGN_READERS,
  summary: 'Batch-check every sign of a project',
  params: idParamsSchema,
  async handle({ res, deps, user, params }) {
    const project = await loadProject(deps.db, user.organisationId, params.id)
    const going = runningRunFor(user.organisationId, project.id)
    if (going) {
      res.status(200).json({ run: runJson(going) })
      return
    }
    const run = await startRun(deps.db, { organisationId: user.organisationId, projectId: project.id, standard: project.standardId })
    await audit(deps.db, { organisationId: user.organisationId, actorUserId: user.id, action: 'project.batch-check', subjectType: 'project', subjectId: project.id, details: { runId: run.id, signs: run.total, standard: project.standardId } })
    res.status(202).location(`/api/check-runs/${run.id}`).json({ run: runJson(run) })
  },
})
