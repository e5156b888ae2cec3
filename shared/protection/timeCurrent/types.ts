// Shapes of the time-current (band) models. Currents are multiples of the device rating in the
// tables and amperes at the API; times are seconds. Every anchor point carries its own source.

/**
 * How far a figure can be trusted (the tags of the team's reference notes):
 * verified = read in a public copy of the standard; two-sources = two independent reproductions agree;
 * computed = derived from a formula; recalled = from memory, unverified; common-practice = rule of thumb;
 * datasheet = a device's own published points, entered by a user.
 */
export type SourceStatus = 'verified' | 'two-sources' | 'computed' | 'recalled' | 'common-practice' | 'datasheet'

export interface CurvePoint {
  /** Current as a multiple of the device rating (I / In). */
  multiple: number
  timeS: number
  source: string
  status: SourceStatus
}

export type DeviceKind = 'fuse' | 'thermal-breaker' | 'magnetic-hydraulic-breaker'

/** A thermal breaker's mechanism cannot open faster than this, however large the current. */
export interface OpeningFloor {
  timeS: number
  source: string
  status: SourceStatus
}

/** Magnetic trip of a magnetic-hydraulic breaker: may trip from one multiple, surely trips from another. */
export interface InstantaneousTrip {
  mayTripFromMultiple: number
  tripsFromMultiple: number
  /** Fastest and slowest opening once the magnetic trip acts. */
  minS: number
  maxS: number
  source: string
  status: SourceStatus
}

/** The band of one family at one rating, as multiples of the rating. */
export interface BandDefinition {
  kind: DeviceKind
  /** True where the family is built to ride through start and inrush pulses. */
  timeDelay: boolean
  /**
   * Minimum melting (pre-arcing) time for fuses, minimum opening time for breakers. Below the first
   * point the device carries the current (time = Infinity). Sorted by multiple, time decreasing.
   */
  minMelt: CurvePoint[]
  /** Maximum clearing time. Below the first point the device is not sure to open (Infinity). */
  maxClear: CurvePoint[]
  floor?: OpeningFloor
  instantaneous?: InstantaneousTrip
  /** One line naming the standard (clause/table) or practice the band is built on. */
  source: string
}

export interface FamilyTimeCurrent {
  familyId: string
  label: string
  /** The band at a given rating (some standards change their limits with the rating). */
  bandAt(ratingA: number): BandDefinition
}

export interface ChartPoint {
  currentA: number
  timeS: number
}

export interface AnchorPoint extends ChartPoint {
  curve: 'minMelt' | 'maxClear'
  source: string
  status: SourceStatus
}

export interface DeviceBand {
  familyId: string
  ratingA: number
  kind: DeviceKind
  timeDelay: boolean
  /** Shortest time the device may take to open at this current; Infinity where it carries it. */
  minMeltS(currentA: number): number
  /** Longest time the device may take to clear this current; Infinity where it is not sure to open. */
  maxClearS(currentA: number): number
  points: { minMelt: ChartPoint[]; maxClear: ChartPoint[]; anchors: AnchorPoint[] }
  floor?: OpeningFloor
  instantaneous?: InstantaneousTrip
  source: string
}
