// The demo design in a Y.Doc with the editor's incremental reader attached: every transaction that
// changes something adds the snapshot the editor would take of it.
import * as Y from 'yjs'
import { createDemoDesign } from '@shared/design/demo'
import type { Design } from '@shared/design/schema'
import { createDesignMutations, writeDesignToDoc } from '@shared/collab/designYDoc'
import { createDesignReader } from '@/composables/designDocReader'

export function demoDocSnapshots() {
  const doc = new Y.Doc()
  writeDesignToDoc(doc, createDemoDesign())
  const read = createDesignReader(doc)
  const snapshots: Design[] = [read()]
  doc.on('afterTransaction', (transaction: Y.Transaction) => {
    if (transaction.changed.size > 0) snapshots.push(read(transaction.changed))
  })
  return { doc, snapshots, mutate: createDesignMutations(doc) }
}
