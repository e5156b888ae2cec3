import { shallowReactive } from 'vue'
import type { AnalysisIndex } from './analysisIndex'
import type { Severity } from './analysisTypes'
import { formatAuto } from './format'

// What each node and conductor on the canvas shows from the analysis, kept in per-id reactive maps
// that are updated in place: a new result changes only the entries whose text or mark differs, so
// only those nodes and conductors re-render (a 500-part drawing otherwise re-renders every node and
// conductor on every result, since each one read the whole index).

export interface ConductorFigures {
  /** "12.5 A" in the scenario shown ('—' when not solved). */
  currentText: string
  /** "1.84 %" voltage drop in the scenario shown. */
  dropText: string
}

export interface CanvasMarks {
  worstByPart: Map<string, Severity>
  findingCountByPart: Map<string, number>
  worstByConductor: Map<string, Severity>
  figuresByConductor: Map<string, ConductorFigures>
  /** Terminal voltage text by "partId:terminalId" in the scenario shown. */
  terminalVoltsText: Map<string, string>
}

export function createCanvasMarks(): CanvasMarks {
  return {
    worstByPart: shallowReactive(new Map()),
    findingCountByPart: shallowReactive(new Map()),
    worstByConductor: shallowReactive(new Map()),
    figuresByConductor: shallowReactive(new Map()),
    terminalVoltsText: shallowReactive(new Map()),
  }
}

/** Makes `target` hold exactly `next`, touching only keys whose value changed (`same` decides), so
 * that only what reads a changed key re-renders. */
export function syncMap<V>(target: Map<string, V>, next: Map<string, V>, same: (a: V, b: V) => boolean = Object.is): void {
  for (const key of target.keys()) if (!next.has(key)) target.delete(key)
  for (const [key, value] of next) {
    const current = target.get(key)
    if (current === undefined || !same(current, value)) target.set(key, value)
  }
}

const sameFigures = (a: ConductorFigures, b: ConductorFigures) => a.currentText === b.currentText && a.dropText === b.dropText

// Text worked out once per result record: the worker hands unchanged records back as the same
// objects, so after an edit only the few records that changed are formatted again.
const figuresOfRun = new WeakMap<object, ConductorFigures>()
const voltsTextOf = new WeakMap<object, Map<string, string>>()

function figuresOf(run: { currentA: number; dropPercent: number }): ConductorFigures {
  let figures = figuresOfRun.get(run)
  if (!figures) {
    figures = { currentText: formatAuto(Math.abs(run.currentA), 'A'), dropText: formatAuto(run.dropPercent, '%') }
    figuresOfRun.set(run, figures)
  }
  return figures
}

function voltsTextFor(terminals: Record<string, number>): Map<string, string> {
  let texts = voltsTextOf.get(terminals)
  if (!texts) {
    texts = new Map(Object.entries(terminals).map(([key, volts]) => [key, formatAuto(volts, 'V')]))
    voltsTextOf.set(terminals, texts)
  }
  return texts
}

/** The scenario records each marks object was last synced from: the same records, nothing to do. */
const syncedFrom = new WeakMap<CanvasMarks, { conductors: unknown; terminals: unknown }>()

export function updateCanvasMarks(marks: CanvasMarks, index: AnalysisIndex): void {
  syncMap(marks.worstByPart, index.worstByPart)
  syncMap(marks.worstByConductor, index.worstByConductor)
  syncMap(marks.findingCountByPart, new Map([...index.findingsByPart].map(([id, list]) => [id, list.length])))
  const last = syncedFrom.get(marks)
  const conductors = index.scenario?.conductors ?? null
  if (conductors === null || last?.conductors !== conductors) {
    const figures = new Map<string, ConductorFigures>()
    for (const [id, run] of index.conductorRun) figures.set(id, figuresOf(run))
    syncMap(marks.figuresByConductor, figures, sameFigures)
  }
  if (last?.terminals !== index.terminals) syncMap(marks.terminalVoltsText, voltsTextFor(index.terminals))
  syncedFrom.set(marks, { conductors, terminals: index.terminals })
}
