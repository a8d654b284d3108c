import { z } from 'zod';
import { UNIT_SYSTEMS } from './auth';
import { REGION_TAGS, type ClubLocale } from './locale-format';

export * from './locale-format';

/** The club's locale: how dates, numbers and money read, the currency new prices start in, default units. */
export const clubLocaleSchema: z.ZodType<ClubLocale, unknown> = z.object({
  region: z.enum(REGION_TAGS, { error: 'Choose a region from the list' }),
  currency: z
    .string({ error: 'Give a currency' })
    .trim()
    .regex(/^[A-Za-z]{3}$/, 'Use a three-letter currency code such as EUR')
    .transform((s) => s.toUpperCase())
    .refine((c) => {
      try {
        new Intl.NumberFormat('en', { style: 'currency', currency: c });
        return Intl.supportedValuesOf ? Intl.supportedValuesOf('currency').includes(c) : true;
      } catch {
        return false;
      }
    }, 'Not a currency this system knows'),
  unitSystem: z.enum(UNIT_SYSTEMS, { error: 'Choose metric or imperial' }),
});
