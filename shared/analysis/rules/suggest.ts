import { smallestPassingSize } from '../../conductors/suggest'
import { getConductorSize, conductorSizeLabel } from '../../conductors/sizes'
import { nextStandardRatingA, nearestStandardRatingAtMost } from '../../protection/ratings'
import { familyId } from '../_lib/ocpdLimit'
import type { Conductor } from '../../design/schema'
import type { Finding } from '../types'
import type { RuleContext } from './types'

// Suggested fixes: the smallest standard conductor size, or the nearest standard device rating,
// that passes — with a patch the editor can apply.

/** Smallest size of the conductor's own system (AWG or mm²) carrying `currentA` within `allowedDropPercent` over its loop. */
export function suggestConductor(ctx: RuleContext, c: Conductor, currentA: number, allowedDropPercent = 100, why = ''): Finding['suggestion'] | undefined {
  try {
    const size = getConductorSize(c.sizeId)
    const found = smallestPassingSize({
      // Solver round-off (25.000000001 A) must not skip a size that fits exactly.
      currentA: Math.max(0, currentA - 1e-6), lengthM: c.lengthM, allowedDropPercent: Math.max(allowedDropPercent, 1e-6),
      nominalV: ctx.nominalV, material: c.material, insulationRatingC: c.insulationRatingC,
      ambientC: c.ambientC ?? ctx.design.settings.defaultAmbientC, installation: c.installation,
      bundledCount: c.bundledCount, profile: ctx.profile, system: size.system,
      conductorTemperatureC: c.ambientC ?? ctx.design.settings.defaultAmbientC,
    })
    if (!found) return { text: `No standard ${size.system === 'awg' ? 'AWG' : 'metric'} size passes: split the load or shorten the run${why}.` }
    if (getConductorSize(found.sizeId).rank <= size.rank) return undefined
    return {
      text: `Use ${conductorSizeLabel(found.sizeId)} for ${c.label || c.id}${why}.`,
      patch: { kind: 'conductor', id: c.id, field: 'sizeId', value: found.sizeId },
    }
  } catch {
    return undefined
  }
}

const familyOrUndefined = familyId

/** Smallest standard rating of the device's family (else NEC 240.6(A)) at or above `atLeastA`. */
export function ratingAtLeast(family: string, atLeastA: number): number | null {
  try {
    return nextStandardRatingA(Math.max(0, atLeastA), familyOrUndefined(family))
  } catch {
    return null
  }
}

/** Largest standard rating of the device's family (else NEC 240.6(A)) not above `limitA`. */
export function ratingAtMost(family: string, limitA: number): number | null {
  try {
    return nearestStandardRatingAtMost(Math.max(0, limitA), familyOrUndefined(family))
  } catch {
    return null
  }
}

export function ratingPatch(partId: string, field: string, value: number): NonNullable<Finding['suggestion']>['patch'] {
  return { kind: 'part', id: partId, field, value }
}
