import { idParamsSchema } from '../../shared/schema/api/common'
import { createSignBodySchema } from '../../shared/schema/api/signs'
import { audit } from '../audit'
import { newId } from '../db/ids'
import { signs } from '../db/schema/index'
import { SIGN_EDITORS, loadSign } from '../signs/access'
import { signJson } from '../signs/serialize'
import { buildSignLayout, fillMissingBraille } from '../signs/templates'
import { getTranslator } from '../signs/translator'
import { insertRevision, limitLayoutBody } from '../signs/write'
import { summaryForSave } from '../signs/check'
import { defineRoute } from './define'
import { loadProject } from './projects-get'

export { createSignBodySchema }

/**
 * New sign in a project: from the sign type's template (or the one named) with the given words,
 * or from a full layout document. Braille cells are filled in on the server. Revision 1 is
 * written with it.
 */
export const createSignRoute = defineRoute({
  method: 'post',
  path: '/api/projects/:id/signs',
  access: SIGN_EDITORS,
  summary: 'Create a sign from a template or a layout document',
  params: idParamsSchema,
  body: createSignBodySchema,
  before: limitLayoutBody,
  async handle({ res, deps, user, params, body }) {
    const project = await loadProject(deps.db, user.organisationId, params.id)
    let document = body.document
      ? fillMissingBraille(body.document, await getTranslator())
      : await buildSignLayout({ signType: body.signType, templateId: body.templateId, text: body.text, pictogramId: body.pictogramId, units: project.unitSystem, name: body.name })
    document = { ...document, installation: { ...document.installation, signType: body.signType } }
    if (!document.name) document.name = body.name
    const lastCheck = await summaryForSave(deps.db, user.organisationId, document, project.standardId, 1)
    const id = newId()
    const row = await deps.db.transaction(async (tx) => {
      await tx.insert(signs).values({
        id,
        organisationId: user.organisationId,
        projectId: project.id,
        name: body.name,
        signType: body.signType,
        status: 'draft',
        document,
        currentRevision: 1,
        schedule: body.schedule ?? null,
        lastCheck,
        lastEditorId: user.id,
      })
      const hash = await insertRevision(tx, { signId: id, number: 1, document, authorId: user.id })
      await audit(tx, {
        organisationId: user.organisationId,
        actorUserId: user.id,
        action: 'sign.create',
        subjectType: 'sign',
        subjectId: id,
        details: { projectId: project.id, name: body.name, signType: body.signType, from: body.document ? 'document' : (body.templateId ?? body.signType), contentHash: hash },
      })
      return loadSign(tx, user.organisationId, id)
    })
    res.status(201).location(`/api/signs/${id}`).json({ sign: signJson(row.sign, row.editorName) })
  },
})
