import { logLogTimeS, logSpace } from './_lib/logLog'
import { getTimeCurrentFamily } from './families'
import type { AnchorPoint, BandDefinition, ChartPoint, DeviceBand } from './types'
import { TupleMemo } from '../../tupleMemo'

/** Charts run from just below the first anchor to this multiple of the rating. */
const CHART_MAX_MULTIPLE = 100
const CHART_SAMPLES = 60

/**
 * The time-current band of one device: minimum melting (or opening) time and maximum clearing time at
 * any current, built by log–log interpolation through the standard's test points (as multiples of the
 * rating), with the thermal-breaker floor and the magnetic trip applied.
 * Throws a RangeError for an unknown family or a rating that is not a positive number.
 * @example
 * const band = deviceBand('blade-regular', 20)
 * band.maxClearS(40) // ≤ 5 s: ISO 8820-3, 200 % (recalled)
 */
export function deviceBand(familyId: string, ratingA: number): DeviceBand {
  if (typeof ratingA !== 'number' || !Number.isFinite(ratingA) || ratingA <= 0) {
    throw new RangeError(`Device rating must be a positive number of amperes, got ${String(ratingA)}`)
  }
  // Catalogue bands depend only on (family, rating) and are immutable: the analysis asks for the same
  // few thousand times per design, so each is built once (no key string per look-up).
  BAND_KEY[0] = familyId
  BAND_KEY[1] = ratingA
  const known = CATALOGUE_BANDS.get(BAND_KEY)
  if (known) return known
  return CATALOGUE_BANDS.set([familyId, ratingA], bandFromDefinition(familyId, ratingA, getTimeCurrentFamily(familyId).bandAt(ratingA)))
}
const CATALOGUE_BANDS = new TupleMemo<DeviceBand>(2000)
/** Reused look-up key (family, rating). */
const BAND_KEY: unknown[] = [undefined, undefined]

/** A band from a definition in multiples of `ratingA` (catalogue families and datasheet devices alike). */
export function bandFromDefinition(familyId: string, ratingA: number, def: BandDefinition): DeviceBand {
  const minMeltS = (currentA: number) => minTimeS(def, currentA / ratingA)
  const maxClearS = (currentA: number) => maxTimeS(def, currentA / ratingA)
  // Chart points only when a chart asks for them (the checks read the curves, not the samples).
  let points: DeviceBand['points'] | undefined
  return {
    familyId,
    ratingA,
    kind: def.kind,
    timeDelay: def.timeDelay,
    minMeltS,
    maxClearS,
    get points() {
      return (points ??= chartPoints(def, ratingA, minMeltS, maxClearS))
    },
    floor: def.floor,
    instantaneous: def.instantaneous,
    source: def.source,
  }
}

function minTimeS(def: BandDefinition, multiple: number): number {
  let t = logLogTimeS(def.minMelt, multiple)
  // Once the magnetic trip may act, the mechanism's own speed sets the time.
  const inst = def.instantaneous
  if (inst && multiple >= inst.mayTripFromMultiple) t = inst.minS
  if (def.floor) t = Math.max(t, def.floor.timeS)
  return t
}

function maxTimeS(def: BandDefinition, multiple: number): number {
  let t = logLogTimeS(def.maxClear, multiple)
  const inst = def.instantaneous
  if (inst && multiple >= inst.tripsFromMultiple) t = inst.maxS
  if (def.floor) t = Math.max(t, def.floor.timeS)
  return t
}

function chartPoints(
  def: BandDefinition,
  ratingA: number,
  minMeltS: (a: number) => number,
  maxClearS: (a: number) => number,
): DeviceBand['points'] {
  const firstMultiple = Math.min(def.minMelt[0]?.multiple ?? 1, def.maxClear[0]?.multiple ?? 1)
  const currentsA = logSpace(firstMultiple * ratingA, CHART_MAX_MULTIPLE * ratingA, CHART_SAMPLES)
  // Step edges of the magnetic trip are added so the chart draws them square, not as slopes.
  const inst = def.instantaneous
  if (inst) {
    for (const m of [inst.mayTripFromMultiple, inst.tripsFromMultiple]) currentsA.push(m * ratingA * (1 - 1e-9), m * ratingA)
    currentsA.sort((a, b) => a - b)
  }
  const sample = (fn: (a: number) => number): ChartPoint[] =>
    currentsA.map((currentA) => ({ currentA, timeS: fn(currentA) })).filter((p) => Number.isFinite(p.timeS))
  const anchors: AnchorPoint[] = [
    ...def.minMelt.map((p) => ({ curve: 'minMelt' as const, currentA: p.multiple * ratingA, timeS: p.timeS, source: p.source, status: p.status })),
    ...def.maxClear.map((p) => ({ curve: 'maxClear' as const, currentA: p.multiple * ratingA, timeS: p.timeS, source: p.source, status: p.status })),
  ]
  return { minMelt: sample(minMeltS), maxClear: sample(maxClearS), anchors }
}
