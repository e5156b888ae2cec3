import { getConductorSize } from '../conductors/sizes'
import type { Material } from '../conductors/materials'
import { MM2_PER_CMIL } from '../units/area'
import type { SourceStatus } from './timeCurrent/types'

// Conductor short-circuit withstand: how long a conductor may carry a fault current before its
// insulation is damaged. Adiabatic (all heat stays in the metal), valid for short faults.

/** ICEA P-32-382 (two reproductions agree): (I/A)²·t = K·log10[(T2 + β)/(T1 + β)], A in cmil. */
const ICEA = {
  copper: { K: 0.0297, betaC: 234 },
  aluminium: { K: 0.0125, betaC: 228 },
} as const
export const ICEA_SOURCE = 'ICEA P-32-382 adiabatic short-circuit relation (two public reproductions agree)'

/** Beyond a few seconds heat leaves the conductor and the adiabatic time is pessimistic (short). */
export const ADIABATIC_VALID_UP_TO_S = 5

export type InsulationClass = 'thermoplastic' | 'thermoset'

export interface ShortCircuitLimit {
  insulation: InsulationClass
  finalC: number
  source: string
  status: SourceStatus
}

const LIMITS: Record<InsulationClass, ShortCircuitLimit> = {
  thermoplastic: {
    insulation: 'thermoplastic',
    finalC: 150,
    source: 'ICEA short-circuit temperature for thermoplastic (PVC) insulation, 150 °C (recalled, unverified)',
    status: 'recalled',
  },
  thermoset: {
    insulation: 'thermoset',
    finalC: 250,
    source: "ICEA short-circuit temperature for thermoset (XLPE/EPR) insulation, 250 °C (a cable maker's sheet)",
    status: 'verified',
  },
}

/**
 * The insulation's short-circuit temperature limit. The design records only a temperature rating, so
 * ratings up to 105 °C are taken as thermoplastic (PVC boat and automotive cable; the lower limit is the
 * safe assumption) and 125 °C and above as cross-linked (thermoset), unless the class is given.
 */
export function shortCircuitLimit(options: { insulationRatingC: number; insulation?: InsulationClass }): ShortCircuitLimit {
  const insulation = options.insulation ?? (options.insulationRatingC >= 125 ? 'thermoset' : 'thermoplastic')
  return LIMITS[insulation]
}

export interface ConductorArea {
  sizeId?: string
  areaCmil?: number
  areaMm2?: number
}

/** Area in cmil from a size id (shared/conductors) or a given area; throws a RangeError when none is usable. */
export function areaCmilOf(area: ConductorArea): number {
  if (area.sizeId !== undefined) return getConductorSize(area.sizeId).areaCmil
  if (area.areaCmil !== undefined && area.areaCmil > 0) return area.areaCmil
  if (area.areaMm2 !== undefined && area.areaMm2 > 0) return area.areaMm2 / MM2_PER_CMIL
  throw new RangeError('Conductor area is missing: give sizeId, areaCmil or areaMm2 (positive)')
}

function iceaConstants(material: Material) {
  // Tin plating is a small part of the section; tinned copper takes copper's constants.
  if (material === 'aluminium') return ICEA.aluminium
  if (material === 'copper' || material === 'tinned-copper') return ICEA.copper
  throw new RangeError(`Unknown conductor material "${String(material)}"`)
}

export interface WithstandOptions extends ConductorArea {
  material: Material
  /** Conductor temperature when the fault starts (normally its insulation rating). */
  initialC: number
  /** Insulation short-circuit limit (see shortCircuitLimit). */
  finalC: number
}

/** I²t (A²·s) the conductor can take from initialC to finalC: K·log10(...)·A². */
export function withstandI2tA2s(options: WithstandOptions): number {
  const { K, betaC } = iceaConstants(options.material)
  if (!(options.finalC > options.initialC)) {
    throw new RangeError(`Final temperature (${options.finalC} °C) must be above the initial temperature (${options.initialC} °C)`)
  }
  const areaCmil = areaCmilOf(options)
  return K * Math.log10((options.finalC + betaC) / (options.initialC + betaC)) * areaCmil * areaCmil
}

/**
 * Seconds the conductor withstands `currentA` before reaching finalC (ICEA P-32-382, adiabatic).
 * @example withstandTimeS({ sizeId: 'awg-4/0', material: 'copper', currentA: 10_000, initialC: 90, finalC: 250 }) // ≈ 2.32
 */
export function withstandTimeS(options: WithstandOptions & { currentA: number }): number {
  if (!(options.currentA > 0)) throw new RangeError(`Fault current must be a positive number of amperes, got ${options.currentA}`)
  return withstandI2tA2s(options) / (options.currentA * options.currentA)
}

/** The conductor's damage curve (current for each time) for a time–current chart, 10 ms to 5 s. */
export function damageCurve(options: WithstandOptions & { fromS?: number; toS?: number; count?: number }) {
  const i2t = withstandI2tA2s(options)
  const fromS = options.fromS ?? 0.01
  const toS = options.toS ?? ADIABATIC_VALID_UP_TO_S
  const count = options.count ?? 20
  const points = []
  for (let i = 0; i < count; i++) {
    const timeS = fromS * Math.pow(toS / fromS, i / (count - 1))
    points.push({ currentA: Math.sqrt(i2t / timeS), timeS })
  }
  return { points, i2tA2s: i2t, source: ICEA_SOURCE }
}

// IEC 60364-4-43 / IEC 60949 adiabatic form: t = (k·S/I)², S in mm² (two reproductions agree).
export const IEC_K_SOURCE = 'IEC 60364-4-43 k factors (two public reproductions agree)'
const IEC_K: Record<'copper' | 'aluminium', Record<InsulationClass, number>> = {
  copper: { thermoplastic: 115, thermoset: 143 }, // Cu/PVC 70 → 160 °C; Cu/XLPE-EPR 90 → 250 °C
  aluminium: { thermoplastic: 76, thermoset: 94 },
}

export function iecK(material: Material, insulation: InsulationClass): number {
  return IEC_K[material === 'aluminium' ? 'aluminium' : 'copper'][insulation]
}

/**
 * k from the temperatures, IEC 60949 general expression (computed): k = 226·√ln[(θf + 234.5)/(θi + 234.5)]
 * for copper, 148·√ln[(θf + 228)/(θi + 228)] for aluminium. Reproduces 115.0 and 143.1.
 */
export function iecKFromTemperatures(material: Material, initialC: number, finalC: number): number {
  const [c, beta] = material === 'aluminium' ? [148, 228] : [226, 234.5]
  return c * Math.sqrt(Math.log((finalC + beta) / (initialC + beta)))
}

/** Seconds the conductor withstands `currentA`: (k·S/I)², IEC 60364-4-43. */
export function iecWithstandTimeS(options: { areaMm2: number; currentA: number; k: number }): number {
  if (!(options.currentA > 0) || !(options.areaMm2 > 0) || !(options.k > 0)) {
    throw new RangeError('Area, current and k must all be positive numbers')
  }
  const ratio = (options.k * options.areaMm2) / options.currentA
  return ratio * ratio
}
