/** Stable codes so the server can map a failure to one error shape and the apps can word it. */
export type DyeKitErrorCode =
  | 'INVALID_AMOUNT'
  | 'UNKNOWN_UNIT'
  | 'INCOMPATIBLE_UNITS'
  | 'INVALID_COLOR'
  | 'EMPTY_IMAGE'
  | 'INVALID_IMAGE'
  | 'INVALID_FIBER_CONTENT'
  | 'INVALID_RECIPE'
  | 'INVALID_OPTION';

/** The one error type dye-kit throws; `field` names the input that was wrong, when there is one. */
export class DyeKitError extends Error {
  readonly code: DyeKitErrorCode;
  readonly field: string | undefined;

  constructor(code: DyeKitErrorCode, message: string, field?: string) {
    super(message);
    this.name = 'DyeKitError';
    this.code = code;
    this.field = field;
  }
}

/** Throws unless `value` is a finite number. */
export function requireFinite(field: string, value: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new DyeKitError(
      'INVALID_AMOUNT',
      `${field} must be a finite number (got ${String(value)}).`,
      field,
    );
  }
  return value;
}

/** Throws unless `value` is a finite number ≥ 0. */
export function requireNonNegative(field: string, value: number): number {
  requireFinite(field, value);
  if (value < 0) {
    throw new DyeKitError('INVALID_AMOUNT', `${field} cannot be negative (got ${value}).`, field);
  }
  return value;
}

/** Throws unless `value` is a finite number > 0. */
export function requirePositive(field: string, value: number): number {
  requireFinite(field, value);
  if (value <= 0) {
    throw new DyeKitError(
      'INVALID_AMOUNT',
      `${field} must be greater than zero (got ${value}).`,
      field,
    );
  }
  return value;
}

/** Throws unless `value` is a finite percentage in (0, 100] (or [0, 100] when zero is allowed). */
export function requirePercent(field: string, value: number, allowZero: boolean): number {
  if (allowZero) requireNonNegative(field, value);
  else requirePositive(field, value);
  if (value > 100) {
    throw new DyeKitError('INVALID_AMOUNT', `${field} cannot be over 100 % (got ${value}).`, field);
  }
  return value;
}
