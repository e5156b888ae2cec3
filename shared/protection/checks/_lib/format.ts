import { formatSignificant } from '../../../units/format'

/** "12 A", "1 250 A" style, three significant figures. */
export function amps(value: number): string {
  return `${formatSignificant(value, 3)}\u00a0A`
}

/** Seconds in the unit a reader expects: ms below one second, min above two minutes. */
export function seconds(value: number): string {
  if (value === Infinity) return 'never (not sure to open)'
  if (value < 1) return `${formatSignificant(value * 1000, 2)}\u00a0ms`
  if (value > 120) return `${formatSignificant(value / 60, 2)}\u00a0min`
  return `${formatSignificant(value, 2)}\u00a0s`
}
