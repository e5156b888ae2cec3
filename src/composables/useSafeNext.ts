import { computed } from 'vue'
import { useRoute } from 'vue-router'

/** Where to go after signing in: `?next=` when it is a path inside this app, else the projects list. */
export function useSafeNext() {
  const route = useRoute()
  return computed(() => {
    const next = route.query.next
    return typeof next === 'string' && next.startsWith('/') && !next.startsWith('//') ? next : '/projects'
  })
}
