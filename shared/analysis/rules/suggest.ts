import { circuitDrop } from '../../conductors/voltageDrop'
import { ampacityOf, type AmpacityMemo } from '../_lib/conductorStats'
import { TupleMemo } from '../../tupleMemo'
import { conductorSizeLabel, getConductorSize, sizesInOrder } from '../../conductors/sizes'
import { nextStandardRatingA, nearestStandardRatingAtMost } from '../../protection/ratings'
import { familyId } from '../_lib/ocpdLimit'
import type { Conductor } from '../../design/schema'
import type { Finding } from '../types'
import type { RuleContext } from './types'

// Suggested fixes: the smallest standard conductor size, or the nearest standard device rating,
// that passes — with a patch the editor can apply.

// Ampacity of each candidate size, looked up once per analysis (a design has few distinct runs).
const ampacityMemos = new WeakMap<RuleContext, AmpacityMemo>()

/** Smallest size of the conductor's own system (AWG or mm²) carrying `currentA` within `allowedDropPercent` over its loop. */
export function suggestConductor(ctx: RuleContext, c: Conductor, currentA: number, allowedDropPercent = 100, why = ''): Finding['suggestion'] | undefined {
  try {
    let memo = ampacityMemos.get(ctx)
    if (!memo) ampacityMemos.set(ctx, (memo = new TupleMemo()))
    const size = getConductorSize(c.sizeId)
    // Solver round-off (25.000000001 A) must not skip a size that fits exactly.
    const needA = Math.max(0, currentA - 1e-6)
    const temperatureC = c.ambientC ?? ctx.design.settings.defaultAmbientC
    let found: string | null = null
    for (const candidate of sizesInOrder(size.system)) {
      const ampacityA = ampacityOf(c, ctx.design, ctx.nominalV, memo, candidate.id).result?.ampacityA
      if (ampacityA == null || ampacityA < needA) continue
      const drop = circuitDrop({ currentA: needA, sizeId: candidate.id, material: c.material, lengthM: c.lengthM, temperatureC, nominalV: ctx.nominalV })
      if (drop.dropPercent <= Math.max(allowedDropPercent, 1e-6) + 1e-12) { found = candidate.id; break }
    }
    if (!found) return { text: `No standard ${size.system === 'awg' ? 'AWG' : 'metric'} size passes: split the load or shorten the run${why}.` }
    if (getConductorSize(found).rank <= size.rank) return undefined
    return {
      text: `Use ${conductorSizeLabel(found)} for ${c.label || c.id}${why}.`,
      patch: { kind: 'conductor', id: c.id, field: 'sizeId', value: found },
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
