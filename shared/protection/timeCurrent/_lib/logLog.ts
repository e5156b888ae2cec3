import type { CurvePoint } from '../types'

/**
 * Above the last test point a fuse element heats adiabatically: the melting I²t is constant, so time
 * falls as 1/I² (slope −2 on log–log axes). [C] from the heat balance I²R·t = m·c·ΔT with no loss.
 */
export const ADIABATIC_SLOPE = -2

/**
 * Time at `multiple` on a curve drawn straight between its points on log–log axes.
 * Below the first point: Infinity (the device carries, or is not sure to open, that current).
 * Above the last point: extended with the adiabatic slope.
 */
export function logLogTimeS(points: readonly CurvePoint[], multiple: number): number {
  if (!(multiple > 0) || points.length === 0) return Infinity
  const first = points[0]
  if (multiple < first.multiple) return Infinity
  if (multiple === first.multiple) return first.timeS
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1]
    const b = points[i]
    if (multiple === b.multiple) return b.timeS // exact at the anchors, no rounding
    if (multiple < b.multiple) {
      const fraction = Math.log(multiple / a.multiple) / Math.log(b.multiple / a.multiple)
      return Math.exp(Math.log(a.timeS) + fraction * Math.log(b.timeS / a.timeS))
    }
  }
  const last = points[points.length - 1]
  return last.timeS * Math.pow(multiple / last.multiple, ADIABATIC_SLOPE)
}

/** `count` multiples spaced evenly on a log axis from `from` to `to`, both included. */
export function logSpace(from: number, to: number, count: number): number[] {
  const out: number[] = []
  const step = Math.log(to / from) / (count - 1)
  for (let i = 0; i < count; i++) out.push(from * Math.exp(step * i))
  return out
}
