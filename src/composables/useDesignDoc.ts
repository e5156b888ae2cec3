import * as Y from 'yjs'
import { computed, shallowRef, ref, type Ref, type ShallowRef } from 'vue'
import type { Design } from '@shared/design/schema'
import {
  LOCAL_ORIGIN,
  createDesignMutations,
  isLayoutOnlyChange,
  writeDesignToDoc,
  type DesignMutations,
} from '@shared/collab/designYDoc'
import { createDesignReader } from './designDocReader'

export interface DesignDocHandle {
  doc: Y.Doc
  /** Plain snapshot of the document, replaced after every transaction; parts, conductors and
   * sections the transaction did not touch keep their objects from the previous snapshot. */
  design: ShallowRef<Design>
  /** Bumps on every change that can affect the electrical analysis (not on moves). */
  electricalVersion: Ref<number>
  /** Bumps on every change at all (what the save logic watches). */
  version: Ref<number>
  mutate: DesignMutations
  undo: () => void
  redo: () => void
  canUndo: Readonly<Ref<boolean>>
  canRedo: Readonly<Ref<boolean>>
  /** Stops observing; the Y.Doc is destroyed. */
  dispose: () => void
}

/**
 * Opens a design in a fresh Y.Doc (one per design) with an undo manager over local edits.
 * A later co-editing provider attaches to `doc`; remote updates flow through the same observers.
 */
export function useDesignDoc(initial: Design | { doc: Y.Doc }): DesignDocHandle {
  // A live design arrives as a synced Y.Doc (the server's state); a local one is written in.
  const doc = 'doc' in initial ? initial.doc : new Y.Doc()
  if (!('doc' in initial)) writeDesignToDoc(doc, initial)
  const readDesign = createDesignReader(doc)
  const design = shallowRef<Design>(readDesign())
  const electricalVersion = ref(0)
  const version = ref(0)
  const undoDepth = ref(0)
  const redoDepth = ref(0)

  const scope = ['meta', 'settings', 'parts', 'conductors'].map((name) => doc.getMap(name)) as Y.AbstractType<unknown>[]
  scope.push(doc.getArray('scenarios') as unknown as Y.AbstractType<unknown>)
  // captureTimeout 0: every edit is its own undo step (typing in a field commits on blur/enter).
  const undoManager = new Y.UndoManager(scope, { trackedOrigins: new Set([LOCAL_ORIGIN]), captureTimeout: 0 })
  const syncStacks = () => {
    undoDepth.value = undoManager.undoStack.length
    redoDepth.value = undoManager.redoStack.length
  }
  undoManager.on('stack-item-added', syncStacks)
  undoManager.on('stack-item-popped', syncStacks)
  undoManager.on('stack-cleared', syncStacks)

  const onAfterTransaction = (transaction: Y.Transaction) => {
    if (transaction.changed.size === 0) return
    const events: Y.YEvent<Y.AbstractType<unknown>>[] = []
    transaction.changedParentTypes.forEach((list) => events.push(...list))
    design.value = readDesign(transaction.changed)
    version.value++
    if (!isLayoutOnlyChange(events)) electricalVersion.value++
  }
  doc.on('afterTransaction', onAfterTransaction)

  return {
    doc,
    design,
    electricalVersion,
    version,
    mutate: createDesignMutations(doc),
    undo: () => undoManager.undo(),
    redo: () => undoManager.redo(),
    canUndo: computed(() => undoDepth.value > 0),
    canRedo: computed(() => redoDepth.value > 0),
    dispose: () => {
      doc.off('afterTransaction', onAfterTransaction)
      undoManager.destroy()
      doc.destroy()
    },
  }
}
