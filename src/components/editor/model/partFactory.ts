import { PART_CATALOGUE } from '@shared/design/catalogue'
import { newUniqueId } from '@shared/design/ids'
import type { Conductor, Design, Part, PartType, TerminalRef } from '@shared/design/schema'

// New parts and conductors with sensible defaults, and copies of a selection with fresh ids.

const ID_PREFIX: Record<PartType, string> = {
  battery: 'bat', 'pv-array': 'pv', 'charge-controller': 'cc', 'dc-dc-charger': 'dcdc', 'mains-charger': 'chg',
  inverter: 'inv', 'bus-bar': 'bus', 'fuse-panel': 'panel', fuse: 'fuse', breaker: 'cb', 'battery-switch': 'sw',
  shunt: 'shunt', load: 'load',
}

function takenIds(design: Design): Set<string> {
  return new Set([...design.parts.map((p) => p.id), ...design.conductors.map((c) => c.id)])
}

/** "Fuse 3": the catalogue name and the next free number among parts of that type. */
function nextLabel(design: Design, base: string): string {
  const used = new Set(design.parts.map((p) => p.label))
  for (let n = 1; ; n++) {
    const label = `${base} ${n}`
    if (!used.has(label)) return label
  }
}

export function newPart(design: Design, type: PartType, position: { x: number; y: number }): Part {
  const info = PART_CATALOGUE[type]
  return {
    id: newUniqueId(ID_PREFIX[type], takenIds(design)),
    type,
    label: nextLabel(design, info.label),
    position,
    params: info.defaultParams(design.settings),
  } as Part
}

export function newConductor(design: Design, from: TerminalRef, to: TerminalRef): Conductor {
  const used = new Set(design.conductors.map((c) => c.label))
  let n = design.conductors.length + 1
  while (used.has(`W${n}`)) n++
  return {
    id: newUniqueId('w', takenIds(design)),
    label: `W${n}`,
    from,
    to,
    // A common branch-circuit size in either system; the findings say when it is wrong.
    sizeId: design.settings.unitSystem === 'imperial' ? 'awg-10' : 'mm2-6',
    material: 'copper',
    lengthM: 1,
    insulationRatingC: 105,
    installation: 'free-air',
    bundledCount: 1,
    ambientC: null,
    sheathed: false,
  }
}

export interface Clip {
  parts: Part[]
  conductors: Conductor[]
}

/** The selected parts and the conductors that run between two of them. */
export function copySelection(design: Design, partIds: readonly string[]): Clip {
  const ids = new Set(partIds)
  return structuredClone({
    parts: design.parts.filter((p) => ids.has(p.id)),
    conductors: design.conductors.filter((c) => ids.has(c.from.partId) && ids.has(c.to.partId)),
  })
}

/** A clip re-labelled with fresh ids, moved by `offset`, ready to add to `design`. */
export function cloneClip(design: Design, clip: Clip, offset: { x: number; y: number }): Clip {
  const taken = takenIds(design)
  const idMap = new Map<string, string>()
  const parts = clip.parts.map((part) => {
    const id = newUniqueId(ID_PREFIX[part.type], taken)
    taken.add(id)
    idMap.set(part.id, id)
    return { ...structuredClone(part), id, position: { x: part.position.x + offset.x, y: part.position.y + offset.y } }
  })
  const conductors = clip.conductors.map((conductor) => {
    const id = newUniqueId('w', taken)
    taken.add(id)
    return {
      ...structuredClone(conductor),
      id,
      from: { ...conductor.from, partId: idMap.get(conductor.from.partId) ?? conductor.from.partId },
      to: { ...conductor.to, partId: idMap.get(conductor.to.partId) ?? conductor.to.partId },
    }
  })
  return { parts: parts as Part[], conductors }
}
