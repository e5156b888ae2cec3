// The open design: its Y.Doc handle, live analysis, save state and what is selected. One design is
// open at a time; `open` starts an effect scope for it and `close` ends it (worker, timers, doc).
import { acceptHMRUpdate, defineStore } from 'pinia'
import { computed, effectScope, markRaw, ref, shallowRef, watch, type EffectScope } from 'vue'
import type { Design } from '@shared/design/schema'
import { useDesignDoc, type DesignDocHandle } from '@/composables/useDesignDoc'
import { useDesignAnalysis, type DesignAnalysis } from '@/composables/useDesignAnalysis'
import { useDesignSave } from '@/composables/useDesignSave'
import type { CollabConnection } from '@/composables/useCollabProvider'
import type { AnalysisResult, Finding } from '@/components/editor/model/analysisTypes'
import { indexAnalysis, type AnalysisIndex } from '@/components/editor/model/analysisIndex'
import { createCanvasMarks, updateCanvasMarks } from '@/components/editor/model/canvasMarks'

export interface OpenDesignOptions {
  design: Design
  projectId: string | null
  revision: number
  canEdit: boolean
  /** Off in component tests (no Worker); on in the app. */
  analyze?: boolean
  save?: boolean
  /** A live connection whose synced Y.Doc holds the design; HTTP saving is then off. */
  collab?: CollabConnection | null
}

export interface Selection {
  partIds: string[]
  conductorIds: string[]
}

type SaveApi = ReturnType<typeof useDesignSave>

export const useDesignEditorStore = defineStore('designEditor', () => {
  const handle = shallowRef<DesignDocHandle | null>(null)
  const analysis = shallowRef<DesignAnalysis | null>(null)
  const saver = shallowRef<SaveApi | null>(null)
  const collab = shallowRef<CollabConnection | null>(null)
  const canEdit = ref(false)
  const projectId = ref<string | null>(null)
  const selection = ref<Selection>({ partIds: [], conductorIds: [] })
  const scenarioId = ref<string | null>(null)
  /** Bumps when something asks the canvas to centre on the selection. */
  const focusRequest = ref(0)
  let scope: EffectScope | null = null

  function open(options: OpenDesignOptions): void {
    close()
    scope = effectScope(true)
    scope.run(() => {
      const doc = useDesignDoc(options.collab ? { doc: options.collab.doc } : options.design)
      handle.value = markRaw(doc)
      collab.value = options.collab ? markRaw(options.collab) : null
      if (options.analyze !== false) analysis.value = markRaw(useDesignAnalysis(doc.design, doc.electricalVersion))
      if (options.save !== false && options.projectId && !options.collab) {
        saver.value = markRaw(
          useDesignSave({
            projectId: options.projectId,
            design: doc.design,
            version: doc.version,
            initialRevision: options.revision,
            canEdit: options.canEdit,
          }),
        )
      }
    })
    canEdit.value = options.canEdit
    projectId.value = options.projectId
    scenarioId.value = (handle.value?.design.value ?? options.design).scenarios[0]?.id ?? null
    selection.value = { partIds: [], conductorIds: [] }
  }

  function close(): void {
    scope?.stop()
    scope = null
    collab.value?.destroy()
    collab.value = null
    handle.value?.dispose()
    handle.value = null
    analysis.value = null
    saver.value = null
  }

  const design = computed<Design | null>(() => handle.value?.design.value ?? null)
  const result = computed<AnalysisResult | null>(() => analysis.value?.result.value ?? null)
  const index = computed<AnalysisIndex>(() => indexAnalysis(result.value, scenarioId.value))
  /** Per-id view of `index` for the canvas: only the entries that changed trigger a re-render. */
  const marks = markRaw(createCanvasMarks())
  watch(index, (next) => updateCanvasMarks(marks, next), { immediate: true })
  const findings = computed<Finding[]>(() => result.value?.findings ?? [])
  // Live: the server stores each update as it arrives, so "saved" follows the connection.
  const saveState = computed(() => {
    if (!canEdit.value) return 'read-only'
    if (collab.value) return collab.value.status.value === 'live' ? 'saved' : 'unsaved'
    return saver.value?.state.value ?? 'saved'
  })

  function select(next: Partial<Selection>, options: { focus?: boolean } = {}): void {
    selection.value = { partIds: next.partIds ?? [], conductorIds: next.conductorIds ?? [] }
    if (options.focus) focusRequest.value++
    collab.value?.setSelection([...selection.value.partIds, ...selection.value.conductorIds])
  }

  return {
    handle,
    analysis,
    saver,
    collab,
    canEdit,
    projectId,
    selection,
    scenarioId,
    focusRequest,
    design,
    result,
    index,
    marks,
    findings,
    saveState,
    open,
    close,
    select,
  }
})

if (import.meta.hot) import.meta.hot.accept(acceptHMRUpdate(useDesignEditorStore, import.meta.hot))
