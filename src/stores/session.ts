// Who is signed in, in which organisation, with which role. The server re-checks every request.
import { acceptHMRUpdate, defineStore } from 'pinia'
import { computed, readonly, ref } from 'vue'
import * as authApi from '@/api/auth'
import { isApiError } from '@/api/http'
import type { AcceptInvitationInput, Session, SignInInput, SignUpInput } from '@shared/api/auth.schemas'
import { can as roleCan, type Action } from '@shared/api/roles'

export const useSessionStore = defineStore('session', () => {
  const me = ref<Session | null>(null)
  const loaded = ref(false)
  let pending: Promise<void> | null = null

  const isSignedIn = computed(() => me.value !== null)
  const role = computed(() => me.value?.role ?? null)

  /** Asks the server once per page load (deduped); later calls reuse the answer. */
  function ensureLoaded(): Promise<void> {
    if (loaded.value) return Promise.resolve()
    pending ??= authApi
      .getSession()
      .then((session) => {
        me.value = session
      })
      .catch((err: unknown) => {
        if (!isApiError(err) || err.status !== 401) throw err
        me.value = null
      })
      .then(() => {
        loaded.value = true
      })
      .finally(() => {
        pending = null
      })
    return pending
  }

  /** Asks again (e.g. after one's own role changed). */
  function refresh(): Promise<void> {
    loaded.value = false
    return ensureLoaded()
  }

  function accept(session: Session): Session {
    me.value = session
    loaded.value = true
    return session
  }

  async function signIn(input: SignInInput) {
    return accept(await authApi.signIn(input))
  }
  async function signUp(input: SignUpInput) {
    return accept(await authApi.signUp(input))
  }
  async function acceptInvitation(input: AcceptInvitationInput) {
    return accept(await authApi.acceptInvitation(input))
  }
  async function signOut(): Promise<void> {
    try {
      await authApi.signOut()
    } finally {
      clear()
    }
  }
  /** Forget the session locally (signed out, or the server said it expired). */
  function clear(): void {
    me.value = null
    loaded.value = true
  }

  function can(action: Action): boolean {
    return role.value !== null && roleCan(role.value, action)
  }

  return { me: readonly(me), loaded: readonly(loaded), isSignedIn, role, ensureLoaded, refresh, signIn, signUp, acceptInvitation, signOut, clear, can }
})

if (import.meta.hot) import.meta.hot.accept(acceptHMRUpdate(useSessionStore, import.meta.hot))
