/**
 * The error every calc function throws for invalid input. It is a `RangeError` (so
 * `instanceof RangeError` holds) that also carries the offending field's path, e.g.
 * `loaM` or `components.chain.tradeSizeIn`, so an API can report it against the field.
 */
export class CalcInputError extends RangeError {
  /** Path of the invalid field, dot-separated, with `[i]` for array items. */
  readonly field: string;

  constructor(field: string, message: string) {
    super(message);
    this.name = 'CalcInputError';
    this.field = field;
  }
}

/**
 * Runs `fn` and re-throws any {@link CalcInputError} with `prefix` prepended to its field,
 * so nested inputs report their full path (`boat.loaM` rather than `loaM`).
 */
export function withFieldPrefix<T>(prefix: string, fn: () => T): T {
  try {
    return fn();
  } catch (error) {
    if (error instanceof CalcInputError) {
      const field = error.field === '' ? prefix : `${prefix}.${error.field}`;
      const message = error.message.startsWith(error.field)
        ? `${field}${error.message.slice(error.field.length)}`
        : error.message;
      throw new CalcInputError(field, message);
    }
    throw error;
  }
}
