import { PART_CATALOGUE, type ParamsOf } from './catalogue'
import type { Conductor, DesignSettings, Part, PartType } from './schema'

// Small helpers for writing designs in code (the demo, example files, tests): a part from the
// catalogue defaults plus overrides, and a conductor between "partId.terminal" references.

export function makePart<T extends PartType>(
  settings: DesignSettings,
  type: T,
  id: string,
  label: string,
  position: { x: number; y: number },
  params: Partial<ParamsOf<T>> = {},
): Part {
  const merged = { ...PART_CATALOGUE[type].defaultParams(settings), ...params }
  return { id, type, label, position: { ...position }, params: merged } as unknown as Part
}

export type ConductorOptions = Partial<Omit<Conductor, 'id' | 'label' | 'from' | 'to' | 'sizeId' | 'lengthM'>>

/** "bank.pos" → { partId: 'bank', terminal: 'pos' }. */
export function terminalRef(text: string): Conductor['from'] {
  const dot = text.indexOf('.')
  return dot < 0 ? { partId: text, terminal: '' } : { partId: text.slice(0, dot), terminal: text.slice(dot + 1) }
}

export function makeConductor(
  id: string,
  label: string,
  from: string,
  to: string,
  sizeId: Conductor['sizeId'],
  lengthM: number,
  options: ConductorOptions = {},
): Conductor {
  return {
    id, label, from: terminalRef(from), to: terminalRef(to), sizeId, lengthM,
    material: 'copper', insulationRatingC: 105, installation: 'free-air', bundledCount: 1, ambientC: null, sheathed: false,
    ...options,
  }
}
