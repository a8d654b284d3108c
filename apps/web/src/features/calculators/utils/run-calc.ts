import { CalcInputError } from '@app/calc';

/** A calculation's value, or the field it rejected and why. */
export type CalcOutcome<T> = { ok: true; value: T } | { ok: false; field: string; message: string };

/**
 * Runs a calc function, turning its RangeError (a `CalcInputError` naming the field) into a message
 * the screen shows next to that field, so bad input never crashes the page.
 */
export function runCalc<T>(fn: () => T): CalcOutcome<T> {
  try {
    return { ok: true, value: fn() };
  } catch (error) {
    if (error instanceof CalcInputError) {
      return { ok: false, field: error.field, message: error.message };
    }
    if (error instanceof RangeError) return { ok: false, field: '', message: error.message };
    throw error;
  }
}

/** The outcome's message when it rejected one of `fields` (by name or path prefix). */
export function fieldError<T>(outcome: CalcOutcome<T>, ...fields: string[]): string | undefined {
  if (outcome.ok) return undefined;
  return fields.some((f) => outcome.field === f || outcome.field.startsWith(`${f}.`))
    ? outcome.message
    : undefined;
}
