// What travels between the editor and its analysis worker: designs and results sent as changes
// against the previous message must arrive exactly as they left, through edits, additions,
// removals and reorderings, with unchanged records keeping their objects on the receiving side.
import { describe, expect, it } from 'vitest'
import { analyzeDesign } from '@shared/analysis/analyzeDesign'
import { createDemoDesign } from '@shared/design/demo'
import { newPart } from '@/components/editor/model/partFactory'
import { createDesignDecoder, createDesignEncoder } from '@/workers/designTransfer'
import { createResultDecoder, createResultEncoder } from '@/workers/resultTransfer'
import { createListDecoder, createListEncoder } from '@/workers/listDelta'
import { demoDocSnapshots } from './demoDocSnapshots'

/** The demo design in a Y.Doc, and every snapshot the editor would take of it. */
function editedDemo() {
  const { snapshots, mutate } = demoDocSnapshots()
  return { designs: snapshots, mutate }
}

describe('list changes', () => {
  it('rebuilds the list through changes, additions, removals, reordering and repeated ids', () => {
    const encoder = createListEncoder<{ id: string; v: number }>((a, b) => a.v === b.v)
    const decode = createListDecoder<{ id: string; v: number }>()
    const lists = [
      [{ id: 'a', v: 1 }, { id: 'b', v: 2 }, { id: 'c', v: 3 }],
      [{ id: 'a', v: 1 }, { id: 'b', v: 20 }, { id: 'c', v: 3 }],
      [{ id: 'c', v: 3 }, { id: 'a', v: 1 }, { id: 'd', v: 4 }],
      [{ id: 'd', v: 4 }, { id: 'd', v: 5 }],
      [{ id: 'd', v: 4 }],
      [],
      [{ id: 'e', v: 6 }],
    ]
    let previous: { id: string; v: number }[] = []
    for (const list of lists) {
      const delta = encoder.encode(list)
      const out = decode(structuredClone(delta))
      expect(out).toEqual(list)
      // Records equal to the previous list's arrive as the previous objects.
      for (const item of out) {
        const before = previous.find((p) => p.id === item.id)
        if (before && before.v === item.v && !('full' in delta)) expect(item).toBe(before)
      }
      previous = out
    }
    const second = encoder.encode([{ id: 'e', v: 6 }])
    expect(second).toEqual({ ids: null, changed: [] })
  })
})

describe('design to the worker', () => {
  it('arrives equal to the snapshot after every kind of edit, carrying only what changed', () => {
    const { designs, mutate } = editedDemo()
    const encoder = createDesignEncoder()
    const decode = createDesignDecoder()
    const first = encoder.encode(designs[0])
    expect('full' in first.parts && first.parts.full).toHaveLength(designs[0].parts.length)
    expect(decode(structuredClone(first))).toEqual(designs[0])

    const fuse = designs[0].parts.find((p) => p.type === 'fuse')!
    mutate.setPartParam(fuse.id, 'ratingA', 7)
    const edit = encoder.encode(designs.at(-1)!)
    expect(edit.parts).toEqual({ ids: null, changed: [designs.at(-1)!.parts.find((p) => p.id === fuse.id)] })
    expect(edit.conductors).toEqual({ ids: null, changed: [] })
    expect(edit.settings).toBeUndefined()
    expect(edit.scenarios).toBeUndefined()
    expect(decode(structuredClone(edit))).toEqual(designs.at(-1))

    const load = newPart(designs.at(-1)!, 'load', { x: 0, y: 0 })
    const steps = [
      () => mutate.addParts([load]),
      () => mutate.setScenarioLoad(designs[0].scenarios[0].id, load.id, { on: false, level: 1 }),
      () => mutate.setSetting('defaultAmbientC', 45),
      () => mutate.setConductorField(designs[0].conductors[2].id, 'lengthM', 9),
      () => mutate.removeElements([designs[0].parts[3].id], []),
      () => mutate.setName('Renamed'),
      () => mutate.replaceContent(createDemoDesign()),
    ]
    for (const step of steps) {
      step()
      expect(decode(structuredClone(encoder.encode(designs.at(-1)!)))).toEqual(designs.at(-1))
    }
  })

  it('starts over in full after a reset', () => {
    const { designs } = editedDemo()
    const encoder = createDesignEncoder()
    encoder.encode(designs[0])
    encoder.reset()
    // A receiver that never saw the first message reads the one after the reset on its own.
    expect(createDesignDecoder()(structuredClone(encoder.encode(designs[0])))).toEqual(designs[0])
  })
})

describe('result from the worker', () => {
  it('arrives equal to the analysis, re-sending only findings and figures that changed', () => {
    const { designs, mutate } = editedDemo()
    const encode = createResultEncoder()
    const decode = createResultDecoder()
    const firstResult = analyzeDesign(designs[0], {})
    const first = decode(structuredClone(encode(firstResult)))
    expect(first).toEqual(firstResult)

    // A fuse far below its load: one more finding, the figures of every scenario as they were.
    const fuse = designs[0].parts.find((p) => p.type === 'fuse' && p.id === 'panel-fuse')!
    mutate.setPartParam(fuse.id, 'ratingA', 1)
    const nextResult = analyzeDesign(designs.at(-1)!, {})
    const delta = encode(nextResult)
    const next = decode(structuredClone(delta))
    expect(next).toEqual(nextResult)
    expect('changed' in delta.findings && delta.findings.changed.length).toBeLessThan(nextResult.findings.length)
    const kept = next.findings.filter((f) => first.findings.includes(f))
    expect(kept.length).toBeGreaterThan(0)
    for (const f of kept) expect(f).toEqual(firstResult.findings.find((g) => g.id === f.id))

    // Scenarios removed and reordered.
    mutate.replaceContent({ ...createDemoDesign(), scenarios: createDemoDesign().scenarios.slice(1).reverse() })
    const reordered = analyzeDesign(designs.at(-1)!, {})
    expect(decode(structuredClone(encode(reordered)))).toEqual(reordered)
    expect(decode(structuredClone(encode(firstResult)))).toEqual(firstResult)
  })
})
