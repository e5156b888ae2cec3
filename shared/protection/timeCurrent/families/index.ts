import type { FamilyTimeCurrent } from '../types'
import { BLADE_FAMILIES } from './blade'
import { BREAKER_FAMILIES } from './breakers'
import { CARTRIDGE_FAMILIES } from './cartridge'
import { HIGH_CURRENT_FAMILIES } from './highCurrent'

// Keyed by the device-family ids of shared/protection/ratings.ts (the catalogue of ratings,
// voltages and interrupting ratings); this registry holds only the time-current behaviour.
export const TIME_CURRENT_FAMILIES: readonly FamilyTimeCurrent[] = [
  ...BLADE_FAMILIES,
  ...CARTRIDGE_FAMILIES,
  ...HIGH_CURRENT_FAMILIES,
  ...BREAKER_FAMILIES,
]

export const TIME_CURRENT_FAMILY_IDS: readonly string[] = TIME_CURRENT_FAMILIES.map((f) => f.familyId)

const BY_ID = new Map(TIME_CURRENT_FAMILIES.map((f) => [f.familyId, f]))

export function hasTimeCurrentModel(familyId: string): boolean {
  return BY_ID.has(familyId)
}

/** The family's model; throws a RangeError naming the id and the known ids. */
export function getTimeCurrentFamily(familyId: string): FamilyTimeCurrent {
  const family = BY_ID.get(familyId)
  if (!family) {
    throw new RangeError(`No time-current model for device family "${familyId}". Known: ${TIME_CURRENT_FAMILY_IDS.join(', ')}`)
  }
  return family
}
