import { contentHash } from '../../shared/canonical/index'
import { signParamsSchema, updateSignBodySchema } from '../../shared/schema/api/signs'
import { audit } from '../audit'
import { SIGN_EDITORS, loadSign } from '../signs/access'
import { signJson } from '../signs/serialize'
import { limitLayoutBody, staleSign, updateSignRow } from '../signs/write'
import { projectStandard, summaryForSave } from '../signs/check'
import { defineRoute } from './define'

export { updateSignBodySchema }

/**
 * Edit a sign's name, type or layout. The body names the version it was read at: a stale one is
 * a 409 (details: currentVersion, currentRevision) and nothing changes. A changed document writes
 * a new revision; an identical one (same content hash) does not.
 */
export const updateSignRoute = defineRoute({
  method: 'patch',
  path: '/api/signs/:id',
  access: SIGN_EDITORS,
  summary: 'Edit a sign (optimistic concurrency by version; a changed layout makes a revision)',
  params: signParamsSchema,
  body: updateSignBodySchema,
  before: limitLayoutBody,
  async handle({ res, deps, user, params, body }) {
    const { version, document, ...changes } = body
    const row = await deps.db.transaction(async (tx) => {
      const { sign: current } = await loadSign(tx, user.organisationId, params.id)
      if (current.version !== version) throw staleSign(version, current)
      // The sign's type and its document's installation type are one fact: keep them equal.
      const signType = changes.signType ?? document?.installation.signType ?? current.signType
      changes.signType = signType
      const base = document ?? (signType !== current.document.installation.signType ? current.document : undefined)
      const next = base && { ...base, installation: { ...base.installation, signType } }
      const changedDocument = next && contentHash(next) !== contentHash(current.document) ? next : undefined
      const changedFields = Object.fromEntries(Object.entries(changes).filter(([k, v]) => v !== undefined && v !== current[k as keyof typeof current]))
      if (!changedDocument && Object.keys(changedFields).length === 0) return null
      const lastCheck = changedDocument ? await summaryForSave(tx, user.organisationId, changedDocument, await projectStandard(tx, current.projectId), current.currentRevision + 1) : undefined
      const { revision, hash, status } = await updateSignRow(tx, current, { organisationId: user.organisationId, userId: user.id, version, changes: changedFields, document: changedDocument, lastCheck })
      await audit(tx, {
        organisationId: user.organisationId,
        actorUserId: user.id,
        action: 'sign.update',
        subjectType: 'sign',
        subjectId: current.id,
        details: { fromVersion: version, changes: changedFields, ...(revision ? { revision, contentHash: hash } : {}), ...(status !== current.status ? { statusFrom: current.status, statusTo: status } : {}) },
      })
      if (current.status === 'signed-off' && status === 'superseded') {
        await audit(tx, { organisationId: user.organisationId, actorUserId: user.id, action: 'sign-off.superseded', subjectType: 'sign', subjectId: current.id, details: { signedOffRevision: current.currentRevision, newRevision: revision } })
      }
      return loadSign(tx, user.organisationId, params.id)
    })
    const result = row ?? (await loadSign(deps.db, user.organisationId, params.id))
    res.json({ sign: signJson(result.sign, result.editorName) })
  },
})
