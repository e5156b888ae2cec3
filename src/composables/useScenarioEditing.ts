// Adding, renaming, duplicating, deleting and setting up a design's operating scenarios. Every edit
// is one local Y.Doc transaction (one undo step, shared live with co-editors) and is checked against
// the shared zod schemas first: an invalid entry returns its message and never reaches the document.
import * as Y from 'yjs'
import { computed } from 'vue'
import {
  DESIGN_LIMITS,
  scenarioLevelPercentSchema,
  scenarioSchema,
  type Part,
  type Scenario,
  type ScenarioLoad,
} from '@shared/design/schema'
import { SWITCHABLE_LOAD_TYPES } from '@shared/design/crossref'
import { newUniqueId } from '@shared/design/ids'
import { LOCAL_ORIGIN, scenarioToY } from '@shared/collab/designYDoc'
import type { DesignDocHandle } from './useDesignDoc'

export type ScenarioFlag = 'sunOn' | 'chargerOn' | 'motorStart'
/** null when the edit was made, else the message to show beside the field. */
export type EditResult = string | null

const SWITCHABLE = new Set<string>(SWITCHABLE_LOAD_TYPES)
/** Loads and inverters run at full level in a new scenario, as when they are added to the drawing. */
const RUNS_BY_DEFAULT = new Set<string>(['load', 'inverter'])

const sameName = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase()
const firstIssue = (result: { success: boolean; error?: { issues: { message: string }[] } }) =>
  result.success ? null : (result.error?.issues[0]?.message ?? 'Invalid value')

export function useScenarioEditing(handle: DesignDocHandle) {
  const list = handle.doc.getArray<Y.Map<unknown>>('scenarios')
  const scenarios = computed<Scenario[]>(() => handle.design.value.scenarios)
  /** The parts a scenario can switch: loads, inverters and chargers, in drawing order. */
  const switchableParts = computed<Part[]>(() => handle.design.value.parts.filter((p) => SWITCHABLE.has(p.type)))

  const transact = (fn: () => void) => handle.doc.transact(fn, LOCAL_ORIGIN)
  const indexOf = (id: string) => list.toArray().findIndex((map) => map.get('id') === id)
  const plainOf = (id: string) => scenarios.value.find((s) => s.id === id)

  /** Message for a name that the schema refuses or another scenario already has (the design would not load). */
  function validateName(name: string, ownId: string | null = null): EditResult {
    const message = firstIssue(scenarioSchema.shape.name.safeParse(name))
    if (message) return message
    const other = scenarios.value.find((s) => s.id !== ownId && sameName(s.name, name))
    return other ? `Another scenario is already called "${other.name}"` : null
  }

  function validateLevelPercent(percent: unknown): EditResult {
    return firstIssue(scenarioLevelPercentSchema.safeParse(percent))
  }

  function unusedName(base: string): string {
    if (!scenarios.value.some((s) => sameName(s.name, base))) return base
    for (let n = 2; ; n++) {
      const name = `${base} ${n}`
      if (!scenarios.value.some((s) => sameName(s.name, name))) return name
    }
  }

  /** Checks the whole scenario against the schema, then inserts it at `index`. */
  function insert(next: Scenario, index: number): EditResult {
    const parsed = scenarioSchema.safeParse(next)
    if (!parsed.success) return firstIssue(parsed)
    transact(() => list.insert(index, [scenarioToY(parsed.data)]))
    return null
  }

  function tooMany(): EditResult {
    return scenarios.value.length >= DESIGN_LIMITS.scenarios ? `A design holds at most ${DESIGN_LIMITS.scenarios} scenarios` : null
  }

  /** A new scenario with loads and inverters on at full level, sun and charger off. Returns its id. */
  function add(name = unusedName('New scenario')): { id: string } | { error: string } {
    const error = tooMany() ?? validateName(name)
    if (error) return { error }
    const loads: Record<string, ScenarioLoad> = {}
    for (const part of switchableParts.value) if (RUNS_BY_DEFAULT.has(part.type)) loads[part.id] = { on: true, level: 1 }
    const id = newUniqueId('scenario', new Set(scenarios.value.map((s) => s.id)))
    const failed = insert({ id, name: name.trim(), sunOn: false, chargerOn: false, loads }, list.length)
    return failed ? { error: failed } : { id }
  }

  /** A copy placed right after the original, named "<name> (copy)". Returns its id. */
  function duplicate(id: string): { id: string } | { error: string } {
    const source = plainOf(id)
    const index = indexOf(id)
    if (!source || index < 0) return { error: 'That scenario no longer exists' }
    const error = tooMany()
    if (error) return { error }
    const copyId = newUniqueId('scenario', new Set(scenarios.value.map((s) => s.id)))
    const name = unusedName(`${source.name} (copy)`.slice(0, 80))
    const failed = insert({ ...structuredClone(source), id: copyId, name }, index + 1)
    return failed ? { error: failed } : { id: copyId }
  }

  function rename(id: string, name: string): EditResult {
    const error = validateName(name, id)
    if (error) return error
    const index = indexOf(id)
    if (index < 0) return 'That scenario no longer exists'
    if (list.get(index).get('name') !== name.trim()) transact(() => list.get(index).set('name', name.trim()))
    return null
  }

  /** Deletes a scenario; a design always keeps at least one. */
  function remove(id: string): EditResult {
    if (list.length <= 1) return 'A design needs at least one scenario'
    const index = indexOf(id)
    if (index < 0) return 'That scenario no longer exists'
    transact(() => list.delete(index, 1))
    return null
  }

  function setFlag(id: string, flag: ScenarioFlag, value: boolean): EditResult {
    const error = firstIssue(scenarioSchema.shape[flag].safeParse(value))
    if (error) return error
    const index = indexOf(id)
    if (index < 0) return 'That scenario no longer exists'
    transact(() => list.get(index).set(flag, value))
    return null
  }

  /** Whether a part runs in the scenario, and its level in per cent (0–100). */
  function setLoad(id: string, partId: string, state: { on: boolean; levelPercent: number }): EditResult {
    const error = validateLevelPercent(state.levelPercent)
    if (error) return error
    const load = { on: state.on, level: state.levelPercent / 100 }
    const checked = scenarioSchema.shape.loads.safeParse({ [partId]: load })
    if (!checked.success) return firstIssue(checked)
    if (!switchableParts.value.some((p) => p.id === partId)) return 'Scenarios switch only loads, inverters and chargers'
    const index = indexOf(id)
    if (index < 0) return 'That scenario no longer exists'
    transact(() => (list.get(index).get('loads') as Y.Map<unknown>).set(partId, load))
    return null
  }

  return { scenarios, switchableParts, validateName, validateLevelPercent, add, duplicate, rename, remove, setFlag, setLoad }
}

export type ScenarioEditing = ReturnType<typeof useScenarioEditing>
