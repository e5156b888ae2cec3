import type { Material } from './materials'
import type { CodeProfile } from './profiles'
import { getConductorSize, type ConductorSizeId } from './sizes'
import { nearestStandardRatingAtMost, nextRatingAboveA, type DeviceFamilyId } from '../protection/ratings'
import { requireNonNegative } from './_lib/inputs'

// Largest overcurrent device a conductor may have.

/**
 * NEC 240.4(D) small-conductor limits, A (standards.md §1 [V2]). Applied after the ampacity's
 * correction and adjustment factors. Keyed by size, then copper / aluminium (incl. copper-clad Al).
 */
export const NEC_240_4_D_MAX_OCPD_A: Readonly<Partial<Record<ConductorSizeId, { copper?: number; aluminium?: number }>>> = {
  'awg-18': { copper: 7 },
  'awg-16': { copper: 10 },
  'awg-14': { copper: 15 },
  'awg-12': { copper: 20, aluminium: 15 },
  'awg-10': { copper: 30, aluminium: 25 },
}
export const NEC_240_4_D_SOURCE = 'NEC 240.4(D) small conductors'
export const NEC_240_4_B_SOURCE = 'NEC 240.4(B): next higher standard rating allowed when the ampacity matches none, up to 800 A'
export const ABYC_OCPD_SOURCE =
  'ABYC E-11 (11.10): OCPD not above the conductor ampacity; where no standard rating matches, the next larger is allowed up to 150 % of the ampacity (pkys.com E-11 summary, verified)'

export interface MaxOcpdInput {
  sizeId: ConductorSizeId
  material: Material
  /** the conductor's ampacity after every correction (conductorAmpacityA(...).ampacityA), A */
  ampacityA: number
  profile: CodeProfile
  /** search this family's ratings; default the NEC 240.6(A) list with its fuse-only ratings */
  family?: DeviceFamilyId
}

export interface MaxOcpdResult {
  /** largest standard rating allowed; null when no rating in the list is allowed */
  maxRatingA: number | null
  /** the ceiling before rounding to a standard rating, A */
  limitA: number
  rules: string[]
}

/**
 * Building: min(240.4(D) limit, ampacity rounded per 240.4(B)). Marine and vehicle: the ABYC rule
 * (vehicle: common practice, as there is no vehicle code).
 * @example maxOcpdA({ sizeId: 'awg-12', material: 'copper', ampacityA: 30, profile: 'building' }).maxRatingA // 20
 */
export function maxOcpdA(input: MaxOcpdInput): MaxOcpdResult {
  requireNonNegative(input.ampacityA, 'ampacityA')
  getConductorSize(input.sizeId)
  const ampacityA = input.ampacityA
  const rules: string[] = []
  if (ampacityA === 0) return { maxRatingA: null, limitA: 0, rules: ['a conductor with no allowable current may have no device sized to it'] }
  const atMost = nearestStandardRatingAtMost(ampacityA, input.family)
  const above = nextRatingAboveA(ampacityA, input.family)
  const matches = atMost !== null && Math.abs(atMost - ampacityA) < 1e-9

  if (input.profile === 'building') {
    let limitA = ampacityA
    let maxRatingA = atMost
    if (!matches && above !== null && above <= 800) {
      maxRatingA = above
      limitA = above
      rules.push(NEC_240_4_B_SOURCE)
    }
    const small = NEC_240_4_D_MAX_OCPD_A[input.sizeId]?.[input.material === 'aluminium' ? 'aluminium' : 'copper']
    if (small !== undefined && (maxRatingA === null || maxRatingA > small)) {
      limitA = Math.min(limitA, small)
      maxRatingA = nearestStandardRatingAtMost(small, input.family)
      rules.push(`${NEC_240_4_D_SOURCE}: ${getConductorSize(input.sizeId).label} ${input.material === 'aluminium' ? 'aluminium' : 'copper'} ≤ ${small} A`)
    }
    if (rules.length === 0) rules.push('NEC 240.4: OCPD not above the conductor ampacity')
    return { maxRatingA, limitA, rules }
  }

  const practice = input.profile === 'vehicle' ? ' (applied to vehicles as common practice)' : ''
  rules.push(ABYC_OCPD_SOURCE + practice)
  if (!matches && above !== null && above <= 1.5 * ampacityA + 1e-9) return { maxRatingA: above, limitA: 1.5 * ampacityA, rules }
  return { maxRatingA: atMost, limitA: ampacityA, rules }
}
