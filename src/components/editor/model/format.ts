import { MISSING_VALUE, formatNumber, formatSignificant } from '@shared/units'
import { conductorSizeLabel, isConductorSizeId } from '@shared/conductors/sizes'

// Display helpers for the editor: every number on screen goes through these, so a missing or
// non-finite value shows as '—' and never as NaN or undefined.

export { MISSING_VALUE }

/** Digits chosen by magnitude: 0.0042 Ω, 3.27 V, 12.5 A, 1500 W; round-off below 1e-6 shows as 0. */
export function formatAuto(value: unknown, unit = ''): string {
  if (typeof value !== 'number' || !Number.isFinite(value)) return MISSING_VALUE
  const magnitude = Math.abs(value)
  let text: string
  // Below a micro-unit is solver round-off for every quantity the editor shows.
  if (magnitude < 1e-6) text = '0'
  else if (magnitude < 0.01) text = formatSignificant(value, 2)
  else text = formatNumber(value, magnitude >= 100 ? 0 : magnitude >= 10 ? 1 : magnitude >= 1 ? 2 : 3)
  return unit ? `${text}\u00a0${unit}` : text
}

export function formatQuantity(q: { value: number; unit: string } | undefined): string {
  return q ? formatAuto(q.value, q.unit) : MISSING_VALUE
}

export function sizeLabel(sizeId: unknown): string {
  return isConductorSizeId(sizeId) ? conductorSizeLabel(sizeId) : MISSING_VALUE
}
