// The design on its way to the analysis worker: after the first one, only the parts and conductors
// whose objects changed (the editor's snapshot keeps the objects of untouched ones) and the settings
// and scenarios only when they changed.
import type { Conductor, Design, Part } from '@shared/design/schema'
import { createListDecoder, createListEncoder, type ListDelta } from './listDelta'

export interface DesignDelta {
  head: Pick<Design, 'format' | 'version' | 'id' | 'name'>
  /** Absent when the same object as in the previous delta. */
  settings?: Design['settings']
  scenarios?: Design['scenarios']
  parts: ListDelta<Part>
  conductors: ListDelta<Conductor>
}

export function createDesignEncoder() {
  const parts = createListEncoder<Part>(Object.is)
  const conductors = createListEncoder<Conductor>(Object.is)
  let previous: Design | null = null
  return {
    encode(design: Design): DesignDelta {
      const { format, version, id, name } = design
      const delta: DesignDelta = { head: { format, version, id, name }, parts: parts.encode(design.parts), conductors: conductors.encode(design.conductors) }
      if (design.settings !== previous?.settings) delta.settings = design.settings
      if (design.scenarios !== previous?.scenarios) delta.scenarios = design.scenarios
      previous = design
      return delta
    },
    /** The next design goes in full. */
    reset(): void {
      parts.reset()
      conductors.reset()
      previous = null
    },
  }
}

export function createDesignDecoder(): (delta: DesignDelta) => Design {
  const parts = createListDecoder<Part>()
  const conductors = createListDecoder<Conductor>()
  let settings: Design['settings'] | undefined
  let scenarios: Design['scenarios'] | undefined
  return (delta) => {
    settings = delta.settings ?? settings
    scenarios = delta.scenarios ?? scenarios
    if (!settings || !scenarios) throw new Error('the first design sent to the worker lacks its settings or scenarios')
    return { ...delta.head, settings, parts: parts(delta.parts), conductors: conductors(delta.conductors), scenarios } as Design
  }
}
