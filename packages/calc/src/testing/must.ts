/** The value, or a thrown error when it is null or undefined: for tests that expect a result. */
export function must<T>(value: T | null | undefined, what = 'value'): T {
  if (value === null || value === undefined) throw new Error(`expected a ${what}`);
  return value;
}
