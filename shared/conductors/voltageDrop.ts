import type { Material } from './materials'
import type { CodeProfile } from './profiles'
import { sizesInOrder, type ConductorSize, type SizeSystem } from './sizes'
import { conductorResistanceOhm, type GaugeStandard, type IecConductorClass } from './resistance'
import { requireFinite, requireNonNegative, requirePositive } from './_lib/inputs'

/**
 * Drop across a resistance, V. For a two-wire DC circuit pass the loop resistance (out and back).
 * @example voltageDropV({ currentA: 20, resistanceOhm: 0.0418 }) // 0.836
 */
export function voltageDropV({ currentA, resistanceOhm }: { currentA: number; resistanceOhm: number }): number {
  requireFinite(currentA, 'currentA')
  requireNonNegative(resistanceOhm, 'resistanceOhm')
  return Math.abs(currentA) * resistanceOhm
}

/**
 * Drop as a percentage of the nominal voltage.
 * @example dropPercent(0.836, 12) // 6.97
 */
export function dropPercent(dropV: number, nominalV: number): number {
  requireFinite(dropV, 'dropV')
  requirePositive(nominalV, 'nominalV')
  return (100 * dropV) / nominalV
}

export interface DropLimit {
  percent: number
  appliesTo: string
}

export interface ProfileDropLimits {
  critical: DropLimit
  general: DropLimit
  source: string
  status: 'verified' | 'common practice' | 'informational note, recalled'
}

export const VOLTAGE_DROP_LIMITS: Readonly<Record<CodeProfile, ProfileDropLimits>> = {
  marine: {
    critical: { percent: 3, appliesTo: 'panelboard main feeders, bilge blowers, electronics, navigation lights (ISO 10133 adds bilge pumps)' },
    general: { percent: 10, appliesTo: 'lighting other than navigation lights and other non-critical circuits' },
    source: 'ABYC E-11 (quoted in an equipment maker\'s FAQ) and ISO 10133',
    status: 'verified',
  },
  vehicle: {
    critical: { percent: 3, appliesTo: 'feeders, electronics, charging circuits' },
    general: { percent: 10, appliesTo: 'lighting and other non-critical circuits' },
    source: 'the marine 3 % / 10 % figures, applied to vehicles as common practice',
    status: 'common practice',
  },
  building: {
    critical: { percent: 3, appliesTo: 'a branch circuit to the farthest outlet' },
    general: { percent: 5, appliesTo: 'feeder and branch circuit together' },
    source: 'NEC 210.19(A) informational note (advisory, not a requirement)',
    status: 'informational note, recalled',
  },
}

export interface CircuitDropInput {
  currentA: number
  sizeId: ConductorSize['id']
  material: Material
  /** one-way length; the loop is twice this */
  lengthM: number
  temperatureC: number
  nominalV: number
  iecClass?: IecConductorClass
  gaugeStandard?: GaugeStandard
}

/** Drop over the out-and-back loop of a two-wire circuit with both conductors the same size. */
export function circuitDrop(input: CircuitDropInput): { loopResistanceOhm: number; dropV: number; dropPercent: number } {
  const loopResistanceOhm =
    2 *
    conductorResistanceOhm({
      sizeId: input.sizeId, material: input.material, lengthM: input.lengthM,
      temperatureC: input.temperatureC, iecClass: input.iecClass, gaugeStandard: input.gaugeStandard,
    })
  const dropV = voltageDropV({ currentA: input.currentA, resistanceOhm: loopResistanceOhm })
  return { loopResistanceOhm, dropV, dropPercent: dropPercent(dropV, input.nominalV) }
}

export interface SmallestForDropInput extends Omit<CircuitDropInput, 'sizeId'> {
  allowedDropPercent: number
  system: SizeSystem
}

/**
 * The smallest size whose loop drop is within the allowance; null when even the largest is not.
 * @example smallestSizeForDrop({ currentA: 20, lengthM: 6, temperatureC: 30, nominalV: 12,
 *   allowedDropPercent: 3, material: 'copper', system: 'awg' })?.sizeId // 'awg-6'
 */
export function smallestSizeForDrop(
  input: SmallestForDropInput,
): { sizeId: ConductorSize['id']; dropV: number; dropPercent: number } | null {
  requirePositive(input.allowedDropPercent, 'allowedDropPercent')
  for (const size of sizesInOrder(input.system)) {
    const drop = circuitDrop({ ...input, sizeId: size.id })
    if (drop.dropPercent <= input.allowedDropPercent + 1e-12) return { sizeId: size.id, dropV: drop.dropV, dropPercent: drop.dropPercent }
  }
  return null
}
