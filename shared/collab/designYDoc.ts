import * as Y from 'yjs'
import type { Conductor, Design, DesignSettings, Part, Scenario } from '../design/schema'

// The Design <-> Y.Doc mapping shared by the editor and the collaboration server (yjs only). Layout:
//   meta:       Y.Map { id, name, format, version }
//   settings:   Y.Map (plain values)
//   parts:      Y.Map<partId, Y.Map { id, type, label, position, params: Y.Map }>
//   conductors: Y.Map<conductorId, Y.Map { id, label, from, to, sizeId, … }>
//   scenarios:  Y.Array<Y.Map { id, name, sunOn, chargerOn, motorStart?, loads: Y.Map<partId, {on, level}> }>
// Positions and terminal references are stored as whole plain values: they change atomically.

/** Transaction origin for local edits; the undo manager tracks only these. */
export const LOCAL_ORIGIN = 'local-edit'

type PartsMap = Y.Map<Y.Map<unknown>>

function partToY(part: Part): Y.Map<unknown> {
  const map = new Y.Map<unknown>()
  map.set('id', part.id)
  map.set('type', part.type)
  map.set('label', part.label)
  map.set('position', { x: part.position.x, y: part.position.y })
  const params = new Y.Map<unknown>()
  for (const [key, value] of Object.entries(part.params as Record<string, unknown>)) {
    if (value !== undefined) params.set(key, value)
  }
  map.set('params', params)
  return map
}

function conductorToY(conductor: Conductor): Y.Map<unknown> {
  const map = new Y.Map<unknown>()
  for (const [key, value] of Object.entries(conductor)) {
    if (value !== undefined) map.set(key, value)
  }
  return map
}

/** A scenario as the Y.Map the document holds (also used to add one while editing). */
export function scenarioToY(scenario: Scenario): Y.Map<unknown> {
  const map = new Y.Map<unknown>()
  for (const [key, value] of Object.entries(scenario)) {
    if (key === 'loads' || value === undefined) continue
    map.set(key, value)
  }
  const loads = new Y.Map<unknown>()
  for (const [partId, state] of Object.entries(scenario.loads)) loads.set(partId, { ...state })
  map.set('loads', loads)
  return map
}

/** Fill an empty Y.Doc from a plain design (one transaction, not undoable). */
export function writeDesignToDoc(doc: Y.Doc, design: Design): void {
  doc.transact(() => {
    const meta = doc.getMap<unknown>('meta')
    meta.set('id', design.id)
    meta.set('name', design.name)
    meta.set('format', design.format)
    meta.set('version', design.version)
    const settings = doc.getMap<unknown>('settings')
    for (const [key, value] of Object.entries(design.settings)) settings.set(key, value)
    const parts = doc.getMap('parts') as PartsMap
    for (const part of design.parts) parts.set(part.id, partToY(part))
    const conductors = doc.getMap('conductors') as PartsMap
    for (const conductor of design.conductors) conductors.set(conductor.id, conductorToY(conductor))
    const scenarios = doc.getArray<Y.Map<unknown>>('scenarios')
    scenarios.push(design.scenarios.map(scenarioToY))
  }, 'load')
}

/** A plain design (the shape the analysis and the API take) read back from the Y.Doc. */
export function readDesignFromDoc(doc: Y.Doc): Design {
  const meta = doc.getMap<unknown>('meta').toJSON()
  return {
    format: meta.format,
    version: meta.version,
    id: meta.id,
    name: meta.name,
    settings: doc.getMap('settings').toJSON() as DesignSettings,
    parts: Object.values(doc.getMap('parts').toJSON()) as Part[],
    conductors: Object.values(doc.getMap('conductors').toJSON()) as Conductor[],
    scenarios: doc.getArray('scenarios').toJSON() as Scenario[],
  } as Design
}

/** Mutations on an open design. Every call is one local transaction = one undo step. */
export function createDesignMutations(doc: Y.Doc) {
  const parts = doc.getMap('parts') as PartsMap
  const conductors = doc.getMap('conductors') as PartsMap
  const settings = doc.getMap<unknown>('settings')
  const scenarios = doc.getArray<Y.Map<unknown>>('scenarios')
  const meta = doc.getMap<unknown>('meta')
  const transact = (fn: () => void) => doc.transact(fn, LOCAL_ORIGIN)

  function removeConductorsTouching(partIds: Set<string>) {
    conductors.forEach((conductor, id) => {
      const from = conductor.get('from') as { partId: string }
      const to = conductor.get('to') as { partId: string }
      if (partIds.has(from.partId) || partIds.has(to.partId)) conductors.delete(id)
    })
  }

  return {
    /** Adds parts (and conductors); loads and inverters among them run in every scenario. */
    addParts(newParts: Part[], newConductors: Conductor[] = []) {
      transact(() => {
        for (const part of newParts) parts.set(part.id, partToY(part))
        for (const conductor of newConductors) conductors.set(conductor.id, conductorToY(conductor))
        const switchable = newParts.filter((p) => p.type === 'load' || p.type === 'inverter')
        scenarios.forEach((scenario) => {
          const loads = scenario.get('loads') as Y.Map<unknown>
          for (const part of switchable) loads.set(part.id, { on: true, level: 1 })
        })
      })
    },
    moveParts(positions: Record<string, { x: number; y: number }>) {
      transact(() => {
        for (const [id, position] of Object.entries(positions)) {
          const part = parts.get(id)
          const old = part?.get('position') as { x: number; y: number } | undefined
          if (part && (old?.x !== position.x || old?.y !== position.y)) part.set('position', { ...position })
        }
      })
    },
    setPartLabel(id: string, label: string) {
      transact(() => parts.get(id)?.set('label', label))
    },
    setPartParam(id: string, key: string, value: unknown) {
      transact(() => {
        const params = parts.get(id)?.get('params') as Y.Map<unknown> | undefined
        if (!params) return
        if (value === undefined) params.delete(key)
        else params.set(key, value)
      })
    },
    setConductorField(id: string, key: keyof Conductor, value: unknown) {
      transact(() => {
        const conductor = conductors.get(id)
        if (!conductor) return
        if (value === undefined) conductor.delete(key)
        else conductor.set(key, value)
      })
    },
    addConductor(conductor: Conductor) {
      transact(() => conductors.set(conductor.id, conductorToY(conductor)))
    },
    removeElements(partIds: string[], conductorIds: string[]) {
      transact(() => {
        for (const id of conductorIds) conductors.delete(id)
        const removed = new Set(partIds)
        removeConductorsTouching(removed)
        for (const id of partIds) parts.delete(id)
        scenarios.forEach((scenario) => {
          const loads = scenario.get('loads') as Y.Map<unknown>
          for (const id of partIds) if (loads.has(id)) loads.delete(id)
        })
      })
    },
    setSetting<K extends keyof DesignSettings>(key: K, value: DesignSettings[K]) {
      transact(() => settings.set(key, value))
    },
    setName(name: string) {
      transact(() => meta.set('name', name))
    },
    /** Replaces parts, conductors, scenarios and settings (keeps the design's id and name). */
    replaceContent(design: Design) {
      transact(() => {
        parts.clear()
        conductors.clear()
        scenarios.delete(0, scenarios.length)
        for (const [key, value] of Object.entries(design.settings)) settings.set(key, value)
        for (const part of design.parts) parts.set(part.id, partToY(part))
        for (const conductor of design.conductors) conductors.set(conductor.id, conductorToY(conductor))
        scenarios.push(design.scenarios.map(scenarioToY))
      })
    },
    setScenarioLoad(scenarioId: string, partId: string, state: { on: boolean; level: number }) {
      transact(() => {
        scenarios.forEach((scenario) => {
          if (scenario.get('id') === scenarioId) (scenario.get('loads') as Y.Map<unknown>).set(partId, { ...state })
        })
      })
    },
  }
}

export type DesignMutations = ReturnType<typeof createDesignMutations>

/** Whether a transaction changed only part positions (no effect on the electrical analysis). */
export function isLayoutOnlyChange(events: Y.YEvent<Y.AbstractType<unknown>>[]): boolean {
  return events.every((event) => {
    if (!(event instanceof Y.YMapEvent)) return false
    const target = event.target as Y.Map<unknown>
    if (target.parent !== null && target.parent === target.doc?.getMap('parts')) {
      return [...event.keysChanged].every((key) => key === 'position')
    }
    return false
  })
}

const sameValue = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b)

/** Sets the map's keys to `values` (deleting keys absent from it), touching only what differs. */
function syncPlainMap(map: Y.Map<unknown>, values: Record<string, unknown>, skip: ReadonlySet<string> = new Set()): void {
  for (const key of [...map.keys()]) {
    if (!skip.has(key) && values[key] === undefined) map.delete(key)
  }
  for (const [key, value] of Object.entries(values)) {
    if (skip.has(key) || value === undefined) continue
    if (!sameValue(map.get(key), value)) map.set(key, value)
  }
}

const PART_NESTED = new Set(['params'])
const SCENARIO_NESTED = new Set(['loads'])

/**
 * Makes the document hold exactly `design` (server-side replace: a saved JSON design, a restored
 * revision), as one transaction that changes only what differs, so concurrent edits to untouched
 * parts survive and the resulting update stays small.
 */
export function replaceDesignInDoc(doc: Y.Doc, design: Design, origin: unknown = null): void {
  doc.transact(() => {
    syncPlainMap(doc.getMap<unknown>('meta'), { id: design.id, name: design.name, format: design.format, version: design.version })
    syncPlainMap(doc.getMap<unknown>('settings'), design.settings as Record<string, unknown>)

    const parts = doc.getMap('parts') as PartsMap
    const wantedParts = new Map(design.parts.map((part) => [part.id, part]))
    for (const id of [...parts.keys()]) if (!wantedParts.has(id)) parts.delete(id)
    for (const part of design.parts) {
      const current = parts.get(part.id)
      const params = current?.get('params')
      if (!current || current.get('type') !== part.type || !(params instanceof Y.Map)) {
        parts.set(part.id, partToY(part))
        continue
      }
      syncPlainMap(current, { ...part, position: { x: part.position.x, y: part.position.y } }, PART_NESTED)
      syncPlainMap(params, part.params as Record<string, unknown>)
    }

    const conductors = doc.getMap('conductors') as PartsMap
    const wantedConductors = new Set(design.conductors.map((conductor) => conductor.id))
    for (const id of [...conductors.keys()]) if (!wantedConductors.has(id)) conductors.delete(id)
    for (const conductor of design.conductors) {
      const current = conductors.get(conductor.id)
      if (current) syncPlainMap(current, conductor as Record<string, unknown>)
      else conductors.set(conductor.id, conductorToY(conductor))
    }

    const scenarios = doc.getArray<Y.Map<unknown>>('scenarios')
    const sameOrder =
      scenarios.length === design.scenarios.length &&
      design.scenarios.every((scenario, index) => scenarios.get(index).get('id') === scenario.id)
    if (!sameOrder) {
      scenarios.delete(0, scenarios.length)
      scenarios.push(design.scenarios.map(scenarioToY))
      return
    }
    design.scenarios.forEach((scenario, index) => {
      const current = scenarios.get(index)
      syncPlainMap(current, scenario as Record<string, unknown>, SCENARIO_NESTED)
      const loads = current.get('loads')
      if (loads instanceof Y.Map) syncPlainMap(loads, scenario.loads as Record<string, unknown>)
      else current.set('loads', scenarioToY(scenario).get('loads'))
    })
  }, origin)
}
