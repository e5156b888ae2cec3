import { z } from 'zod'
import { DEVICE_FAMILIES } from './families'

// Standard ampere ratings of protective devices and look-ups over them.

/**
 * NEC (NFPA 70) 240.6(A) standard ampere ratings for fuses and inverse-time breakers (standards.md §1 [V2]:
 * ecmweb.com Code Q&A 2017 and later summaries).
 */
export const NEC_240_6_A_RATINGS_A = [
  15, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80, 90, 100, 110, 125, 150, 175, 200, 225, 250, 300, 350, 400, 450, 500,
  600, 700, 800, 1000, 1200, 1600, 2000, 2500, 3000, 4000, 5000, 6000,
] as const
/** 240.6(A) additional standard ratings for fuses only. (601 A, in the 2017 text only, is left out: edition-dependent.) */
export const NEC_240_6_A_FUSE_ONLY_RATINGS_A = [1, 3, 6, 10] as const
export const NEC_240_6_A_SOURCE = 'NEC (NFPA 70) 240.6(A) standard ampere ratings'

/** The 240.6(A) list with the fuse-only ratings merged in, ascending. */
export const NEC_STANDARD_RATINGS_A: readonly number[] = [...NEC_240_6_A_FUSE_ONLY_RATINGS_A, ...NEC_240_6_A_RATINGS_A].sort(
  (a, b) => a - b,
)

export const DEVICE_FAMILY_IDS = [
  'blade-mini', 'blade-regular', 'blade-large',
  'cartridge-5x20-fast', 'cartridge-5x20-delay', 'cartridge-6x32-fast', 'cartridge-6x32-delay',
  'strip-bolt-down', 'battery-terminal', 'class-t', 'pv-10x38',
  'breaker-thermal-1', 'breaker-thermal-2', 'breaker-thermal-3', 'breaker-magnetic-hydraulic',
] as const
export const deviceFamilySchema = z.enum(DEVICE_FAMILY_IDS)
export type DeviceFamilyId = z.infer<typeof deviceFamilySchema>

export { DEVICE_FAMILIES, getDeviceFamily } from './families'
export type { DeviceFamily, InterruptingRating } from './families'

/** Ratings to search: a family's list, or the NEC 240.6(A) list (fuse-only ratings included). */
export function standardRatingsA(family?: DeviceFamilyId): readonly number[] {
  if (family === undefined) return NEC_STANDARD_RATINGS_A
  const f = DEVICE_FAMILIES[family]
  if (!f) throw new RangeError(`Unknown device family "${String(family)}". Expected one of: ${DEVICE_FAMILY_IDS.join(', ')}`)
  return f.ratingsA
}

function requireCurrent(value: number, field: string): void {
  if (typeof value !== 'number' || !Number.isFinite(value) || value < 0)
    throw new RangeError(`${field}: must be a finite, non-negative current in A`)
}

/**
 * The smallest standard rating at or above `currentA`; null when the list tops out below it.
 * @example nextStandardRatingA(27) // 30
 * @example nextStandardRatingA(8, 'blade-regular') // 10
 */
export function nextStandardRatingA(currentA: number, family?: DeviceFamilyId): number | null {
  requireCurrent(currentA, 'currentA')
  return standardRatingsA(family).find((r) => r >= currentA - 1e-9) ?? null
}

/**
 * The largest standard rating not above `limitA`; null when even the smallest exceeds it.
 * @example nearestStandardRatingAtMost(32) // 30
 */
export function nearestStandardRatingAtMost(limitA: number, family?: DeviceFamilyId): number | null {
  requireCurrent(limitA, 'limitA')
  const ratings = standardRatingsA(family)
  let found: number | null = null
  for (const r of ratings) if (r <= limitA + 1e-9) found = r
  return found
}

/** The next rating strictly above `ratingA` in the list (for "next larger size" rules); null at the top. */
export function nextRatingAboveA(ratingA: number, family?: DeviceFamilyId): number | null {
  requireCurrent(ratingA, 'ratingA')
  return standardRatingsA(family).find((r) => r > ratingA + 1e-9) ?? null
}
