// Scenario edits on the design's Y.Doc (no DOM): each is checked against the shared schemas before
// it is written, is one undo step, reaches a co-editor's copy of the document through ordinary Yjs
// updates, and leaves a design that parseDesign accepts.
import * as Y from 'yjs'
import { afterEach, describe, expect, it } from 'vitest'
import { createDemoDesign } from '@shared/design/demo'
import { DESIGN_LIMITS, parseDesign } from '@shared/design/schema'
import { readDesignFromDoc } from '@shared/collab/designYDoc'
import { useDesignDoc, type DesignDocHandle } from '@/composables/useDesignDoc'
import { useScenarioEditing } from '@/composables/useScenarioEditing'

let handles: DesignDocHandle[] = []
afterEach(() => {
  for (const handle of handles) handle.dispose()
  handles = []
})
function open() {
  const handle = useDesignDoc(createDemoDesign())
  handles.push(handle)
  return { handle, editing: useScenarioEditing(handle) }
}

describe('scenario editing on the Y.Doc', () => {
  it('refuses what the schema or the design refuses, and writes nothing then', () => {
    const { handle, editing } = open()
    const before = Y.encodeStateAsUpdate(handle.doc)
    expect(editing.rename('night-all-loads', 'x'.repeat(81))).toBe('Scenario name must be at most 80 characters')
    expect(editing.rename('night-all-loads', 'PUMP START')).toBe('Another scenario is already called "Pump start"')
    expect(editing.add('Noon, charging')).toEqual({ error: 'Another scenario is already called "Noon, charging"' })
    expect(editing.setLoad('night-all-loads', 'fridge', { on: true, levelPercent: -5 })).toBe('Load level must be at least 0 %')
    expect(editing.setLoad('night-all-loads', 'fridge', { on: true, levelPercent: Number.NaN })).toBe('Load level must be a number')
    // A battery is not something a scenario switches (crossref.ts would reject the design).
    expect(editing.setLoad('night-all-loads', 'house-bank', { on: true, levelPercent: 50 })).toBe('Scenarios switch only loads, inverters and chargers')
    expect(editing.remove('no-such-scenario')).toBe('That scenario no longer exists')
    expect(Y.encodeStateAsUpdate(handle.doc)).toEqual(before)
    expect(handle.canUndo.value).toBe(false)
  })

  it('never deletes the last scenario and stops at the design limit', () => {
    const { handle, editing } = open()
    expect(editing.remove('night-all-loads')).toBeNull()
    expect(editing.remove('noon-charging')).toBeNull()
    expect(editing.remove('pump-start')).toBe('A design needs at least one scenario')
    expect(handle.design.value.scenarios.map((s) => s.id)).toEqual(['pump-start'])
    for (let i = 1; i < DESIGN_LIMITS.scenarios; i++) expect('id' in editing.duplicate('pump-start')).toBe(true)
    expect(editing.add()).toEqual({ error: `A design holds at most ${DESIGN_LIMITS.scenarios} scenarios` })
    expect(parseDesign(handle.design.value).ok).toBe(true)
  })

  it('makes each edit one undo step, and a co-editor receives it', () => {
    const { handle, editing } = open()
    const peer = new Y.Doc()
    Y.applyUpdate(peer, Y.encodeStateAsUpdate(handle.doc))
    handle.doc.on('update', (update: Uint8Array) => Y.applyUpdate(peer, update))

    const added = editing.add('Anchored, evening')
    if (!('id' in added)) throw new Error(added.error)
    expect(editing.setFlag(added.id, 'sunOn', true)).toBeNull()
    expect(editing.setLoad(added.id, 'water-pump', { on: false, levelPercent: 100 })).toBeNull()
    expect(editing.setLoad(added.id, 'inverter', { on: true, levelPercent: 25 })).toBeNull()

    const remote = readDesignFromDoc(peer).scenarios.find((s) => s.id === added.id)!
    expect(remote).toMatchObject({ name: 'Anchored, evening', sunOn: true })
    expect(remote.loads['water-pump']).toEqual({ on: false, level: 1 })
    expect(remote.loads.inverter).toEqual({ on: true, level: 0.25 })
    expect(parseDesign(readDesignFromDoc(peer)).ok).toBe(true)

    handle.undo()
    expect(handle.design.value.scenarios.at(-1)!.loads.inverter).toEqual({ on: true, level: 1 })
    handle.undo()
    expect(handle.design.value.scenarios.at(-1)!.loads['water-pump']).toEqual({ on: true, level: 1 })
    handle.undo()
    handle.undo()
    expect(readDesignFromDoc(peer).scenarios.map((s) => s.id)).toEqual(['night-all-loads', 'noon-charging', 'pump-start'])
    peer.destroy()
  })
})
