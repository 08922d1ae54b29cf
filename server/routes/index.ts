import { meRoute } from './auth-me'
import { checkRoute } from './check'
import { passwordResetRequestRoute } from './auth-password-reset'
import { setPasswordRoute } from './auth-set-password'
import { signInRoute } from './auth-sign-in'
import { signOutRoute } from './auth-sign-out'
import { tokenInfoRoute } from './auth-token-info'
import type { AnyRoute } from './define'
import { healthRoute } from './health'
import { lessonRoutes } from './lessons'
import { createProjectRoute } from './projects-create'
import { deleteProjectRoute } from './projects-delete'
import { getProjectRoute } from './projects-get'
import { listProjectsRoute } from './projects-list'
import { updateProjectRoute } from './projects-update'
import { createSignRoute } from './signs-create'
import { deleteSignRoute } from './signs-delete'
import { getSignRoute } from './signs-get'
import { listSignsRoute } from './signs-list'
import { getRevisionRoute } from './signs-revisions-get'
import { listRevisionsRoute } from './signs-revisions-list'
import { restoreRevisionRoute } from './signs-revisions-restore'
import { updateSignRoute } from './signs-update'
import { deleteFontRoute } from './fonts-delete'
import { fontFileRoute } from './fonts-file'
import { listFontsRoute } from './fonts-list'
import { uploadFontRoute } from './fonts-upload'
import { createCommentRoute } from './reviews-comment-create'
import { reviewQueueRoute } from './reviews-queue'
import { returnSignRoute } from './reviews-return'
import { signOffRoute } from './reviews-sign-off'
import { signReviewStateRoute } from './reviews-sign-state'
import { submitForReviewRoute } from './reviews-submit'
import { scheduleExportRoute } from './schedule-export'
import { scheduleImportRoute } from './schedule-import'
import { schedulePreviewRoute } from './schedule-preview'
import { checkRunEventsRoute } from './check-runs-events'
import { getCheckRunRoute } from './check-runs-get'
import { startCheckRunRoute } from './check-runs-start'
import { createProofRoute } from './proofs-create'
import { listProofsRoute } from './proofs-list'
import { answerProofRoute } from './proofs-public-answer'
import { publicProofRoute } from './proofs-public-get'
import { revokeProofRoute } from './proofs-revoke'
import { bulkSubmitRoute } from './signs-submit-bulk'
import { revisionCheckRoute } from './signs-revisions-check'
import { inviteUserRoute } from './users-invite'
import { listUsersRoute } from './users-list'
import { updateUserRoute } from './users-update'
import { resendInvitationRoute } from './users-resend-invitation'
import { projectReportRoute } from './reports-project'
import { signReportRoute } from './reports-sign'

/**
 * Every API route, in one list. Add a route: create `server/routes/<name>.ts` exporting a
 * `defineRoute({...})`, then add it here. tests/api/access.test.ts walks this list, so every
 * non-public route is checked for 401 without a session automatically.
 */
export const routes: readonly AnyRoute[] = [
  healthRoute,
  // rules engine
  checkRoute,
  // auth
  signInRoute,
  signOutRoute,
  meRoute,
  passwordResetRequestRoute,
  tokenInfoRoute,
  setPasswordRoute,
  // projects
  listProjectsRoute,
  createProjectRoute,
  getProjectRoute,
  updateProjectRoute,
  deleteProjectRoute,
  // signs and revisions
  listSignsRoute,
  createSignRoute,
  getSignRoute,
  updateSignRoute,
  deleteSignRoute,
  listRevisionsRoute,
  getRevisionRoute,
  restoreRevisionRoute,
  revisionCheckRoute,
  // schedule CSV
  schedulePreviewRoute,
  scheduleImportRoute,
  scheduleExportRoute,
  // batch check
  startCheckRunRoute,
  getCheckRunRoute,
  checkRunEventsRoute,
  // review and sign-off
  submitForReviewRoute,
  bulkSubmitRoute,
  reviewQueueRoute,
  signReviewStateRoute,
  createCommentRoute,
  returnSignRoute,
  signOffRoute,
  // client proofs
  createProofRoute,
  listProofsRoute,
  revokeProofRoute,
  publicProofRoute,
  answerProofRoute,
  // fonts
  listFontsRoute,
  uploadFontRoute,
  fontFileRoute,
  deleteFontRoute,
  // users (admin)
  listUsersRoute,
  inviteUserRoute,
  updateUserRoute,
  resendInvitationRoute,
  // lessons, practice copies, progress
  ...lessonRoutes,
  // PDF reports
  signReportRoute,
  projectReportRoute,
]
