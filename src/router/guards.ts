// Auth and role guards, and what happens when the server says the session expired.
import type { Router } from 'vue-router'
import { setForbiddenHandler, setUnauthenticatedHandler } from '@/api/http'
import { useNotifyStore } from '@/stores/notify'
import { useSessionStore } from '@/stores/session'
import { ROLE_LABELS } from '@shared/api/roles'
import './meta'

export function installGuards(router: Router): void {
  router.beforeEach(async (to) => {
    const session = useSessionStore()
    try {
      await session.ensureLoaded()
    } catch (err) {
      useNotifyStore().error(err)
    }
    if (to.meta.public) {
      if (to.meta.guestOnly && session.isSignedIn) return { name: 'projects' }
      return true
    }
    if (!session.isSignedIn) return { name: 'sign-in', query: { next: to.fullPath } }
    if (to.meta.action && !session.can(to.meta.action)) {
      const role = session.role ? ROLE_LABELS[session.role] : 'current'
      useNotifyStore().warning(`Your role (${role}) cannot open that page.`)
      return { name: 'projects' }
    }
    return true
  })

  router.afterEach((to) => {
    document.title = to.meta.title ? `${to.meta.title} · Ampwright` : 'Ampwright'
  })

  // Any 401 from the API while signed in means the session expired (or was revoked).
  setUnauthenticatedHandler(() => {
    const session = useSessionStore()
    if (!session.isSignedIn) return
    session.clear()
    useNotifyStore().warning('Your session has expired. Sign in again to continue.')
    const current = router.currentRoute.value
    if (!current.meta.public) void router.push({ name: 'sign-in', query: { next: current.fullPath } })
  })

  // The role is read from the database on every request: a 403 may mean it changed, so menus follow.
  setForbiddenHandler(() => {
    const session = useSessionStore()
    if (!session.isSignedIn) return
    session
      .refresh()
      .then(() => {
        const action = router.currentRoute.value.meta.action
        if (action && session.isSignedIn && !session.can(action)) void router.push({ name: 'projects' })
      })
      .catch(() => undefined)
  })
}
