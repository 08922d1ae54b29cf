import { defineStore } from 'pinia'
import { computed, ref } from 'vue'
import type { CurrentUser } from '../../shared/schema/api/auth'
import type { Role } from '../../shared/schema/api/common'
import { api, ApiError, onUnauthenticated } from '../api/client'

/** Who is signed in. `ensureLoaded` asks the server once; route guards await it. */
export const useAuthStore = defineStore('auth', () => {
  const user = ref<CurrentUser | null>(null)
  const loaded = ref(false)
  let pending: Promise<void> | undefined

  const signedIn = computed(() => user.value !== null)
  const hasRole = (...roles: Role[]) => !!user.value && roles.includes(user.value.role)

  function ensureLoaded(): Promise<void> {
    if (loaded.value) return Promise.resolve()
    pending ??= api.auth
      .me()
      .then((u) => void (user.value = u))
      .catch((e: unknown) => {
        if (!(e instanceof ApiError) || e.status !== 401) throw e
        user.value = null
      })
      .finally(() => {
        loaded.value = true
        pending = undefined
      })
    return pending
  }

  async function signIn(email: string, password: string) {
    user.value = await api.auth.signIn(email, password)
    loaded.value = true
  }

  async function signOut() {
    try {
      await api.auth.signOut()
    } catch (e) {
      if (!(e instanceof ApiError) || e.status !== 401) throw e
    }
    user.value = null
  }

  // Any 401 means the session is gone (expired, signed out elsewhere, account disabled).
  onUnauthenticated(() => {
    user.value = null
  })

  return { user, loaded, signedIn, hasRole, ensureLoaded, signIn, signOut }
})
