// The canvas's per-id marks: after a new analysis result only the entries whose mark or figures
// changed are written, so only those nodes and conductors re-render. The results come from the
// real analysis of the demo design before and after an edit (a branch fuse set to 1 A, which the
// analysis flags as opening under normal load); the expected changes are worked out from the two
// indexes directly.
import { describe, expect, it } from 'vitest'
import { effect } from 'vue'
import { analyzeDesign } from '@shared/analysis/analyzeDesign'
import { createDemoDesign } from '@shared/design/demo'
import { indexAnalysis, type AnalysisIndex } from '@/components/editor/model/analysisIndex'
import { createCanvasMarks, updateCanvasMarks, type CanvasMarks } from '@/components/editor/model/canvasMarks'
import { formatAuto } from '@/components/editor/model/format'

function indexOf(design: ReturnType<typeof createDemoDesign>): AnalysisIndex {
  const result = analyzeDesign(design)
  return indexAnalysis(result, design.scenarios[0]?.id ?? null)
}

/** Runs an effect per id that reads that id's entry; returns the ids whose effect re-ran. */
function watchEntries(marks: CanvasMarks, partIds: string[], conductorIds: string[]) {
  const reran = new Set<string>()
  const track = (id: string, read: () => unknown) => {
    let first = true
    effect(() => {
      read()
      if (!first) reran.add(id)
      first = false
    })
  }
  for (const id of partIds) track(`part:${id}`, () => [marks.worstByPart.get(id), marks.findingCountByPart.get(id)])
  for (const id of conductorIds) track(`conductor:${id}`, () => [marks.worstByConductor.get(id), marks.figuresByConductor.get(id)])
  return reran
}

describe('canvas marks', () => {
  const before = createDemoDesign()
  const indexBefore = indexOf(before)
  const withOneAmp = (id: string) => {
    const design = structuredClone(before)
    ;(design.parts.find((p) => p.id === id)!.params as Record<string, unknown>).ratingA = 1
    return design
  }
  // The first fuse that carries load in the demo's first scenario.
  const fuse = before.parts.find((p) => p.type === 'fuse' && Math.abs(indexBefore.partRun.get(p.id)?.currentA ?? 0) > 2)!
  const indexAfter = indexOf(withOneAmp(fuse.id))

  it('holds what the index says, as the text the canvas shows', () => {
    const marks = createCanvasMarks()
    updateCanvasMarks(marks, indexBefore)
    expect(new Map(marks.worstByPart)).toEqual(indexBefore.worstByPart)
    expect(new Map(marks.worstByConductor)).toEqual(indexBefore.worstByConductor)
    for (const [id, list] of indexBefore.findingsByPart) expect(marks.findingCountByPart.get(id)).toBe(list.length)
    for (const [id, run] of indexBefore.conductorRun) {
      expect(marks.figuresByConductor.get(id)).toEqual({ currentText: formatAuto(Math.abs(run.currentA), 'A'), dropText: formatAuto(run.dropPercent, '%') })
    }
    expect(marks.terminalVoltsText.size).toBe(Object.keys(indexBefore.terminals).length)
  })

  it('after the edit, touches exactly the parts and conductors whose mark or figures changed', () => {
    expect(indexAfter.worstByPart.get(fuse.id)).toBe('error') // the 1 A fuse opens under load
    const marks = createCanvasMarks()
    updateCanvasMarks(marks, indexBefore)
    const partIds = before.parts.map((p) => p.id)
    const conductorIds = before.conductors.map((c) => c.id)
    const reran = watchEntries(marks, partIds, conductorIds)
    updateCanvasMarks(marks, indexAfter)

    const expected = new Set<string>()
    for (const id of partIds) {
      const count = (i: AnalysisIndex) => i.findingsByPart.get(id)?.length
      if (indexBefore.worstByPart.get(id) !== indexAfter.worstByPart.get(id) || count(indexBefore) !== count(indexAfter)) expected.add(`part:${id}`)
    }
    const text = (i: AnalysisIndex, id: string) => {
      const run = i.conductorRun.get(id)
      return run ? `${formatAuto(Math.abs(run.currentA), 'A')} ${formatAuto(run.dropPercent, '%')}` : ''
    }
    for (const id of conductorIds) {
      if (indexBefore.worstByConductor.get(id) !== indexAfter.worstByConductor.get(id) || text(indexBefore, id) !== text(indexAfter, id)) expected.add(`conductor:${id}`)
    }
    expect(expected.has(`part:${fuse.id}`)).toBe(true)
    expect(expected.size).toBeLessThan(partIds.length + conductorIds.length)
    expect([...reran].sort()).toEqual([...expected].sort())
  })

  it('writes nothing when the same result comes again', () => {
    const marks = createCanvasMarks()
    updateCanvasMarks(marks, indexBefore)
    const reran = watchEntries(marks, before.parts.map((p) => p.id), before.conductors.map((c) => c.id))
    updateCanvasMarks(marks, indexOf(before))
    expect(reran.size).toBe(0)
  })
})
