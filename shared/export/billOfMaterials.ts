import { PART_CATALOGUE } from '../design/catalogue'
import type { Design, Part, PartType } from '../design/schema'
import { getConductorSize } from '../conductors/sizes'
import { DEVICE_FAMILIES, type DeviceFamilyId } from '../protection/ratings'
import { partRatingText } from './partSymbols'

// Bill of materials from the design alone: parts by kind, conductor length by size, colour and
// material (plus a waste allowance), a terminal or lug for every conductor end, and the protective
// devices by family and rating (fuse-panel ways included).

/** Extra cable bought for routing, trimming and mistakes: 10 % is common practice. */
export const DEFAULT_WASTE_ALLOWANCE_PCT = 10

export interface BomPartLine {
  type: PartType
  kind: string
  description: string
  quantity: number
  /** Labels of the parts in this line, as drawn. */
  labels: string[]
}

export interface BomConductorLine {
  sizeId: string
  sizeLabel: string
  colour: string
  material: string
  runs: number
  lengthM: number
  /** lengthM plus the waste allowance, rounded up to the next 0.5 m. */
  orderLengthM: number
}

export interface BomTerminalLine {
  sizeId: string
  sizeLabel: string
  /** Two per conductor: one at each end. */
  quantity: number
}

export interface BomDeviceLine {
  kind: 'fuse' | 'breaker'
  family: DeviceFamilyId
  familyLabel: string
  /** A device copied from the organisation's library: its own name (bought as that product). */
  libraryDeviceName?: string
  ratingA: number
  quantity: number
}

export interface BillOfMaterials {
  wasteAllowancePct: number
  parts: BomPartLine[]
  conductors: BomConductorLine[]
  terminals: BomTerminalLine[]
  devices: BomDeviceLine[]
}

const sizeLabel = (id: string) => {
  try {
    return getConductorSize(id).label
  } catch {
    return id
  }
}

const sizeOrder = (id: string) => {
  try {
    const s = getConductorSize(id)
    return (s.system === 'awg' ? 0 : 100) + s.rank
  } catch {
    return 1000
  }
}

/** Units a part stands for: a bank of 2S2P is four batteries; a PV array counts modules. */
function unitsOf(part: Part): { quantity: number; description: string } {
  if (part.type === 'battery') {
    const p = part.params
    return { quantity: p.seriesCount * p.parallelCount, description: `${p.chemistry.toUpperCase()} battery ${p.nominalVoltageV} V ${p.capacityAh} Ah` }
  }
  if (part.type === 'pv-array') {
    const p = part.params
    return { quantity: p.modulesPerString * p.strings, description: `PV module Voc ${p.moduleVocV} V, Isc ${p.moduleIscA} A, Vmp ${p.moduleVmpV} V, Imp ${p.moduleImpA} A` }
  }
  if (part.type === 'load') return { quantity: 1, description: part.label || partRatingText(part) }
  return { quantity: 1, description: partRatingText(part) }
}

export function buildBillOfMaterials(design: Design, options: { wasteAllowancePct?: number } = {}): BillOfMaterials {
  const wasteAllowancePct = options.wasteAllowancePct ?? DEFAULT_WASTE_ALLOWANCE_PCT
  const parts = new Map<string, BomPartLine>()
  const devices = new Map<string, BomDeviceLine>()
  const addDevice = (kind: 'fuse' | 'breaker', family: DeviceFamilyId, ratingA: number, libraryDeviceName?: string) => {
    const key = `${kind}|${family}|${ratingA}|${libraryDeviceName ?? ''}`
    const familyLabel = DEVICE_FAMILIES[family]?.label ?? family
    const line = devices.get(key)
      ?? { kind, family, familyLabel: libraryDeviceName ? `${libraryDeviceName} (library device)` : familyLabel, libraryDeviceName, ratingA, quantity: 0 }
    line.quantity += 1
    devices.set(key, line)
  }
  for (const part of design.parts) {
    if (part.type === 'fuse' || part.type === 'breaker') {
      addDevice(part.type, part.params.family, part.params.ratingA, part.params.customDevice?.name)
      continue
    }
    if (part.type === 'fuse-panel') {
      part.params.wayRatingsA.slice(0, part.params.ways).forEach((ratingA) => addDevice('fuse', part.params.family, ratingA))
    }
    const { quantity, description } = unitsOf(part)
    const key = `${part.type}|${description}`
    const line = parts.get(key) ?? { type: part.type, kind: PART_CATALOGUE[part.type].label, description, quantity: 0, labels: [] }
    line.quantity += quantity
    line.labels.push(part.label || part.id)
    parts.set(key, line)
  }

  const conductors = new Map<string, BomConductorLine>()
  const terminals = new Map<string, BomTerminalLine>()
  for (const c of design.conductors) {
    const colour = c.colour?.trim() || 'unspecified'
    const key = `${c.sizeId}|${colour}|${c.material}`
    const line = conductors.get(key) ?? { sizeId: c.sizeId, sizeLabel: sizeLabel(c.sizeId), colour, material: c.material, runs: 0, lengthM: 0, orderLengthM: 0 }
    line.runs += 1
    line.lengthM += c.lengthM
    conductors.set(key, line)
    const t = terminals.get(c.sizeId) ?? { sizeId: c.sizeId, sizeLabel: sizeLabel(c.sizeId), quantity: 0 }
    t.quantity += 2
    terminals.set(c.sizeId, t)
  }
  for (const line of conductors.values()) {
    line.lengthM = Math.round(line.lengthM * 1000) / 1000
    line.orderLengthM = Math.ceil(line.lengthM * (1 + wasteAllowancePct / 100) * 2 - 1e-9) / 2
  }

  const typeOrder = (t: PartType) => Object.keys(PART_CATALOGUE).indexOf(t)
  return {
    wasteAllowancePct,
    parts: [...parts.values()].sort((a, b) => typeOrder(a.type) - typeOrder(b.type) || a.description.localeCompare(b.description)),
    conductors: [...conductors.values()].sort((a, b) => sizeOrder(a.sizeId) - sizeOrder(b.sizeId) || a.colour.localeCompare(b.colour) || a.material.localeCompare(b.material)),
    terminals: [...terminals.values()].sort((a, b) => sizeOrder(a.sizeId) - sizeOrder(b.sizeId)),
    devices: [...devices.values()].sort((a, b) => a.kind.localeCompare(b.kind) || a.familyLabel.localeCompare(b.familyLabel) || a.ratingA - b.ratingA),
  }
}
