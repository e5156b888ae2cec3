/** Read access by id: a Map, or a view over the analysis's arrays that builds no map of its own. */
export interface IdLookup<V> {
  get(id: string): V | undefined
}

/**
 * Items by id through a shared id → position index: one index per kind of thing (conductors,
 * devices) serves every list kept in that order (topology records, worst-case figures…), instead of
 * one Map per list. A repeated id gives its last position, as a Map built in order would.
 */
export function viewByIndex<T>(index: IdLookup<number>, items: readonly T[]): IdLookup<T> {
  return {
    get: (id) => {
      const k = index.get(id)
      return k === undefined ? undefined : items[k]
    },
  }
}
