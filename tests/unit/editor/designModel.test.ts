// The editor's pure model: Design ⇄ Y.Doc round trip, edits as undo steps, finding patches through
// the schemas, and the topology layout (energy in on the left, loads on the right).
import * as Y from 'yjs'
import { describe, expect, it } from 'vitest'
import { createDemoDesign, createEmptyDesign } from '@shared/design/demo'
import { parseDesign } from '@shared/design/schema'
import { createDesignMutations, readDesignFromDoc, writeDesignToDoc } from '@shared/collab/designYDoc'
import { applyFindingPatch } from '@/components/editor/model/applyPatch'
import { autoArrange } from '@/components/editor/model/layout'
import { cloneClip, copySelection, newConductor, newPart } from '@/components/editor/model/partFactory'
import { useDesignDoc } from '@/composables/useDesignDoc'

const byId = <T extends { id: string }>(list: T[]) => Object.fromEntries(list.map((x) => [x.id, x]))

describe('design in a Y.Doc', () => {
  it('reads back the demo design unchanged (order of parts aside)', () => {
    const demo = createDemoDesign()
    const doc = new Y.Doc()
    writeDesignToDoc(doc, demo)
    const back = readDesignFromDoc(doc)
    expect(byId(back.parts)).toEqual(byId(demo.parts))
    expect(byId(back.conductors)).toEqual(byId(demo.conductors))
    expect(back.scenarios).toEqual(demo.scenarios)
    expect(back.settings).toEqual(demo.settings)
    expect(parseDesign(back).ok).toBe(true)
  })

  it('removes the conductors and scenario entries of deleted parts in one undoable step', () => {
    const demo = createDemoDesign()
    const handle = useDesignDoc(demo)
    const load = demo.parts.find((p) => p.type === 'load')!
    const touching = demo.conductors.filter((c) => c.from.partId === load.id || c.to.partId === load.id)
    expect(touching.length).toBeGreaterThan(0)
    handle.mutate.removeElements([load.id], [])
    const after = handle.design.value
    expect(after.parts.some((p) => p.id === load.id)).toBe(false)
    expect(after.conductors.some((c) => touching.some((t) => t.id === c.id))).toBe(false)
    expect(after.scenarios.every((s) => !(load.id in s.loads))).toBe(true)
    expect(parseDesign(after).ok).toBe(true)
    handle.undo()
    expect(byId(handle.design.value.conductors)).toEqual(byId(demo.conductors))
    expect(handle.design.value.scenarios).toEqual(demo.scenarios)
    handle.dispose()
  })

  it('counts a move as a layout change only, and a parameter edit as an electrical one', () => {
    const demo = createDemoDesign()
    const handle = useDesignDoc(demo)
    const part = demo.parts[0]
    handle.mutate.moveParts({ [part.id]: { x: part.position.x + 32, y: part.position.y } })
    expect(handle.version.value).toBe(1)
    expect(handle.electricalVersion.value).toBe(0)
    handle.mutate.setPartLabel(part.id, 'Renamed')
    expect(handle.electricalVersion.value).toBe(1)
    handle.dispose()
  })
})

describe('applying a finding patch', () => {
  it('changes one way of a fuse panel and refuses a value the schema rejects', () => {
    const demo = createDemoDesign()
    const handle = useDesignDoc(demo)
    const panel = demo.parts.find((p) => p.type === 'fuse-panel')!
    const ways = (panel.params as { wayRatingsA: number[] }).wayRatingsA
    expect(applyFindingPatch(handle.design.value, handle.mutate, { kind: 'part', id: panel.id, field: 'params.wayRatingsA.1', value: 20 })).toBeNull()
    const after = handle.design.value.parts.find((p) => p.id === panel.id)!.params as { wayRatingsA: number[] }
    expect(after.wayRatingsA).toEqual(ways.map((r, i) => (i === 1 ? 20 : r)))
    // 0.1 A is below the schema's 0.5 A minimum for a way fuse: refused, nothing written.
    const message = applyFindingPatch(handle.design.value, handle.mutate, { kind: 'part', id: panel.id, field: 'params.wayRatingsA.0', value: 0.1 })
    expect(message).toMatch(/at least 0.5 A/)
    const conductor = demo.conductors[0]
    expect(applyFindingPatch(handle.design.value, handle.mutate, { kind: 'conductor', id: conductor.id, field: 'sizeId', value: 'awg-4' })).toBeNull()
    expect(handle.design.value.conductors.find((c) => c.id === conductor.id)!.sizeId).toBe('awg-4')
    expect(applyFindingPatch(handle.design.value, handle.mutate, { kind: 'conductor', id: conductor.id, field: 'sizeId', value: 'awg-99' })).not.toBeNull()
    handle.dispose()
  })
})

describe('auto-arrange and copy', () => {
  it('puts the array and controller left of the bank and the load right of it', () => {
    const design = createEmptyDesign({ name: 'Layout', nominalVoltageV: 12, profile: 'vehicle' })
    const add = (type: Parameters<typeof newPart>[1]) => {
      const part = newPart(design, type, { x: 0, y: 0 })
      design.parts.push(part)
      return part
    }
    const pv = add('pv-array')
    const cc = add('charge-controller')
    const bank = add('battery')
    const fuse = add('fuse')
    const load = add('load')
    const link = (a: string, at: string, b: string, bt: string) => design.conductors.push(newConductor(design, { partId: a, terminal: at }, { partId: b, terminal: bt }))
    link(pv.id, 'pos', cc.id, 'pv-pos')
    link(cc.id, 'bat-pos', bank.id, 'pos')
    link(bank.id, 'pos', fuse.id, 'line')
    link(fuse.id, 'load', load.id, 'pos')
    const at = autoArrange(design)
    expect(at[pv.id].x).toBeLessThan(at[cc.id].x)
    expect(at[cc.id].x).toBeLessThan(at[bank.id].x)
    expect(at[bank.id].x).toBeLessThan(at[fuse.id].x)
    expect(at[fuse.id].x).toBeLessThan(at[load.id].x)
  })

  it('pastes copies with fresh ids and conductors re-attached to the copies', () => {
    const demo = createDemoDesign()
    const ids = demo.parts.slice(0, 4).map((p) => p.id)
    const clip = copySelection(demo, ids)
    const copy = cloneClip(demo, clip, { x: 32, y: 32 })
    const newIds = new Set(copy.parts.map((p) => p.id))
    expect(copy.parts.every((p) => !ids.includes(p.id))).toBe(true)
    expect(copy.conductors.every((c) => newIds.has(c.from.partId) && newIds.has(c.to.partId))).toBe(true)
    expect(copy.parts[0].position.x).toBe(clip.parts[0].position.x + 32)
    const merged = { ...demo, parts: [...demo.parts, ...copy.parts], conductors: [...demo.conductors, ...copy.conductors] }
    expect(parseDesign(merged).ok).toBe(true)
  })
})
