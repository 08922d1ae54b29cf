import { createRouter, createWebHistory, type RouteRecordRaw } from 'vue-router'
import type { Role } from '../../shared/schema/api/common'
import { useAuthStore } from '../stores/auth'

declare module 'vue-router' {
  interface RouteMeta {
    /** Reachable without signing in. */
    public?: boolean
    /** Only for signed-out visitors (sign-in page): signed-in users go to their projects. */
    guestOnly?: boolean
    /** Roles allowed; absent = any signed-in user. */
    roles?: Role[]
    /** Document title (before " · Touchproof"). */
    title: string
  }
}

/** Every client route; each view is loaded lazily. Add a view: a file in src/views + one entry here. */
export const routes: RouteRecordRaw[] = [
  { path: '/', redirect: '/projects', meta: { title: 'Projects' } },
  { path: '/sign-in', name: 'sign-in', component: () => import('../views/SignInView.vue'), meta: { public: true, guestOnly: true, title: 'Sign in' } },
  { path: '/forgot-password', name: 'forgot-password', component: () => import('../views/ForgotPasswordView.vue'), meta: { public: true, title: 'Forgot password' } },
  { path: '/accept-invitation', name: 'accept-invitation', component: () => import('../views/SetPasswordView.vue'), props: { mode: 'invite' }, meta: { public: true, title: 'Accept invitation' } },
  { path: '/reset-password', name: 'reset-password', component: () => import('../views/SetPasswordView.vue'), props: { mode: 'reset' }, meta: { public: true, title: 'Reset password' } },
  { path: '/projects', name: 'projects', component: () => import('../views/ProjectsView.vue'), meta: { title: 'Projects' } },
  { path: '/projects/:id', name: 'project', component: () => import('../views/ProjectView.vue'), props: true, meta: { title: 'Project' } },
  { path: '/projects/:projectId/signs/:signId/review', name: 'sign-review', component: () => import('../views/SignReviewView.vue'), props: true, meta: { roles: ['admin', 'designer', 'reviewer'], title: 'Review' } },
  { path: '/reviews', name: 'reviews', component: () => import('../views/ReviewQueueView.vue'), meta: { roles: ['admin', 'designer', 'reviewer'], title: 'Reviews' } },
  { path: '/projects/:projectId/signs/:signId', name: 'sign-editor', component: () => import('../views/SignEditorView.vue'), props: true, meta: { roles: ['admin', 'designer'], title: 'Sign editor' } },
  { path: '/admin/users', name: 'users', component: () => import('../views/UsersView.vue'), meta: { roles: ['admin'], title: 'Users' } },
  { path: '/lessons', name: 'lessons', component: () => import('../views/LessonsView.vue'), meta: { title: 'Lessons' } },
  { path: '/lessons/progress', name: 'lesson-progress', component: () => import('../views/TraineeProgressView.vue'), meta: { title: 'Lesson progress' } },
  { path: '/lessons/:id', name: 'lesson', component: () => import('../views/LessonView.vue'), props: true, meta: { title: 'Lesson' } },
  { path: '/practice/:practiceId', name: 'practice', component: () => import('../views/PracticeView.vue'), props: true, meta: { title: 'Practice' } },
  { path: '/proof/:token', name: 'proof', component: () => import('../views/ProofView.vue'), props: true, meta: { public: true, title: 'Proof' } },
  { path: '/forbidden', name: 'forbidden', component: () => import('../views/ForbiddenView.vue'), meta: { title: 'Not allowed' } },
  { path: '/:pathMatch(.*)*', name: 'not-found', component: () => import('../views/NotFoundView.vue'), meta: { public: true, title: 'Page not found' } },
]

export const router = createRouter({ history: createWebHistory(), routes })

router.beforeEach(async (to) => {
  const auth = useAuthStore()
  try {
    await auth.ensureLoaded()
  } catch {
    // Server unreachable: let public pages render; others go to sign-in, which shows the error.
  }
  if (to.meta.guestOnly && auth.signedIn) return { name: 'projects' }
  if (!to.meta.public && !auth.signedIn) return { name: 'sign-in', query: to.fullPath !== '/projects' ? { next: to.fullPath } : {} }
  if (to.meta.roles && !auth.hasRole(...to.meta.roles)) return { name: 'forbidden' }
  return true
})

router.afterEach((to) => {
  document.title = `${to.meta.title} · Touchproof`
})
