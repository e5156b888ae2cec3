/** A finite number or the fallback: results never carry NaN or Infinity. */
export function finite(value: number, fallback = 0): number {
  return Number.isFinite(value) ? value : fallback
}

/** Rounds to a sensible number of significant digits for messages. */
export function fmt(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return '–'
  if (value === 0) return '0'
  const abs = Math.abs(value)
  if (abs >= 100) return String(Math.round(value))
  return String(Number(value.toPrecision(digits)))
}
