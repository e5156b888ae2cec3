// The API's view of a design is its stored Yjs state (compacted state + logged updates) read back with
// readDesignFromDoc — the same state live editors share. Server-side changes (a saved JSON design, a
// restored revision) become one Yjs update committed through the design's room.
import * as Y from 'yjs'
import { readDesignFromDoc, replaceDesignInDoc } from '../../../shared/collab/designYDoc'
import type { Design } from '../../../shared/design/schema'
import type { DocumentHub } from '../../collab/documentHub'
import { loadDesignDoc } from '../../collab/loadDesignDoc'
import type { DbOrTx } from '../../db/client'
import { notFound } from '../../http/errors'

export interface DesignView {
  design: Design
  revision: number
  updatedAt: Date
}

/** The stored design; undefined when the project has none. */
export async function readStoredDesign(db: DbOrTx, projectId: string): Promise<DesignView | undefined> {
  const loaded = await loadDesignDoc(db, projectId, { storeConversion: false })
  if (!loaded) return undefined
  const design = readDesignFromDoc(loaded.doc)
  loaded.doc.destroy()
  return { design, revision: loaded.revision, updatedAt: loaded.updatedAt }
}

/** The Yjs update that turns `current` into `design` (computed on a copy: `current` is untouched). */
export function replacementUpdate(current: Y.Doc, design: Design): Uint8Array | undefined {
  const scratch = new Y.Doc()
  Y.applyUpdate(scratch, Y.encodeStateAsUpdate(current))
  const updates: Uint8Array[] = []
  scratch.on('update', (update: Uint8Array) => updates.push(update))
  replaceDesignInDoc(scratch, design)
  scratch.destroy()
  return updates.length === 0 ? undefined : Y.mergeUpdates(updates)
}

/**
 * Makes the stored design equal `design` through its room (peers receive the change live).
 * `check` runs in the room's queue before the change, e.g. to refuse a stale base revision.
 */
export async function replaceStoredDesign(
  hub: DocumentHub,
  input: { projectId: string; design: Design; userId: string; check?: (current: { revision: number }) => void },
): Promise<{ revision: number; updatedAt: Date; design: Design }> {
  const result = await hub.withRoom(input.projectId, async (room) => {
    await room.commitServerChange((doc) => {
      input.check?.({ revision: room.revision })
      return replacementUpdate(doc, input.design)
    }, input.userId)
    return { revision: room.revision, updatedAt: room.updatedAt, design: room.design() }
  })
  if (!result) throw notFound('Design')
  return result
}
