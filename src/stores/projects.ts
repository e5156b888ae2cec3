// Projects of the organisation: the current list page and every project seen, by id.
import { acceptHMRUpdate, defineStore } from 'pinia'
import { computed, readonly, ref } from 'vue'
import * as projectsApi from '@/api/projects'
import { useDelayedFlag } from '@/composables/useDelayedFlag'
import type { Project, ProjectInput, ProjectUpdate, projectListQuerySchema } from '@shared/api/projects.schemas'
import type { z } from 'zod'

/** A complete list query (every default filled in). */
export type ListQuery = Omit<z.output<typeof projectListQuerySchema>, 'q'> & { q: string }
export const DEFAULT_LIST_QUERY: ListQuery = {
  q: '',
  sort: 'updatedAt',
  order: 'desc',
  page: 1,
  pageSize: 20,
  archived: 'exclude',
}

export const useProjectsStore = defineStore('projects', () => {
  const byId = ref<Record<string, Project>>({})
  const query = ref<ListQuery>({ ...DEFAULT_LIST_QUERY })
  const pageIds = ref<string[]>([])
  const total = ref(0)
  const listLoaded = ref(false)
  const listError = ref<unknown>(null)
  const loading = useDelayedFlag()

  let inFlight: { key: string; promise: Promise<void>; controller: AbortController } | null = null
  const oneInFlight = new Map<string, Promise<Project>>()

  const page = computed(() => pageIds.value.map((id) => byId.value[id]).filter((p): p is Project => !!p))

  function remember(project: Project): Project {
    byId.value[project.id] = project
    return project
  }

  /** Loads the list for `changes` merged into the current query; the same query in flight is shared. */
  function loadList(changes: Partial<ListQuery> = {}): Promise<void> {
    query.value = { ...query.value, ...changes }
    const key = JSON.stringify(query.value)
    if (inFlight?.key === key) return inFlight.promise
    inFlight?.controller.abort() // an older query's answer would be stale
    const controller = new AbortController()
    loading.start()
    const promise = projectsApi
      .listProjects(query.value, controller.signal)
      .then((result) => {
        result.items.forEach(remember)
        pageIds.value = result.items.map((p) => p.id)
        total.value = result.total
        listError.value = null
        listLoaded.value = true
      })
      .catch((err: unknown) => {
        if (controller.signal.aborted) return
        listError.value = err
        throw err
      })
      .finally(() => {
        loading.stop()
        if (inFlight?.promise === promise) inFlight = null
      })
    inFlight = { key, promise, controller }
    return promise
  }

  const refreshList = () => loadList()
  /** After a change: reload the list page only if one was shown (a later visit loads it anyway). */
  const refreshIfShown = () => {
    if (listLoaded.value) void refreshList().catch(() => undefined)
  }

  /** One project, from the server (deduped while in flight). */
  function fetchOne(id: string): Promise<Project> {
    const existing = oneInFlight.get(id)
    if (existing) return existing
    const promise = projectsApi
      .getProject(id)
      .then(remember)
      .finally(() => oneInFlight.delete(id))
    oneInFlight.set(id, promise)
    return promise
  }

  async function create(input: ProjectInput): Promise<Project> {
    const project = remember(await projectsApi.createProject(input))
    refreshIfShown()
    return project
  }
  async function update(id: string, changes: ProjectUpdate): Promise<Project> {
    const project = remember(await projectsApi.updateProject(id, changes))
    refreshIfShown()
    return project
  }
  async function duplicate(id: string): Promise<Project> {
    const project = remember(await projectsApi.duplicateProject(id))
    refreshIfShown()
    return project
  }
  async function createDemo(): Promise<Project> {
    const project = remember(await projectsApi.createDemoProject())
    refreshIfShown()
    return project
  }
  async function remove(id: string): Promise<void> {
    await projectsApi.deleteProject(id)
    delete byId.value[id]
    refreshIfShown()
  }

  return {
    byId: readonly(byId),
    query: readonly(query),
    page,
    total: readonly(total),
    listLoaded: readonly(listLoaded),
    listError: readonly(listError),
    isLoading: loading.flag,
    loadList,
    refreshList,
    fetchOne,
    create,
    update,
    duplicate,
    createDemo,
    remove,
  }
})

if (import.meta.hot) import.meta.hot.accept(acceptHMRUpdate(useProjectsStore, import.meta.hot))
