import * as Y from 'yjs'
import type { Conductor, Design, DesignSettings, Part, Scenario } from '@shared/design/schema'
import { readDesignFromDoc } from '@shared/collab/designYDoc'

/** What a Y.Doc transaction reports as changed: each changed type with its changed map keys. */
export type ChangedTypes = Y.Transaction['changed']

/**
 * Reads the plain design out of a Y.Doc after each transaction, re-reading only the parts and
 * conductors the transaction touched. Everything else keeps its object from the previous snapshot,
 * so the canvas, the tables and the analysis worker can tell what changed by identity instead of
 * comparing 500 parts by value on every edit. The result equals `readDesignFromDoc(doc)`.
 */
export function createDesignReader(doc: Y.Doc): (changed?: ChangedTypes) => Design {
  const parts = doc.getMap('parts') as Y.Map<Y.Map<unknown>>
  const conductors = doc.getMap('conductors') as Y.Map<Y.Map<unknown>>
  const settings = doc.getMap('settings')
  const meta = doc.getMap('meta')
  const scenarios = doc.getArray('scenarios')
  const partById = new Map<string, Part>()
  const conductorById = new Map<string, Conductor>()
  let last: Design | null = null

  /** The entries of `map` in the order `toJSON` gives them, re-read only where `stale` says. */
  function readEntries<T>(map: Y.Map<Y.Map<unknown>>, cache: Map<string, T>, stale: ReadonlySet<string> | null): T[] {
    const byKey: Record<string, T> = {}
    const live = new Set<string>()
    map.forEach((entry, key) => {
      live.add(key)
      let value = stale === null || stale.has(key) ? undefined : cache.get(key)
      if (value === undefined) {
        value = (entry instanceof Y.AbstractType ? entry.toJSON() : entry) as T
        cache.set(key, value)
      }
      byKey[key] = value
    })
    for (const key of cache.keys()) if (!live.has(key)) cache.delete(key)
    // Object.values keeps exactly the key order readDesignFromDoc's toJSON produces.
    return Object.values(byKey)
  }

  return (changed) => {
    if (!last || !changed) {
      const fresh = readDesignFromDoc(doc)
      partById.clear()
      conductorById.clear()
      for (const part of fresh.parts) partById.set(part.id, part)
      for (const conductor of fresh.conductors) conductorById.set(conductor.id, conductor)
      last = fresh
      return fresh
    }
    const staleParts = new Set<string>()
    const staleConductors = new Set<string>()
    const staleByRoot = new Map<unknown, Set<string>>([[parts, staleParts], [conductors, staleConductors]])
    const touched = new Set<unknown>()
    changed.forEach((keys, type) => {
      // Walk up to the root type; `entry` is the root's direct child that holds the change.
      let entry: typeof type | null = null
      let root = type
      while (root._item) {
        entry = root
        root = root._item.parent as typeof type
      }
      touched.add(root)
      const stale = staleByRoot.get(root)
      if (!stale) return
      if (entry === null) keys.forEach((key) => key !== null && stale.add(key))
      else if (entry._item?.parentSub) stale.add(entry._item.parentSub)
    })
    const metaJson = touched.has(meta) ? meta.toJSON() : null
    const next = {
      format: metaJson ? metaJson.format : last.format,
      version: metaJson ? metaJson.version : last.version,
      id: metaJson ? metaJson.id : last.id,
      name: metaJson ? metaJson.name : last.name,
      settings: touched.has(settings) ? (settings.toJSON() as DesignSettings) : last.settings,
      parts: touched.has(parts) ? readEntries(parts, partById, staleParts) : last.parts,
      conductors: touched.has(conductors) ? readEntries(conductors, conductorById, staleConductors) : last.conductors,
      scenarios: touched.has(scenarios) ? (scenarios.toJSON() as Scenario[]) : last.scenarios,
    } as Design
    last = next
    return next
  }
}
