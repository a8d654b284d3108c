import { z } from 'zod';

type UnwrapDefault<T> = T extends z.ZodDefault<infer Inner> ? Inner : T;
type NoDefaults<S extends z.ZodRawShape> = { [K in keyof S]: UnwrapDefault<S[K]> };

/**
 * The shape of a change to `schema`: every field optional and none with a default. zod applies a field's
 * `.default()` even inside `.partial()`, so a PATCH built that way would reset every field it was not sent.
 * Defaults deeper down stay: a nested object that is sent replaces the stored one whole.
 */
export function patchOf<S extends z.ZodRawShape>(schema: z.ZodObject<S>) {
  const shape = Object.fromEntries(
    Object.entries(schema.shape).map(([key, field]) => [
      key,
      field instanceof z.ZodDefault ? field.unwrap() : field,
    ]),
  ) as NoDefaults<S>;
  return z.object(shape).partial();
}

/** `patchOf` that refuses an empty change. */
export const nonEmptyPatchOf = <S extends z.ZodRawShape>(schema: z.ZodObject<S>) =>
  patchOf(schema).refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change' });
