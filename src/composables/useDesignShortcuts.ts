import { onBeforeUnmount, onMounted, type Ref } from 'vue'
import type { DesignEditorActions } from './useDesignEditorActions'
import { GRID_PX } from '@/components/editor/model/nodeGeometry'

/** The editor's keyboard shortcuts; the help dialog lists the same table. */
export const EDITOR_SHORTCUTS: { keys: string; what: string }[] = [
  { keys: 'Ctrl + Z', what: 'Undo' },
  { keys: 'Ctrl + Shift + Z  or  Ctrl + Y', what: 'Redo' },
  { keys: 'Delete  or  Backspace', what: 'Delete the selection' },
  { keys: 'Ctrl + D', what: 'Duplicate the selected parts' },
  { keys: 'Ctrl + C  /  Ctrl + V', what: 'Copy / paste the selected parts and the conductors between them' },
  { keys: 'Ctrl + A', what: 'Select everything' },
  { keys: 'Shift + click  or  Shift + drag', what: 'Add to the selection / select with a box' },
  { keys: 'Arrow keys', what: 'Move the selection one grid step (Shift: four steps)' },
  { keys: 'F', what: 'Fit the drawing to the window' },
  { keys: 'G', what: 'Snap to grid on or off' },
  { keys: 'Escape', what: 'Clear the selection' },
  { keys: '?', what: 'Show this list' },
  { keys: 'Enter (in the parts list)', what: 'Add the focused part in the middle of the view' },
  { keys: 'Drag from a terminal to a terminal', what: 'Draw a conductor' },
  { keys: 'Mouse wheel  /  drag the background', what: 'Zoom  /  pan' },
]

function typingInField(target: EventTarget | null): boolean {
  const el = target as HTMLElement | null
  if (!el) return false
  return el.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(el.tagName) || !!el.closest('[role="listbox"], .v-overlay')
}

export function useDesignShortcuts(actions: DesignEditorActions, options: { showHelp: Ref<boolean>; snapToGrid: Ref<boolean>; clearSelection: () => void }) {
  function onKeydown(event: KeyboardEvent) {
    if (event.defaultPrevented || typingInField(event.target)) return
    const mod = event.ctrlKey || event.metaKey
    const key = event.key.toLowerCase()
    const run = (fn: () => void) => {
      event.preventDefault()
      fn()
    }
    if (mod && key === 'z' && !event.shiftKey) return run(actions.undo)
    if ((mod && key === 'z' && event.shiftKey) || (mod && key === 'y')) return run(actions.redo)
    if (mod && key === 'd') return run(actions.duplicate)
    if (mod && key === 'c') return run(() => void actions.copy())
    if (mod && key === 'v') return run(() => actions.paste())
    if (mod && key === 'a') return run(actions.selectAll)
    if (mod || event.altKey) return
    if (key === 'delete' || key === 'backspace') return run(actions.deleteSelection)
    if (event.key === '?') return run(() => (options.showHelp.value = true))
    if (key === 'f') return run(actions.fit)
    if (key === 'g') return run(() => (options.snapToGrid.value = !options.snapToGrid.value))
    if (key === 'escape') return run(options.clearSelection)
    const step = event.shiftKey ? 4 * GRID_PX : GRID_PX
    if (key === 'arrowleft') return run(() => actions.nudge(-step, 0))
    if (key === 'arrowright') return run(() => actions.nudge(step, 0))
    if (key === 'arrowup') return run(() => actions.nudge(0, -step))
    if (key === 'arrowdown') return run(() => actions.nudge(0, step))
  }
  onMounted(() => window.addEventListener('keydown', onKeydown))
  onBeforeUnmount(() => window.removeEventListener('keydown', onKeydown))
}
