import { CalcInputError } from '../errors';

/** Bounds for a numeric field; `min`/`max` are inclusive unless `*Exclusive` is set. */
export interface NumberBounds {
  min?: number;
  max?: number;
  minExclusive?: boolean;
  maxExclusive?: boolean;
  /** Appended to the range message, e.g. "(the ABYC table) unless extrapolate is true". */
  hint?: string;
}

/** Throws unless `value` is a plain object; returns it typed as a record. */
export function requireObject(value: unknown, field: string): Record<string, unknown> {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new CalcInputError(field, `${field === '' ? 'input' : field} must be an object`);
  }
  return value as Record<string, unknown>;
}

/** Throws unless `value` is a finite number within `bounds`. */
export function requireNumber(value: unknown, field: string, bounds: NumberBounds = {}): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new CalcInputError(field, `${field} must be a finite number`);
  }
  const { min, max, minExclusive = false, maxExclusive = false, hint } = bounds;
  const suffix = hint === undefined ? '' : ` ${hint}`;
  if (min !== undefined && (minExclusive ? value <= min : value < min)) {
    const relation = minExclusive ? 'greater than' : 'at least';
    throw new CalcInputError(field, `${field} must be ${relation} ${min}${suffix} (got ${value})`);
  }
  if (max !== undefined && (maxExclusive ? value >= max : value > max)) {
    const relation = maxExclusive ? 'less than' : 'at most';
    throw new CalcInputError(field, `${field} must be ${relation} ${max}${suffix} (got ${value})`);
  }
  return value;
}

/** Like {@link requireNumber} but returns `fallback` when the value is `undefined`. */
export function optionalNumber(
  value: unknown,
  field: string,
  fallback: number,
  bounds: NumberBounds = {},
): number {
  return value === undefined ? fallback : requireNumber(value, field, bounds);
}

/** Throws unless `value` is one of `allowed`. */
export function requireOneOf<T extends string>(
  value: unknown,
  field: string,
  allowed: readonly T[],
): T {
  if (typeof value !== 'string' || !(allowed as readonly string[]).includes(value)) {
    throw new CalcInputError(field, `${field} must be one of ${allowed.join(', ')}`);
  }
  return value as T;
}

/** Throws unless `value` is a boolean or undefined; returns `fallback` for undefined. */
export function optionalBoolean(value: unknown, field: string, fallback: boolean): boolean {
  if (value === undefined) return fallback;
  if (typeof value !== 'boolean') throw new CalcInputError(field, `${field} must be true or false`);
  return value;
}

/** Throws unless `value` is a non-empty string of at most `maxLength` characters. */
export function requireLabel(value: unknown, field: string, maxLength = 80): string {
  if (typeof value !== 'string' || value.trim() === '' || value.length > maxLength) {
    throw new CalcInputError(
      field,
      `${field} must be a non-empty text of at most ${maxLength} characters`,
    );
  }
  return value;
}
