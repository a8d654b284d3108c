import { CalcInputError } from '../errors';

/** Which bound of a range excludes its own value. */
export type Exclusive = 'none' | 'min' | 'max' | 'both';

/** Throws unless `value` is a plain object; returns it typed as a record. */
export function requireObject(value: unknown, field: string): Record<string, unknown> {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new CalcInputError(field, `${field === '' ? 'input' : field} must be an object`);
  }
  return value as Record<string, unknown>;
}

/**
 * Throws unless `value` is a finite number in [min, max] (an end is open when `exclusive`
 * names it). Positional bounds keep this allocation-free on every keystroke. `hint` is
 * appended to the range message, e.g. "m (10–60 ft, the ABYC table)".
 */
export function requireNumber(
  value: unknown,
  field: string,
  min = -Infinity,
  max = Infinity,
  exclusive: Exclusive = 'none',
  hint?: string,
): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new CalcInputError(field, `${field} must be a finite number`);
  }
  const minOpen = exclusive === 'min' || exclusive === 'both';
  const maxOpen = exclusive === 'max' || exclusive === 'both';
  if (minOpen ? value <= min : value < min) {
    rangeError(field, value, minOpen ? 'greater than' : 'at least', min, hint);
  }
  if (maxOpen ? value >= max : value > max) {
    rangeError(field, value, maxOpen ? 'less than' : 'at most', max, hint);
  }
  return value;
}

function rangeError(
  field: string,
  value: number,
  relation: string,
  bound: number,
  hint?: string,
): never {
  const suffix = hint === undefined ? '' : ` ${hint}`;
  throw new CalcInputError(field, `${field} must be ${relation} ${bound}${suffix} (got ${value})`);
}

/** Like {@link requireNumber} but returns `fallback` when the value is `undefined`. */
export function optionalNumber(
  value: unknown,
  field: string,
  fallback: number,
  min = -Infinity,
  max = Infinity,
  exclusive: Exclusive = 'none',
  hint?: string,
): number {
  return value === undefined ? fallback : requireNumber(value, field, min, max, exclusive, hint);
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
