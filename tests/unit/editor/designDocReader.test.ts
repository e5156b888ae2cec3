// The incremental reader behind the editor's design snapshot: after every kind of transaction
// (local edits, undo, a peer's update, a whole replacement) it must give exactly what a full read
// of the Y.Doc gives, in the same order, while keeping the objects of untouched parts.
import * as Y from 'yjs'
import { describe, expect, it } from 'vitest'
import { createDemoDesign } from '@shared/design/demo'
import { createDesignMutations, readDesignFromDoc, replaceDesignInDoc } from '@shared/collab/designYDoc'
import { newPart } from '@/components/editor/model/partFactory'
import { demoDocSnapshots } from './demoDocSnapshots'

/** A doc with the demo design and a reader that re-reads after every transaction. */
function watchedDoc() {
  const { doc, snapshots, mutate } = demoDocSnapshots()
  const latest = () => snapshots[snapshots.length - 1]
  /** Same content and same key order as a full read. */
  const expectFullRead = () => expect(JSON.stringify(latest())).toBe(JSON.stringify(readDesignFromDoc(doc)))
  return { doc, mutate, snapshots, latest, expectFullRead }
}

describe('incremental design reader', () => {
  it('re-reads only the part a parameter edit touched', () => {
    const { mutate, snapshots, latest, expectFullRead } = watchedDoc()
    const before = latest()
    const fuse = before.parts.find((p) => p.type === 'fuse')!
    mutate.setPartParam(fuse.id, 'ratingA', 3)
    expectFullRead()
    expect(snapshots).toHaveLength(2)
    const after = latest()
    expect((after.parts.find((p) => p.id === fuse.id)!.params as { ratingA: number }).ratingA).toBe(3)
    for (const part of after.parts) expect(part === before.parts.find((p) => p.id === part.id)).toBe(part.id !== fuse.id)
    expect(after.conductors).toBe(before.conductors)
    expect(after.scenarios).toBe(before.scenarios)
    expect(after.settings).toBe(before.settings)
  })

  it('matches a full read after moves, labels, additions, removals, scenarios, settings and undo', () => {
    const { doc, mutate, latest, expectFullRead } = watchedDoc()
    const design = latest()
    const [first, second] = design.parts
    mutate.moveParts({ [first.id]: { x: first.position.x + 32, y: 7 } })
    expectFullRead()
    mutate.setPartLabel(second.id, 'Renamed')
    expectFullRead()
    const added = newPart(latest(), 'load', { x: 10, y: 20 })
    mutate.addParts([added])
    expectFullRead()
    expect(latest().scenarios.every((s) => added.id in s.loads)).toBe(true)
    mutate.setConductorField(design.conductors[0].id, 'lengthM', 4.5)
    expectFullRead()
    mutate.setScenarioLoad(design.scenarios[0].id, added.id, { on: false, level: 1 })
    expectFullRead()
    mutate.setSetting('unitSystem', 'imperial')
    expectFullRead()
    mutate.setName('Another name')
    expectFullRead()
    mutate.removeElements([second.id], [])
    expectFullRead()
    expect(latest().parts.some((p) => p.id === second.id)).toBe(false)
    const undo = new Y.UndoManager([doc.getMap('parts'), doc.getMap('conductors'), doc.getArray('scenarios')], { captureTimeout: 0, trackedOrigins: new Set(['local-edit']) })
    const fuse = latest().parts.find((p) => p.type === 'fuse')!
    mutate.setPartParam(fuse.id, 'ratingA', 2)
    undo.undo()
    expectFullRead()
    expect(latest().parts.find((p) => p.id === fuse.id)!.params).toEqual(fuse.params)
  })

  it('follows a peer’s update and a whole replacement', () => {
    const { doc, latest, expectFullRead } = watchedDoc()
    const peer = new Y.Doc()
    Y.applyUpdate(peer, Y.encodeStateAsUpdate(doc))
    const peerFuse = readDesignFromDoc(peer).parts.find((p) => p.type === 'fuse')!
    createDesignMutations(peer).setPartParam(peerFuse.id, 'ratingA', 40)
    Y.applyUpdate(doc, Y.encodeStateAsUpdate(peer))
    expectFullRead()
    expect((latest().parts.find((p) => p.id === peerFuse.id)!.params as { ratingA: number }).ratingA).toBe(40)

    const replacement = createDemoDesign()
    replacement.parts = replacement.parts.slice(2)
    replaceDesignInDoc(doc, replacement)
    expectFullRead()
    createDesignMutations(doc).replaceContent(createDemoDesign())
    expectFullRead()
  })
})
