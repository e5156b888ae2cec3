// Number formatting for screens and reports. Never prints "NaN" or "Infinity": a value that is not
// a finite number is shown as an em dash, so a broken input can never leak a NaN onto a page.

export const MISSING_VALUE = '—'

/**
 * Fixed number of decimals, '—' for anything that is not a finite number.
 * @example formatNumber(3.14159, 2) // '3.14'
 */
export function formatNumber(value: unknown, digits = 2): string {
  if (typeof value !== 'number' || !Number.isFinite(value)) return MISSING_VALUE
  const safeDigits = Number.isInteger(digits) && digits >= 0 && digits <= 20 ? digits : 2
  const text = value.toFixed(safeDigits)
  // -0.00 reads as a sign error on a report; show it as 0.00.
  return Number(text) === 0 ? text.replace(/^-/, '') : text
}

/**
 * Significant figures, for values spanning decades (resistance in Ω, fault current in A).
 * @example formatSignificant(0.000123456, 3) // '0.000123'
 */
export function formatSignificant(value: unknown, significantDigits = 3): string {
  if (typeof value !== 'number' || !Number.isFinite(value)) return MISSING_VALUE
  const digits =
    Number.isInteger(significantDigits) && significantDigits >= 1 && significantDigits <= 21 ? significantDigits : 3
  if (value === 0) return '0'
  const text = value.toPrecision(digits)
  // Number() drops trailing zeros and the exponent for ordinary values; near Number.MAX_VALUE the
  // rounding can overflow to Infinity, so keep the exponent form there.
  const rounded = Number(text)
  return Number.isFinite(rounded) ? String(rounded) : text
}

/**
 * A number with its unit, separated by a no-break space (SI brochure §5.4.3).
 * @example formatWithUnit(12.5, 'V', 1) // '12.5 V'
 */
export function formatWithUnit(value: unknown, unit: string, digits = 2): string {
  const text = formatNumber(value, digits)
  return text === MISSING_VALUE ? MISSING_VALUE : `${text}\u00a0${unit}`
}

/**
 * A percentage, e.g. a voltage drop.
 * @example formatPercent(2.345, 1) // '2.3 %'
 */
export function formatPercent(valuePercent: unknown, digits = 1): string {
  return formatWithUnit(valuePercent, '%', digits)
}
