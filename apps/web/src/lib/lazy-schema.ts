import type { FieldValues, Resolver } from 'react-hook-form';
import type { z } from 'zod';

/** The shared schemas and zod, as a lazily loaded chunk (see lib/schemas.ts). */
export const loadSchemas = () => import('./schemas');

/**
 * A react-hook-form resolver that checks with a zod schema loaded on first use: the form draws and takes input
 * without zod, and the first check (on submit, as the forms validate) waits for the schema chunk once.
 */
export function lazyZodResolver<Input extends FieldValues, Output>(
  load: () => Promise<z.ZodType<Output, Input>>,
): Resolver<Input, unknown, Output> {
  return async (values, context, options) => {
    const [schema, { zodResolver }] = await Promise.all([load(), loadSchemas()]);
    return zodResolver(schema)(values, context, options);
  };
}
