import { eq } from 'drizzle-orm'
import { STANDARD_LABELS } from '../../shared/schema/api/projects'
import { APP_LINKS, JUSTIFICATION_MIN_LENGTH, signOffBodySchema } from '../../shared/schema/api/reviews'
import { signParamsSchema } from '../../shared/schema/api/signs'
import { audit } from '../audit'
import { newId } from '../db/ids'
import { projects, signReviews, signSignoffs, signs } from '../db/schema/index'
import { AppError, conflict, forbidden } from '../errors'
import { signedOffMail } from '../mail/review-mails'
import { openReview, revisionRow } from '../reviews/load'
import { activeUsers, appLink, sendAll } from '../reviews/notify'
import { signoffJson } from '../reviews/serialize'
import { loadSign } from '../signs/access'
import { checkDocument, checkSummary } from '../signs/check'
import { signJson } from '../signs/serialize'
import { staleSign, updateSignRow } from '../signs/write'
import { defineRoute } from './define'
import { SIGN_REVIEWERS } from './reviews-return'

/**
 * Sign off the revision in review. The server checks that revision against the project's
 * standard; a check with failing findings needs a written justification. Nobody signs off a
 * revision they wrote or submitted (403). The sign-off stores the content hash, standard,
 * engine version and the findings, and is never changed afterwards.
 */
export const signOffRoute = defineRoute({
  method: 'post',
  path: '/api/signs/:id/sign-off',
  access: SIGN_REVIEWERS,
  summary: 'Sign off the revision in review',
  params: signParamsSchema,
  body: signOffBodySchema,
  async handle({ res, deps, user, params, body }) {
    const result = await deps.db.transaction(async (tx) => {
      const { sign } = await loadSign(tx, user.organisationId, params.id)
      if (sign.version !== body.version) throw staleSign(body.version, sign)
      const review = await openReview(tx, user.organisationId, sign.id)
      if (sign.status !== 'in-review' || !review || review.revision !== sign.currentRevision) throw conflict('The sign is not in review', { status: sign.status })
      const rev = await revisionRow(tx, sign.id, review.revision)
      if (!rev) throw conflict('The revision in review no longer exists')
      if (rev.authorId === user.id || review.submittedBy === user.id) throw forbidden('You cannot sign off a revision you wrote or submitted: another reviewer must sign it off')
      const [project] = await tx.select().from(projects).where(eq(projects.id, sign.projectId))
      const report = await checkDocument(tx, user.organisationId, rev.document, project!.standardId)
      const justification = body.justification?.trim() || null
      if (report.summary.fails > 0 && (!justification || justification.length < JUSTIFICATION_MIN_LENGTH)) {
        throw new AppError('validation_failed', `Revision ${rev.number} has ${report.summary.fails} failing finding${report.summary.fails === 1 ? '' : 's'}: a written justification of at least ${JUSTIFICATION_MIN_LENGTH} characters is required to sign it off`, {
          location: 'body',
          issues: [{ path: 'justification', message: `required (at least ${JUSTIFICATION_MIN_LENGTH} characters) because the check fails ${report.summary.fails} finding${report.summary.fails === 1 ? '' : 's'}` }],
          fails: report.findings.filter((f) => f.status === 'fails').map((f) => ({ section: f.section, rule: f.rule, message: f.message })),
        })
      }
      const id = newId()
      await updateSignRow(tx, sign, { organisationId: user.organisationId, userId: user.id, version: body.version, changes: { status: 'signed-off' }, statusOnly: true })
      await tx.update(signs).set({ lastCheck: checkSummary(report, rev.number) }).where(eq(signs.id, sign.id))
      await tx.insert(signSignoffs).values({
        id,
        organisationId: user.organisationId,
        signId: sign.id,
        reviewId: review.id,
        revision: rev.number,
        contentHash: rev.contentHash,
        standardId: report.standard,
        engineVersion: report.engineVersion,
        report,
        fails: report.summary.fails,
        advisory: report.summary.advisory,
        justification,
        reviewerId: user.id,
        reviewerName: user.displayName,
      })
      await tx.update(signReviews).set({ state: 'signed-off', closedBy: user.id, closedAt: new Date(), decisionNote: justification }).where(eq(signReviews.id, review.id))
      await audit(tx, {
        organisationId: user.organisationId,
        actorUserId: user.id,
        action: 'sign.sign-off',
        subjectType: 'sign',
        subjectId: sign.id,
        details: { signoffId: id, reviewId: review.id, revision: rev.number, contentHash: rev.contentHash, standard: report.standard, engineVersion: report.engineVersion, fails: report.summary.fails, justified: !!justification },
      })
      const [signoff] = await tx.select().from(signSignoffs).where(eq(signSignoffs.id, id))
      return { row: await loadSign(tx, user.organisationId, sign.id), review, project: project!, signoff: signoff! }
    })
    const recipients = await activeUsers(deps, user.organisationId, [result.review.submittedBy, result.row.sign.lastEditorId])
    const link = appLink(deps, APP_LINKS.signEditor(result.row.sign.projectId, result.row.sign.id))
    await sendAll(
      deps,
      recipients
        .filter((r) => r.id !== user.id)
        .map((r) =>
          signedOffMail({
            to: r.email,
            designerName: r.displayName,
            reviewerName: user.displayName,
            signName: result.row.sign.name,
            projectName: result.project.name,
            revision: result.signoff.revision,
            standard: STANDARD_LABELS[result.project.standardId],
            fails: result.signoff.fails,
            justification: result.signoff.justification,
            link,
          }),
        ),
    )
    res.json({ sign: signJson(result.row.sign, result.row.editorName), signoff: signoffJson(result.signoff, result.row.sign.currentRevision) })
  },
})
