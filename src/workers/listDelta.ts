// A list of records with ids, sent between the page and the analysis worker as what changed since
// the previous list on the same channel: the ids in order (only when they changed) and the records
// that differ. Copying a 500-part design or a 2,000-record result in full on every edit costs more
// than the rest of the round trip on a slow machine. Each side keeps the previous list; the
// receiver's unchanged records keep their objects, so what reads them can compare by identity.

import { sameList } from '@/utils/sameList'

export type ListDelta<T> =
  /** The whole list (the first one, or one with repeated ids). */
  | { full: T[] }
  /** `ids`: the order, or null when it is the previous order; `changed`: records not as before. */
  | { ids: string[] | null; changed: T[] }

interface Keyed {
  id: string
}

/**
 * Encoder for one channel. `same` says what "unchanged" means: the same object (the design snapshot
 * keeps unchanged parts' objects) or equal content (the worker builds a fresh result each run).
 */
export function createListEncoder<T extends Keyed>(same: (previous: T, next: T) => boolean) {
  let previousIds: string[] | null = null
  let previous = new Map<string, T>()
  return {
    encode(list: readonly T[]): ListDelta<T> {
      const ids = list.map((item) => item.id)
      const next = new Map<string, T>()
      const changed: T[] = []
      for (const item of list) {
        const before = previous.get(item.id)
        next.set(item.id, item)
        if (before === undefined || !same(before, item)) changed.push(item)
      }
      const repeated = next.size !== ids.length
      const first = previousIds === null
      const order = previousIds !== null && sameList(previousIds, ids) ? null : ids
      previousIds = repeated ? null : ids
      previous = repeated ? new Map() : next
      return first || repeated ? { full: [...list] } : { ids: order, changed }
    },
    /** Forget what was sent: the next list goes in full (after the receiver may have lost track). */
    reset(): void {
      previousIds = null
      previous = new Map()
    },
  }
}

export function createListDecoder<T extends Keyed>() {
  let ids: string[] = []
  let byId = new Map<string, T>()
  let list: T[] = []
  return (delta: ListDelta<T>): T[] => {
    if ('full' in delta) {
      list = delta.full
      ids = list.map((item) => item.id)
      byId = new Map(list.map((item) => [item.id, item]))
      return list
    }
    if (delta.ids === null && delta.changed.length === 0) return list
    for (const item of delta.changed) byId.set(item.id, item)
    if (delta.ids !== null) {
      ids = delta.ids
      const live = new Set(ids)
      for (const id of byId.keys()) if (!live.has(id)) byId.delete(id)
    }
    list = ids.map((id) => {
      const item = byId.get(id)
      if (item === undefined) throw new Error(`list update names an unknown record "${id}"`)
      return item
    })
    return list
  }
}
