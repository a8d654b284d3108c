import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import type { ZodType } from 'zod';
import { ApiError } from './api-client';

const FALLBACK_MESSAGE = 'Something went wrong. Please try again.';

/** The message to show a person for any thrown value; never a stack trace. */
export function errorMessage(error: unknown): string {
  if (error instanceof ApiError) return error.message;
  return FALLBACK_MESSAGE;
}

/**
 * Puts a server error on the form: each message in `fields` whose name is one of `fieldNames` goes on that
 * field (the first one gets focus); anything else becomes the form-level `root.server` error.
 * The values the person typed are left as they are.
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fieldNames: readonly Path<T>[],
): void {
  const fields = error instanceof ApiError ? error.fields : {};
  let placed = 0;
  let unplaced = '';
  for (const [name, message] of Object.entries(fields)) {
    const field = fieldNames.find((candidate) => candidate === name);
    if (field) {
      setError(field, { type: 'server', message }, { shouldFocus: placed === 0 });
      placed += 1;
    } else {
      unplaced = unplaced || message;
    }
  }
  if (placed === 0 || unplaced) {
    setError('root.server', {
      type: 'server',
      message: placed === 0 ? errorMessage(error) : unplaced,
    });
  }
}

/**
 * Checks `input` with the shared schema the server also uses (so the messages match) and sends it when it
 * passes. The schema's issues, then the server's, go on the fields in `fieldNames` (the first one gets focus).
 */
export async function sendChecked<I, T extends FieldValues>(
  schema: ZodType<I>,
  input: I,
  send: (input: I) => Promise<unknown>,
  setError: UseFormSetError<T>,
  fieldNames: readonly Path<T>[],
): Promise<void> {
  const parsed = schema.safeParse(input);
  if (!parsed.success) {
    let placed = 0;
    for (const issue of parsed.error.issues) {
      const field = fieldNames.find((candidate) => candidate === issue.path[0]);
      if (!field) continue;
      setError(field, { type: 'client', message: issue.message }, { shouldFocus: placed === 0 });
      placed += 1;
    }
    return;
  }
  try {
    await send(input);
  } catch (err) {
    applyServerErrors(err, setError, fieldNames);
  }
}
