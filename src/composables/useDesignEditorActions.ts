import type { Ref } from 'vue'
import type { PartType } from '@shared/design/schema'
import { createDemoDesign } from '@shared/design/demo'
import { useDesignEditorStore } from '@/stores/designEditor'
import { align, autoArrange, type AlignMode } from '@/components/editor/model/layout'
import { GRID_PX, nodeGeometry } from '@/components/editor/model/nodeGeometry'
import { cloneClip, copySelection, newPart, type Clip } from '@/components/editor/model/partFactory'

/** What the editor view needs from the canvas component. */
export interface CanvasApi {
  fit: () => void
  centreOnSelection: () => void
  viewportCentre: () => { x: number; y: number }
}

/** Copied parts survive navigation between designs within the page (paste into another design). */
let clipboard: Clip | null = null
const PASTE_OFFSET_PX = 2 * GRID_PX

/** Editing commands shared by the toolbar, the keyboard shortcuts and the side panel. */
export function useDesignEditorActions(canvas: Ref<CanvasApi | null>, snapToGrid: Ref<boolean>) {
  const store = useDesignEditorStore()
  const snap = (v: number) => (snapToGrid.value ? Math.round(v / GRID_PX) * GRID_PX : Math.round(v))
  const editable = () => (store.canEdit && store.design && store.handle ? { design: store.design, mutate: store.handle.mutate } : null)

  function addPart(type: PartType, at?: { x: number; y: number }) {
    const ctx = editable()
    if (!ctx) return
    const centre = at ?? canvas.value?.viewportCentre() ?? { x: 0, y: 0 }
    const draft = newPart(ctx.design, type, { x: 0, y: 0 })
    const { width, height } = nodeGeometry(draft)
    draft.position = { x: snap(centre.x - width / 2), y: snap(centre.y - height / 2) }
    ctx.mutate.addParts([draft])
    store.select({ partIds: [draft.id] })
  }

  function deleteSelection() {
    const ctx = editable()
    if (!ctx) return
    const { partIds, conductorIds } = store.selection
    if (partIds.length + conductorIds.length === 0) return
    ctx.mutate.removeElements(partIds, conductorIds)
    store.select({})
  }

  function copy(): boolean {
    if (!store.design || store.selection.partIds.length === 0) return false
    clipboard = copySelection(store.design, store.selection.partIds)
    return true
  }

  function paste(offset = PASTE_OFFSET_PX) {
    const ctx = editable()
    if (!ctx || !clipboard || clipboard.parts.length === 0) return
    const clone = cloneClip(ctx.design, clipboard, { x: offset, y: offset })
    ctx.mutate.addParts(clone.parts, clone.conductors)
    // The next paste lands one step further on, so repeated pastes do not stack exactly.
    clipboard = { parts: clone.parts, conductors: clone.conductors }
    store.select({ partIds: clone.parts.map((p) => p.id), conductorIds: clone.conductors.map((c) => c.id) })
  }

  function duplicate() {
    const saved = clipboard
    if (copy()) paste()
    clipboard = saved
  }

  function selectAll() {
    if (!store.design) return
    store.select({ partIds: store.design.parts.map((p) => p.id), conductorIds: store.design.conductors.map((c) => c.id) })
  }

  function nudge(dx: number, dy: number) {
    const ctx = editable()
    if (!ctx) return
    const ids = new Set(store.selection.partIds)
    const positions: Record<string, { x: number; y: number }> = {}
    for (const p of ctx.design.parts) if (ids.has(p.id)) positions[p.id] = { x: p.position.x + dx, y: p.position.y + dy }
    if (Object.keys(positions).length) ctx.mutate.moveParts(positions)
  }

  function arrange() {
    const ctx = editable()
    if (!ctx) return
    ctx.mutate.moveParts(autoArrange(ctx.design))
    setTimeout(() => canvas.value?.fit(), 50)
  }

  function alignSelection(mode: AlignMode) {
    const ctx = editable()
    if (!ctx) return
    ctx.mutate.moveParts(align(ctx.design, store.selection.partIds, mode))
  }

  /** Replaces the drawing with the invented demo system (one undoable step). */
  function loadDemo() {
    const ctx = editable()
    if (!ctx) return
    const demo = createDemoDesign()
    ctx.mutate.replaceContent(demo)
    store.scenarioId = demo.scenarios[0]?.id ?? null
    store.select({})
    setTimeout(() => canvas.value?.fit(), 80)
  }

  return {
    addPart,
    deleteSelection,
    copy,
    paste,
    duplicate,
    selectAll,
    nudge,
    arrange,
    alignSelection,
    loadDemo,
    undo: () => store.handle?.undo(),
    redo: () => store.handle?.redo(),
    fit: () => canvas.value?.fit(),
  }
}

export type DesignEditorActions = ReturnType<typeof useDesignEditorActions>
