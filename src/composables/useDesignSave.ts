import { onScopeDispose, ref, watch, type Ref } from 'vue'
import type { Design } from '@shared/design/schema'
import { putDesign } from '@/api/designs'
import { isApiError } from '@/api/http'

export type SaveState = 'saved' | 'unsaved' | 'saving' | 'conflict' | 'error' | 'read-only'

/** Quiet time after the last edit before saving. */
const SAVE_DELAY_MS = 800

/**
 * Saves the open design with a debounced PUT carrying the revision it was based on. A 409 stops
 * saving and reports `conflict` (the page offers a reload); other errors retry on the next edit.
 */
export function useDesignSave(options: {
  projectId: string
  design: Readonly<Ref<Design>>
  version: Readonly<Ref<number>>
  initialRevision: number
  canEdit: boolean
}) {
  const state = ref<SaveState>(options.canEdit ? 'saved' : 'read-only')
  const revision = ref(options.initialRevision)
  const lastError = ref<string | null>(null)
  let timer: ReturnType<typeof setTimeout> | undefined
  let saving: Promise<void> | null = null
  let dirtyWhileSaving = false

  async function saveNow(): Promise<void> {
    clearTimeout(timer)
    timer = undefined
    if (state.value === 'conflict' || state.value === 'read-only') return
    if (saving) {
      dirtyWhileSaving = true
      return saving
    }
    state.value = 'saving'
    saving = (async () => {
      try {
        const saved = await putDesign(options.projectId, options.design.value, revision.value)
        revision.value = saved.revision
        lastError.value = null
        state.value = 'saved'
      } catch (error) {
        if (isApiError(error) && error.code === 'conflict') state.value = 'conflict'
        else state.value = 'error'
        lastError.value = error instanceof Error ? error.message : String(error)
      } finally {
        saving = null
      }
      if (dirtyWhileSaving && state.value === 'saved') {
        dirtyWhileSaving = false
        await saveNow()
      }
    })()
    return saving
  }

  watch(options.version, () => {
    if (state.value === 'conflict' || state.value === 'read-only') return
    if (state.value !== 'saving') state.value = 'unsaved'
    else dirtyWhileSaving = true
    clearTimeout(timer)
    timer = setTimeout(() => void saveNow(), SAVE_DELAY_MS)
  })

  const flushOnLeave = () => {
    if (timer !== undefined) void saveNow()
  }
  window.addEventListener('pagehide', flushOnLeave)
  onScopeDispose(() => {
    window.removeEventListener('pagehide', flushOnLeave)
    flushOnLeave()
  })

  return { state, revision, lastError, saveNow }
}
