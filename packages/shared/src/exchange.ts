import { z } from 'zod';
export * from './values/exchange';
import {
  CURRENCIES,
  GALVANIZING_STATES,
  LISTING_CATEGORIES,
  LISTING_CONDITIONS,
  LISTING_CONNECTOR_KINDS,
  MAX_LISTING_PHOTOS,
  MAX_PRICE_CENTS,
  MOORING_ITEMS,
  ROPE_CONSTRUCTION_IDS,
  ROPE_MATERIAL_IDS,
  WINDLASS_PARTS,
  type ListingCategory,
  type ListingCondition,
  type Currency,
  type ListingStatus,
} from './values/exchange';
import { ANCHOR_KINDS, CHAIN_GRADE_IDS } from './values/boats';

const num = (label: string, min: number, max: number, unit: string) =>
  z
    .number({ error: `${label} must be a number` })
    .finite(`${label} must be a number`)
    .min(min, `${label} must be at least ${min} ${unit}`)
    .max(max, `${label} must be at most ${max} ${unit}`);

export const anchorSpecsSchema = z.object({
  anchorType: z.enum(ANCHOR_KINDS, { error: 'Choose an anchor type' }),
  massKg: num('Anchor mass', 0.5, 500, 'kg'),
});
export const chainSpecsSchema = z
  .object({
    grade: z.enum(CHAIN_GRADE_IDS, { error: 'Choose a chain grade' }),
    tradeSizeIn: num('Trade size', 0.1, 2, 'in').optional(),
    nominalMm: num('Nominal size', 3, 50, 'mm').optional(),
    lengthM: num('Chain length', 0.5, 500, 'm'),
    galvanizing: z.enum(GALVANIZING_STATES, { error: 'Describe the galvanising' }),
  })
  .refine((c) => (c.tradeSizeIn === undefined) !== (c.nominalMm === undefined), {
    message: 'Give either a trade size (in) or a metric size (mm)',
    path: ['tradeSizeIn'],
  });
export const rodeSpecsSchema = z.object({
  material: z.enum(ROPE_MATERIAL_IDS, { error: 'Choose nylon or polyester' }),
  construction: z.enum(ROPE_CONSTRUCTION_IDS, { error: 'Choose the construction' }),
  diameterMm: num('Rope diameter', 6, 40, 'mm'),
  lengthM: num('Rope length', 1, 500, 'm'),
});
export const connectorSpecsSchema = z.object({
  kind: z.enum(LISTING_CONNECTOR_KINDS, { error: 'Choose the kind of connector' }),
  nominalIn: num('Size', 0.1, 2, 'in').optional(),
  wllN: num('Rated working load', 1, 2_000_000, 'N').optional(),
});
export const snubberSpecsSchema = z.object({
  material: z.enum(ROPE_MATERIAL_IDS, { error: 'Choose nylon or polyester' }),
  diameterMm: num('Snubber diameter', 6, 40, 'mm'),
  lengthM: num('Snubber length', 0.5, 60, 'm'),
  bridle: z.boolean().default(false),
});
export const windlassSpecsSchema = z.object({
  part: z.enum(WINDLASS_PARTS, { error: 'Windlass or gypsy?' }),
  grade: z.enum(CHAIN_GRADE_IDS).optional(),
  tradeSizeIn: num('Gypsy chain size', 0.1, 2, 'in').optional(),
  nominalMm: num('Gypsy chain size', 3, 50, 'mm').optional(),
});
export const mooringSpecsSchema = z.object({
  item: z.enum(MOORING_ITEMS, { error: 'Choose the item' }),
  massKg: num('Mass', 0.1, 20_000, 'kg').optional(),
});
export const otherSpecsSchema = z.object({});

const text = (label: string, min: number, max: number) =>
  z
    .string({ error: `${label} is required` })
    .trim()
    .min(min, min > 1 ? `${label} needs at least ${min} characters` : `${label} is required`)
    .max(max, `${label} is too long (at most ${max} characters)`);

const base = {
  title: text('Title', 3, 100),
  description: text('Description', 1, 4000),
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
  name: text('Name', 1, 80),
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

export const messageInputSchema = z.object({ body: text('Message', 1, 4000) });
export type MessageInput = z.input<typeof messageInputSchema>;
export const markSoldSchema = z.object({
  threadId: z.number().int().positive().optional(),
});
export const reportListingSchema = z.object({ reason: text('Reason', 3, 1000) });
export const hideListingSchema = z.object({ reason: text('Reason', 3, 1000) });
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

export type FitStatus = 'fits' | 'marginal' | 'too-light' | 'not-rated';
export interface FitDto {
  status: FitStatus;
  /** One sentence: the rating compared with what the boat needs, and the basis. */
  reason: string;
}
export interface FitBasisDto {
  boatId: number;
  boatName: string;
  windKn: number;
  designLoadN: number;
  /** Rope must break at no less than designFactor × design load (wet). */
  designFactor: number;
  explanation: string;
  cautions: readonly string[];
}

export interface ListingPhotoDto {
  id: number;
  url: string;
  thumbUrl: string;
  width: number;
  height: number;
  position: number;
}
export interface SellerDto {
  id: number;
  displayName: string;
  memberSince: string;
  /** Whether the seller's dues are paid; left out for signed-out visitors. */
  paidUp?: boolean;
}
export interface ListingSummaryDto {
  id: number;
  category: ListingCategory;
  title: string;
  condition: ListingCondition;
  priceCents: number;
  currency: Currency;
  harborId: number;
  harborName: string;
  specs: Record<string, unknown>;
  /** Nominal size in mm used by the size filter (chain, rope, snubber, shackle), or null. */
  sizeMm: number | null;
  thumbUrl: string | null;
  sellerName: string;
  publishedAt: string | null;
  fit?: FitDto;
}
export interface ListingDto extends Omit<ListingSummaryDto, 'sellerName'> {
  description: string;
  status: ListingStatus;
  hidden: boolean;
  expiresAt: string | null;
  soldAt: string | null;
  photos: ListingPhotoDto[];
  seller: SellerDto;
  isMine: boolean;
  /** Who a sold listing went to, when the seller chose a member: shown to that seller and that buyer only. */
  soldTo?: { displayName: string; isMe: boolean };
  createdAt: string;
  updatedAt: string;
}
export interface ListingSearchResultDto {
  data: ListingSummaryDto[];
  meta: { page: number; pageSize: number; total: number; tookMs: number; fitBasis?: FitBasisDto };
}

export interface ThreadSummaryDto {
  id: number;
  listingId: number;
  listingTitle: string;
  listingStatus: ListingStatus;
  otherParty: { id: number; displayName: string };
  role: 'buyer' | 'seller';
  lastMessage: string;
  lastMessageAt: string;
  unread: number;
  soldToThisThread: boolean;
}
export interface MessageDto {
  id: number;
  senderId: number;
  mine: boolean;
  body: string;
  createdAt: string;
}
export interface ThreadDto extends ThreadSummaryDto {
  messages: MessageDto[];
}
export interface SavedSearchDto {
  id: number;
  name: string;
  criteria: SavedSearchCriteria;
  createdAt: string;
}
export interface ListingReportDto {
  id: number;
  listingId: number;
  listingTitle: string;
  reporterName: string;
  reason: string;
  status: 'open' | 'resolved';
  createdAt: string;
}
