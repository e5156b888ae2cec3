import { datasheetBand, type DatasheetResult } from './datasheetBand'
import { deviceBand } from './deviceBand'
import type { ChartPoint, DeviceBand } from './types'

// A device from an organisation's library, copied into a design's fuse or breaker so the file stays
// self-contained (the CLI and the exports analyse it with no database). Its band is built from its own
// datasheet points (datasheetBand) and replaces the generic family's band in every time-current check.

export interface EmbeddedDevice {
  /** Id of the library entry it was copied from; absent for a device written into the file by hand. */
  libraryId?: string
  name: string
  kind: 'fuse' | 'breaker'
  ratingA: number
  timeDelay: boolean
  /** Where the points come from, e.g. "maker's datasheet rev. C, fig. 3". */
  source: string
  /** Minimum melting (fuse) or opening (breaker) time, current rising. */
  minMeltPoints: ChartPoint[]
  /** Maximum clearing time, current rising. */
  maxClearPoints: ChartPoint[]
}

/** A library entry as the device library stores it: points in A or as multiples, one or both times. */
export interface LibraryDeviceRecord {
  id: string
  name: string
  kind: 'fuse' | 'breaker'
  ratingA: number
  timeDelay: boolean
  source: string
  points: { currentA?: number; multiple?: number; minMeltS?: number; maxClearS?: number }[]
}

/**
 * The copy of a library entry that goes into a design: each curve's points in amperes, in current order.
 * @example embedLibraryDevice(entry).minMeltPoints // [{ currentA: 20, timeS: 3600 }, …]
 */
export function embedLibraryDevice(entry: LibraryDeviceRecord): EmbeddedDevice {
  const minMeltPoints: ChartPoint[] = []
  const maxClearPoints: ChartPoint[] = []
  for (const p of entry.points) {
    const currentA = p.currentA ?? (p.multiple ?? NaN) * entry.ratingA
    if (p.minMeltS !== undefined) minMeltPoints.push({ currentA, timeS: p.minMeltS })
    if (p.maxClearS !== undefined) maxClearPoints.push({ currentA, timeS: p.maxClearS })
  }
  const byCurrent = (a: ChartPoint, b: ChartPoint) => a.currentA - b.currentA
  return {
    libraryId: entry.id,
    name: entry.name,
    kind: entry.kind,
    ratingA: entry.ratingA,
    timeDelay: entry.timeDelay,
    source: entry.source,
    minMeltPoints: minMeltPoints.sort(byCurrent),
    maxClearPoints: maxClearPoints.sort(byCurrent),
  }
}

// The checks ask for a device's band thousands of times per design; a design's parsed params are not
// changed in place, so each embedded device is built once.
const BUILT = new WeakMap<EmbeddedDevice, DatasheetResult>()

/**
 * The band of an embedded device, checked like any datasheet band (never throws).
 * A user's breaker has no opening floor or magnetic step of its own: its points are the whole model.
 */
export function embeddedDeviceBand(device: EmbeddedDevice): DatasheetResult {
  let result = BUILT.get(device)
  if (!result) {
    result = datasheetBand({
      id: `library:${device.libraryId ?? device.name}`,
      ratingA: device.ratingA,
      kind: device.kind === 'fuse' ? 'fuse' : 'thermal-breaker',
      timeDelay: device.timeDelay,
      minMelt: device.minMeltPoints,
      maxClear: device.maxClearPoints,
      source: `${device.name}: ${device.source}`,
    })
    BUILT.set(device, result)
  }
  return result
}

/** A device in a design: a generic family and rating, and perhaps its own datasheet band. */
export interface BandRef {
  familyId: string
  ratingA: number
  customDevice?: EmbeddedDevice
}

/**
 * The band the checks and the chart use for a device: the embedded device's own points when it has
 * them, else its family's band at its rating. Throws a RangeError when neither can be built.
 * @example bandOfDevice({ familyId: 'blade-regular', ratingA: 15 }).source // ISO 8820-3 …
 */
export function bandOfDevice(ref: BandRef): DeviceBand {
  if (!ref.customDevice) return deviceBand(ref.familyId, ref.ratingA)
  const result = embeddedDeviceBand(ref.customDevice)
  if (!result.ok) {
    const first = result.issues[0]
    throw new RangeError(`Library device "${ref.customDevice.name}": ${first.path}: ${first.message}`)
  }
  return result.band
}

/** What a message calls the device: the library device's name, else the family's label. */
export function deviceNameOf(ref: BandRef, familyLabel: (familyId: string) => string): string {
  return ref.customDevice ? `${ref.customDevice.name} (library device)` : familyLabel(ref.familyId)
}
