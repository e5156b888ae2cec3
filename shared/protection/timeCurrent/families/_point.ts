import type { CurvePoint, SourceStatus } from '../types'

/** One anchor point of a curve: multiple of the rating, time in seconds, and where it comes from. */
export function point(multiple: number, timeS: number, source: string, status: SourceStatus): CurvePoint {
  return { multiple, timeS, source, status }
}

/** "Carries indefinitely" drawn as a finite anchor so the curve can be interpolated: 100 h. */
export const CARRY_TIME_S = 100 * 3600
