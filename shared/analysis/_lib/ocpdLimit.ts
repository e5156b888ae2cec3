import { maxOcpdA, type MaxOcpdResult } from '../../conductors/maxOcpd'
import type { Conductor, Design } from '../../design/schema'
import { TupleMemo } from '../../tupleMemo'
import { DEVICE_FAMILY_IDS, type DeviceFamilyId } from '../../protection/ratings'

export function familyId(family: string): DeviceFamilyId | undefined {
  return (DEVICE_FAMILY_IDS as readonly string[]).includes(family) ? (family as DeviceFamilyId) : undefined
}

/** Largest device a conductor may have under the design's profile; null when the tables refuse the input. */
export function maxDeviceRating(c: Conductor, ampacityA: number, profile: Design['settings']['profile'], family: string): MaxOcpdResult | null {
  // Few distinct inputs per design (sizes × ampacities × families), asked per device by several rules.
  const key = LIMIT_KEY
  key[0] = c.sizeId
  key[1] = c.material
  key[2] = ampacityA
  key[3] = profile
  key[4] = family
  const known = LIMITS.get(key)
  if (known !== undefined) return known
  const keys = [...key] // before the tables run: they must not see a key changed under them
  let result: MaxOcpdResult | null
  try {
    result = Object.freeze(maxOcpdA({ sizeId: c.sizeId, material: c.material, ampacityA: Math.max(0, ampacityA), profile, family: familyId(family) }))
  } catch {
    result = null
  }
  return LIMITS.set(keys, result)
}
const LIMITS = new TupleMemo<MaxOcpdResult | null>()
/** Reused look-up key: no string per call (asked per conductor and per device). */
const LIMIT_KEY: unknown[] = new Array(5)

/**
 * Where a branch device may sit from the bus or panel it is tapped from (m): ABYC E-11 §11.10, 7 in
 * (175 mm), or 40 in (1.02 m) for conductors from sources other than the battery when sheathed
 * (standards.md §4, pkys.com summary). Vehicles and buildings: the same figures, common practice.
 */
export const BRANCH_DISTANCE_LIMITS = { bareM: 0.178, sheathedM: 1.02, source: 'ABYC E-11 §11.10: within 7 in of the bus, or 40 in (1.02 m) if sheathed' } as const
