// A design's Y.Doc as stored: the compacted state plus the later logged updates. A design stored only
// as JSON (created before co-editing, or by the projects API) is converted with writeDesignToDoc.
import * as Y from 'yjs'
import { writeDesignToDoc } from '../../shared/collab/designYDoc'
import type { Design } from '../../shared/design/schema'
import type { DbOrTx } from '../db/client'
import { validateDesign } from '../modules/designs/design-document'
import { insertInitialState, readStoredState } from './designState.repository'

export interface LoadedDesignDoc {
  doc: Y.Doc
  revision: number
  updatedAt: Date
  /** Id of the newest design_updates row contained in `doc` (0: none). */
  lastUpdateId: number
  /** Logged updates not folded into the compacted state yet. */
  uncompactedUpdates: number
}

function designFromJson(document: unknown): Design {
  const checked = validateDesign(document)
  // A stored document is validated on save; an older format version is migrated by the parser.
  if (checked.ok) return checked.design
  throw new Error(`stored design is not valid: ${checked.fields.map((f) => `${f.path}: ${f.message}`).join('; ')}`)
}

/**
 * `storeConversion`: persist the converted state of a JSON-only design (the collaboration server does,
 * so every client builds on the same items); read-only API views convert in memory only.
 */
export async function loadDesignDoc(
  db: DbOrTx,
  projectId: string,
  options: { storeConversion: boolean },
): Promise<LoadedDesignDoc | undefined> {
  for (let attempt = 0; attempt < 2; attempt++) {
    const stored = await readStoredState(db, projectId)
    if (!stored) return undefined
    const doc = new Y.Doc({ gc: true })
    if (stored.state) {
      Y.applyUpdate(doc, stored.state)
    } else {
      writeDesignToDoc(doc, designFromJson(stored.document))
      // Lost a race with another converter: load theirs, never two conversions of the same JSON.
      if (options.storeConversion && !(await insertInitialState(db, projectId, Y.encodeStateAsUpdate(doc)))) continue
    }
    if (stored.updates.length > 0) Y.applyUpdate(doc, Y.mergeUpdates(stored.updates.map((row) => row.update)))
    return {
      doc,
      revision: stored.revision,
      updatedAt: stored.updatedAt,
      lastUpdateId: stored.updates.at(-1)?.id ?? stored.compactedThrough,
      uncompactedUpdates: stored.updates.length,
    }
  }
  throw new Error(`could not load the design state of project ${projectId}`)
}
