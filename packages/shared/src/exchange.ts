import { z } from 'zod';
export * from './values/exchange';
import {
  CURRENCIES,
  GALVANIZING_STATES,
  LISTING_CONDITIONS,
  LISTING_CONNECTOR_KINDS,
  MAX_LISTING_PHOTOS,
  MAX_PRICE_CENTS,
  MOORING_ITEMS,
  ROPE_CONSTRUCTION_IDS,
  ROPE_MATERIAL_IDS,
  WINDLASS_PARTS,
} from './values/exchange';
import { ANCHOR_KINDS, CHAIN_GRADE_IDS } from './values/boats';
import { numberField, textField } from './fields';

export const anchorSpecsSchema = z.object({
  anchorType: z.enum(ANCHOR_KINDS, { error: 'Choose an anchor type' }),
  massKg: numberField('Anchor mass', 0.5, 500, 'kg'),
});
export const chainSpecsSchema = z
  .object({
    grade: z.enum(CHAIN_GRADE_IDS, { error: 'Choose a chain grade' }),
    tradeSizeIn: numberField('Trade size', 0.1, 2, 'in').optional(),
    nominalMm: numberField('Nominal size', 3, 50, 'mm').optional(),
    lengthM: numberField('Chain length', 0.5, 500, 'm'),
    galvanizing: z.enum(GALVANIZING_STATES, { error: 'Describe the galvanising' }),
  })
  .refine((c) => (c.tradeSizeIn === undefined) !== (c.nominalMm === undefined), {
    message: 'Give either a trade size (in) or a metric size (mm)',
    path: ['tradeSizeIn'],
  });
export const rodeSpecsSchema = z.object({
  material: z.enum(ROPE_MATERIAL_IDS, { error: 'Choose nylon or polyester' }),
  construction: z.enum(ROPE_CONSTRUCTION_IDS, { error: 'Choose the construction' }),
  diameterMm: numberField('Rope diameter', 6, 40, 'mm'),
  lengthM: numberField('Rope length', 1, 500, 'm'),
});
export const connectorSpecsSchema = z.object({
  kind: z.enum(LISTING_CONNECTOR_KINDS, { error: 'Choose the kind of connector' }),
  nominalIn: numberField('Size', 0.1, 2, 'in').optional(),
  wllN: numberField('Rated working load', 1, 2_000_000, 'N').optional(),
});
export const snubberSpecsSchema = z.object({
  material: z.enum(ROPE_MATERIAL_IDS, { error: 'Choose nylon or polyester' }),
  diameterMm: numberField('Snubber diameter', 6, 40, 'mm'),
  lengthM: numberField('Snubber length', 0.5, 60, 'm'),
  bridle: z.boolean().default(false),
});
export const windlassSpecsSchema = z.object({
  part: z.enum(WINDLASS_PARTS, { error: 'Windlass or gypsy?' }),
  grade: z.enum(CHAIN_GRADE_IDS).optional(),
  tradeSizeIn: numberField('Gypsy chain size', 0.1, 2, 'in').optional(),
  nominalMm: numberField('Gypsy chain size', 3, 50, 'mm').optional(),
});
export const mooringSpecsSchema = z.object({
  item: z.enum(MOORING_ITEMS, { error: 'Choose the item' }),
  massKg: numberField('Mass', 0.1, 20_000, 'kg').optional(),
});
export const otherSpecsSchema = z.object({});

const base = {
  title: textField('Title', 3, 100),
  description: textField('Description', 1, 4000),
  condition: z.enum(LISTING_CONDITIONS, { error: 'Choose a condition' }),
  priceCents: z
    .number({ error: 'Price must be a number' })
    .int('Price must be in whole cents')
    .min(0, 'Price cannot be negative')
    .max(MAX_PRICE_CENTS, 'Price is too high (at most 100 000)'),
  currency: z.enum(CURRENCIES, { error: 'Choose a currency' }),
  harborId: z.number({ error: 'Choose a harbour' }).int().positive('Choose a harbour'),
};

/** A listing as the seller writes it: common fields plus typed specs for its category. */
export const listingInputSchema = z.discriminatedUnion(
  'category',
  [
    z.object({ ...base, category: z.literal('anchor'), specs: anchorSpecsSchema }),
    z.object({ ...base, category: z.literal('chain'), specs: chainSpecsSchema }),
    z.object({ ...base, category: z.literal('rode'), specs: rodeSpecsSchema }),
    z.object({ ...base, category: z.literal('connector'), specs: connectorSpecsSchema }),
    z.object({ ...base, category: z.literal('snubber'), specs: snubberSpecsSchema }),
    z.object({ ...base, category: z.literal('windlass'), specs: windlassSpecsSchema }),
    z.object({ ...base, category: z.literal('mooring'), specs: mooringSpecsSchema }),
    z.object({ ...base, category: z.literal('other'), specs: otherSpecsSchema }),
  ],
  { error: 'Choose one of the listed categories' },
);
export type ListingInput = z.input<typeof listingInputSchema>;
export type ListingSpecs = z.output<typeof listingInputSchema>['specs'];

export const messageInputSchema = z.object({ body: textField('Message', 1, 4000) });
export type MessageInput = z.input<typeof messageInputSchema>;
export const markSoldSchema = z.object({
  threadId: z.number().int().positive().optional(),
});
export const reportListingSchema = z.object({ reason: textField('Reason', 3, 1000) });
export const hideListingSchema = z.object({ reason: textField('Reason', 3, 1000) });
/** A moderator dismisses a listing report; the note (optional) goes to the audit log. */
export const dismissListingReportSchema = z.object({
  note: z.string().trim().max(1000, 'Keep the note under 1000 characters').default(''),
});
export type DismissListingReportInput = z.input<typeof dismissListingReportSchema>;
export type HideListingInput = z.input<typeof hideListingSchema>;
export const photoOrderSchema = z.object({
  photoIds: z
    .array(z.number().int().positive())
    .min(1, 'List the photos in their new order')
    .max(MAX_LISTING_PHOTOS),
});
