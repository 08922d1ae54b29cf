import { z } from 'zod'
import { revisionParamsSchema } from '../../shared/schema/api/signs'
import { audit } from '../audit'
import { SIGN_EDITORS, loadSign } from '../signs/access'
import { readDocument, signJson } from '../signs/serialize'
import { staleSign, updateSignRow } from '../signs/write'
import { projectStandard, summaryForSave } from '../signs/check'
import { defineRoute } from './define'
import { loadRevision } from './signs-revisions-get'

/** The restore names the sign version the client read, like any edit. */
export const restoreRevisionBodySchema = z.object({ version: z.number().int().min(1) }).strict()

/**
 * Make an earlier revision current again: its document becomes a new revision (history is
 * never rewritten, so a sign-off on any revision stays valid for that revision).
 */
export const restoreRevisionRoute = defineRoute({
  method: 'post',
  path: '/api/signs/:id/revisions/:number/restore',
  access: SIGN_EDITORS,
  summary: 'Restore an earlier revision as a new revision',
  params: revisionParamsSchema,
  body: restoreRevisionBodySchema,
  async handle({ res, deps, user, params, body }) {
    const row = await deps.db.transaction(async (tx) => {
      const { sign, revision } = await loadRevision(tx, user.organisationId, params.id, params.number)
      if (sign.version !== body.version) throw staleSign(body.version, sign)
      const document = readDocument(revision.document)
      const lastCheck = await summaryForSave(tx, user.organisationId, document, await projectStandard(tx, sign.projectId), sign.currentRevision + 1)
      const { revision: number, hash, status } = await updateSignRow(tx, sign, {
        lastCheck,
        organisationId: user.organisationId,
        userId: user.id,
        version: body.version,
        changes: {},
        document,
        restoredFrom: revision.number,
      })
      await audit(tx, { organisationId: user.organisationId, actorUserId: user.id, action: 'sign.restore', subjectType: 'sign', subjectId: sign.id, details: { restoredFrom: revision.number, revision: number, contentHash: hash, ...(status !== sign.status ? { statusFrom: sign.status, statusTo: status } : {}) } })
      if (sign.status === 'signed-off' && status === 'superseded') {
        await audit(tx, { organisationId: user.organisationId, actorUserId: user.id, action: 'sign-off.superseded', subjectType: 'sign', subjectId: sign.id, details: { signedOffRevision: sign.currentRevision, newRevision: number } })
      }
      return loadSign(tx, user.organisationId, sign.id)
    })
    res.json({ sign: signJson(row.sign, row.editorName) })
  },
})
