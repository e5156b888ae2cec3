import { MISSING_VALUE, formatNumber } from '@shared/units'
import { conductorSizeLabel, isConductorSizeId } from '@shared/conductors/sizes'

// Display helpers for the editor: every number on screen goes through these, so a missing or
// non-finite value shows as '—' and never as NaN or undefined.

export { MISSING_VALUE }

/** Digits chosen by magnitude: 0.0042 Ω, 3.27 V, 12.5 A, 1500 W. */
export function formatAuto(value: unknown, unit = ''): string {
  if (typeof value !== 'number' || !Number.isFinite(value)) return MISSING_VALUE
  const magnitude = Math.abs(value)
  const digits = magnitude >= 100 ? 0 : magnitude >= 10 ? 1 : magnitude >= 1 ? 2 : magnitude >= 0.01 ? 3 : 5
  const text = formatNumber(value, digits)
  return unit ? `${text}\u00a0${unit}` : text
}

export function formatQuantity(q: { value: number; unit: string } | undefined): string {
  return q ? formatAuto(q.value, q.unit) : MISSING_VALUE
}

export function sizeLabel(sizeId: unknown): string {
  return isConductorSizeId(sizeId) ? conductorSizeLabel(sizeId) : MISSING_VALUE
}
