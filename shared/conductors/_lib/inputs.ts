// Input guards for the conductor functions: bad numbers fail loudly with the field's name,
// so a NaN never travels on into a finding or onto a page.

export class ConductorInputError extends RangeError {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(`${field}: ${message}`)
    this.name = 'ConductorInputError'
  }
}

export function requireFinite(value: number, field: string): void {
  if (typeof value !== 'number' || !Number.isFinite(value)) throw new ConductorInputError(field, 'must be a finite number')
}

export function requireNonNegative(value: number, field: string): void {
  requireFinite(value, field)
  if (value < 0) throw new ConductorInputError(field, 'must not be negative')
}

export function requirePositive(value: number, field: string): void {
  requireFinite(value, field)
  if (value <= 0) throw new ConductorInputError(field, 'must be greater than zero')
}
