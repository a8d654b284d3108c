import { z } from 'zod';
import { LISTING_CATEGORIES, LISTING_CONDITIONS, MAX_PRICE_CENTS } from './exchange';
import { textField } from './fields';

export const LISTING_SORTS = ['relevance', 'newest', 'price-asc', 'price-desc'] as const;
export type ListingSort = (typeof LISTING_SORTS)[number];

const optNum = (label: string, min: number, max: number) =>
  z.coerce
    .number({ error: `${label} must be a number` })
    .min(min, `${label} must be at least ${min}`)
    .max(max, `${label} must be at most ${max}`)
    .optional();

/** Query string of `GET /api/listings`. Prices in minor units, sizes in mm, design wind in knots. */
export const listingSearchSchema = z
  .object({
    q: z.string().trim().max(200, 'Search text is too long').optional(),
    category: z.enum(LISTING_CATEGORIES, { error: 'Unknown category' }).optional(),
    harborId: z.coerce.number().int().positive('Unknown harbour').optional(),
    condition: z.enum(LISTING_CONDITIONS, { error: 'Unknown condition' }).optional(),
    priceMin: optNum('Lowest price', 0, MAX_PRICE_CENTS),
    priceMax: optNum('Highest price', 0, MAX_PRICE_CENTS),
    sizeMinMm: optNum('Smallest size', 0, 100),
    sizeMaxMm: optNum('Largest size', 0, 100),
    fitsBoat: z.coerce.number().int().positive('Choose one of your boats').optional(),
    windKn: optNum('Design wind', 10, 70),
    fitsOnly: z
      .enum(['true', 'false', '1', '0'])
      .transform((v) => v === 'true' || v === '1')
      .optional(),
    sort: z.enum(LISTING_SORTS, { error: 'Unknown sort order' }).optional(),
    page: z.coerce.number().int().min(1).max(1000).default(1),
    pageSize: z.coerce.number().int().min(1).max(50).default(20),
  })
  .refine((v) => v.priceMin === undefined || v.priceMax === undefined || v.priceMin <= v.priceMax, {
    message: 'Lowest price is above the highest',
    path: ['priceMin'],
  })
  .refine(
    (v) => v.sizeMinMm === undefined || v.sizeMaxMm === undefined || v.sizeMinMm <= v.sizeMaxMm,
    { message: 'Smallest size is above the largest', path: ['sizeMinMm'] },
  );
export type ListingSearchInput = z.input<typeof listingSearchSchema>;
export type ListingSearch = z.output<typeof listingSearchSchema>;

/** Criteria a saved search keeps (no paging, sort or boat). */
export const savedSearchInputSchema = z.object({
  name: textField('Name', 1, 80),
  criteria: z
    .object({
      q: z.string().trim().max(200).optional(),
      category: z.enum(LISTING_CATEGORIES, { error: 'Unknown category' }).optional(),
      harborId: z.number().int().positive().optional(),
      condition: z.enum(LISTING_CONDITIONS).optional(),
      priceMax: z.number().int().min(0).max(MAX_PRICE_CENTS).optional(),
      sizeMinMm: z.number().min(0).max(100).optional(),
      sizeMaxMm: z.number().min(0).max(100).optional(),
    })
    .refine((c) => Object.values(c).some((v) => v !== undefined && v !== ''), {
      message: 'Give at least one criterion',
      path: ['q'],
    }),
});
export type SavedSearchInput = z.input<typeof savedSearchInputSchema>;
export type SavedSearchCriteria = z.output<typeof savedSearchInputSchema>['criteria'];
