import { deviceBand } from './deviceBand'
import type { DeviceBand } from './types'

/** A device given by its band, or by family and rating. */
export type DeviceRef = { band: DeviceBand } | { familyId: string; ratingA: number }

function bandOf(ref: DeviceRef): DeviceBand {
  return 'band' in ref ? ref.band : deviceBand(ref.familyId, ref.ratingA)
}

/**
 * True when the device is sure to have cleared `currentA` within `withinS` seconds: its maximum
 * clearing time at that current is not longer.
 * @example opensWithin({ familyId: 'blade-regular', ratingA: 10, currentA: 60, withinS: 0.1 }) // true
 */
export function opensWithin(options: DeviceRef & { currentA: number; withinS: number }): boolean {
  return bandOf(options).maxClearS(options.currentA) <= options.withinS
}

/**
 * True when the device is sure to carry `currentA` for `forS` seconds: its minimum melting (or
 * opening) time at that current is longer. The pulse is taken from cold (no pre-load heating).
 * @example doesNotOpen({ familyId: 'blade-regular', ratingA: 20, currentA: 25, forS: 3600 }) // true
 */
export function doesNotOpen(options: DeviceRef & { currentA: number; forS: number }): boolean {
  return bandOf(options).minMeltS(options.currentA) > options.forS
}
