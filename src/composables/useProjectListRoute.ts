// The projects list query lives in the URL (?q=&sort=&page=...), so a reload or a shared link shows
// the same page. The store loads whatever the URL says.
import { computed, watch } from 'vue'
import { useRoute, useRouter, type LocationQueryRaw } from 'vue-router'
import { DEFAULT_LIST_QUERY, useProjectsStore, type ListQuery } from '@/stores/projects'
import { projectListQuerySchema } from '@shared/api/projects.schemas'

function fromUrl(raw: Record<string, unknown>): ListQuery {
  const result = projectListQuerySchema.safeParse(raw)
  if (!result.success) return { ...DEFAULT_LIST_QUERY }
  return { ...DEFAULT_LIST_QUERY, ...result.data, q: result.data.q ?? '' }
}

function toUrl(query: ListQuery): LocationQueryRaw {
  const out: LocationQueryRaw = {}
  for (const key of Object.keys(query) as (keyof ListQuery)[]) {
    if (query[key] !== DEFAULT_LIST_QUERY[key]) out[key] = String(query[key])
  }
  return out
}

export function useProjectListRoute() {
  const route = useRoute()
  const router = useRouter()
  const store = useProjectsStore()
  const query = computed(() => fromUrl(route.query))

  /** Changing what is filtered or how it is sorted goes back to page 1. */
  function update(changes: Partial<ListQuery>): void {
    const resetsPage = ['q', 'archived', 'sort', 'order', 'pageSize'].some(
      (key) => key in changes && changes[key as keyof ListQuery] !== query.value[key as keyof ListQuery],
    )
    const next = { ...query.value, ...changes }
    if (resetsPage) next.page = 1
    void router.replace({ query: toUrl(next) })
  }

  const stop = watch(
    () => route.name === 'projects' && JSON.stringify(query.value),
    (key) => {
      if (key) store.loadList(query.value).catch(() => undefined) // the table shows the error
    },
    { immediate: true },
  )

  return { query, update, stop }
}
