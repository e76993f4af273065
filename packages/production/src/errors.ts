/**
 * Bad input is refused with one error type that names the offending field, so
 * callers (API, staff screens) can show it next to the right input. Nothing in
 * this package mutates its inputs, so a refused call changes nothing.
 */
export class ProductionInputError extends Error {
  readonly field: string;
  /** The message without the field's name in front. */
  readonly reason: string;

  constructor(field: string, message: string) {
    super(`${field}: ${message}`);
    this.name = 'ProductionInputError';
    this.field = field;
    this.reason = message;
  }
}

export function requireFinite(field: string, value: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new ProductionInputError(field, `must be a finite number (got ${String(value)})`);
  }
  return value;
}

export function requirePositive(field: string, value: number): number {
  requireFinite(field, value);
  if (value <= 0) throw new ProductionInputError(field, `must be greater than 0 (got ${value})`);
  return value;
}

export function requireNonNegative(field: string, value: number): number {
  requireFinite(field, value);
  if (value < 0) throw new ProductionInputError(field, `must not be negative (got ${value})`);
  return value;
}

export function requireWholeNonNegative(field: string, value: number): number {
  requireNonNegative(field, value);
  if (!Number.isInteger(value)) throw new ProductionInputError(field, `must be a whole number (got ${value})`);
  return value;
}

export function requireInRange(field: string, value: number, min: number, max: number): number {
  requireFinite(field, value);
  if (value < min || value > max) {
    throw new ProductionInputError(field, `must be between ${min} and ${max} (got ${value})`);
  }
  return value;
}
