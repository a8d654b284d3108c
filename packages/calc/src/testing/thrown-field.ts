import { CalcInputError } from '../errors';

/**
 * Runs `fn` and returns the field named by the {@link CalcInputError} it throws; fails the
 * calling test (by throwing) when it throws nothing or another error.
 */
export function thrownField(fn: () => unknown): string {
  try {
    fn();
  } catch (error) {
    if (error instanceof CalcInputError && error instanceof RangeError) {
      if (!error.message.includes(error.field))
        throw new Error(`message does not name ${error.field}`);
      return error.field;
    }
    throw error;
  }
  throw new Error('expected a CalcInputError, nothing was thrown');
}
