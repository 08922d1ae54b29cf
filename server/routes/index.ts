import { meRoute } from './auth-me'
import { passwordResetRequestRoute } from './auth-password-reset'
import { setPasswordRoute } from './auth-set-password'
import { signInRoute } from './auth-sign-in'
import { signOutRoute } from './auth-sign-out'
import { tokenInfoRoute } from './auth-token-info'
import type { AnyRoute } from './define'
import { healthRoute } from './health'
import { createProjectRoute } from './projects-create'
import { deleteProjectRoute } from './projects-delete'
import { getProjectRoute } from './projects-get'
import { listProjectsRoute } from './projects-list'
import { updateProjectRoute } from './projects-update'
import { inviteUserRoute } from './users-invite'
import { listUsersRoute } from './users-list'
import { updateUserRoute } from './users-update'

/**
 * Every API route, in one list. Add a route: create `server/routes/<name>.ts` exporting a
 * `defineRoute({...})`, then add it here. tests/api/access.test.ts walks this list, so every
 * non-public route is checked for 401 without a session automatically.
 */
export const routes: readonly AnyRoute[] = [
  healthRoute,
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
  // users (admin)
  listUsersRoute,
  inviteUserRoute,
  updateUserRoute,
]
