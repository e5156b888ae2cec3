import type { Material } from './materials'
import type { CodeProfile, Installation, InsulationRatingC } from './profiles'
import { getConductorSize, sizesInOrder, type ConductorSizeId, type SizeSystem } from './sizes'
import { conductorAmpacityA, type AmpacityResult } from './ampacity'
import { circuitDrop } from './voltageDrop'
import type { GaugeStandard, IecConductorClass } from './resistance'
import { ConductorInputError, requireNonNegative, requirePositive } from './_lib/inputs'

export interface SuggestInput {
  /** design current the conductor must carry, A (apply any continuous-load margin before calling) */
  currentA: number
  /** one-way length, m */
  lengthM: number
  allowedDropPercent: number
  nominalV: number
  material: Material
  insulationRatingC: InsulationRatingC
  ambientC: number
  installation: Installation
  bundledCount?: number
  profile: CodeProfile
  system: SizeSystem
  circuitVoltageV?: number
  /**
   * conductor temperature for the drop, °C. Default: building 75 °C (the NEC Chapter 9 Table 8 basis);
   * marine and vehicle the ambient (the ABYC method's K = 10.75 is copper at about 30 °C).
   */
  conductorTemperatureC?: number
  iecClass?: IecConductorClass
  gaugeStandard?: GaugeStandard
  /** smallest size to consider; default per profile (MINIMUM_SIZES) */
  minSizeId?: ConductorSizeId
}

/**
 * Smallest conductor allowed by the profile for a conductor installed on its own:
 * marine 16 AWG (33 CFR 183.425(e); 18 AWG only inside a multiconductor sheath, 183.425(d)) and
 * 1 mm² (ISO 10133: ≥ 1 mm² installed separately, 0.75 mm² in a sheath); vehicle the same as common
 * practice; building none here (the NEC's minimums depend on the circuit class).
 */
export const MINIMUM_SIZES: Readonly<Record<CodeProfile, Partial<Record<SizeSystem, ConductorSizeId>>>> = {
  marine: { awg: 'awg-16', metric: 'mm2-1' },
  vehicle: { awg: 'awg-16', metric: 'mm2-1' },
  building: {},
}

export interface SuggestResult {
  sizeId: ConductorSizeId
  ampacity: AmpacityResult
  dropV: number
  dropPercent: number
  conductorTemperatureC: number
}

/** Default conductor temperature used for voltage drop under each profile. */
export function dropTemperatureC(profile: CodeProfile, ambientC: number): number {
  return profile === 'building' ? 75 : ambientC
}

/**
 * The smallest standard size of the system, not below the profile's minimum, whose ampacity carries the
 * current and whose loop drop is within the allowance; null when no size in the range passes both.
 * @example smallestPassingSize({ currentA: 20, lengthM: 6, allowedDropPercent: 10, nominalV: 12, material: 'copper',
 *   insulationRatingC: 105, ambientC: 30, installation: 'free-air', profile: 'marine', system: 'awg' })?.sizeId // 'awg-10'
 */
export function smallestPassingSize(input: SuggestInput): SuggestResult | null {
  requireNonNegative(input.currentA, 'currentA')
  requirePositive(input.allowedDropPercent, 'allowedDropPercent')
  const conductorTemperatureC = input.conductorTemperatureC ?? dropTemperatureC(input.profile, input.ambientC)
  const minSizeId = input.minSizeId ?? MINIMUM_SIZES[input.profile][input.system]
  const minRank = minSizeId ? getConductorSize(minSizeId).rank : 0
  if (minSizeId && getConductorSize(minSizeId).system !== input.system)
    throw new ConductorInputError('minSizeId', `must be a ${input.system} size`)
  for (const size of sizesInOrder(input.system).slice(minRank)) {
    const ampacity = conductorAmpacityA({
      sizeId: size.id, material: input.material, insulationRatingC: input.insulationRatingC, ambientC: input.ambientC,
      installation: input.installation, bundledCount: input.bundledCount, profile: input.profile,
      circuitVoltageV: input.circuitVoltageV,
    })
    if (ampacity.ampacityA === null || ampacity.ampacityA < input.currentA) continue
    const drop = circuitDrop({
      currentA: input.currentA, sizeId: size.id, material: input.material, lengthM: input.lengthM,
      temperatureC: conductorTemperatureC, nominalV: input.nominalV, iecClass: input.iecClass,
      gaugeStandard: input.gaugeStandard,
    })
    if (drop.dropPercent <= input.allowedDropPercent + 1e-12)
      return { sizeId: size.id, ampacity, dropV: drop.dropV, dropPercent: drop.dropPercent, conductorTemperatureC }
  }
  return null
}
