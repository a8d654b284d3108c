// Exchange vocabulary and limits, without the schemas: the web app's first load reads these.
import { labelKeys } from './label-keys';

/** What can be listed on the exchange. */
export const LISTING_CATEGORY_LABELS = {
  anchor: 'Anchors',
  chain: 'Chain',
  rode: 'Rope rode',
  connector: 'Shackles and swivels',
  snubber: 'Snubbers and bridles',
  windlass: 'Windlass and gypsy',
  mooring: 'Mooring gear',
  other: 'Other',
};

export const LISTING_CONDITION_LABELS = {
  new: 'New, unused',
  'like-new': 'Like new',
  good: 'Good, light wear',
  fair: 'Fair, visible wear',
  'for-parts': 'Spares only, not for use',
};

// The value lists, in the order of their labels above.
export const LISTING_CATEGORIES = labelKeys(LISTING_CATEGORY_LABELS);
export const LISTING_CONDITIONS = labelKeys(LISTING_CONDITION_LABELS);
export const LISTING_STATUSES = ['draft', 'active', 'sold', 'expired', 'withdrawn'] as const;
export const CURRENCIES = [
  'EUR',
  'GBP',
  'USD',
  'CAD',
  'AUD',
  'NZD',
  'SEK',
  'NOK',
  'DKK',
  'CHF',
] as const;

export const GALVANIZING_STATES = ['as-new', 'good', 'patchy', 'needs-regalvanizing'] as const;
export const ROPE_MATERIAL_IDS = ['nylon', 'polyester'] as const;
export const ROPE_CONSTRUCTION_IDS = ['three-strand', 'double-braid'] as const;
export const LISTING_CONNECTOR_KINDS = ['shackle', 'swivel', 'link', 'other'] as const;
export const WINDLASS_PARTS = ['windlass', 'gypsy'] as const;
export const MOORING_ITEMS = ['buoy', 'pennant', 'sinker', 'riser-chain', 'other'] as const;

/** Photos per listing. */
export const MAX_LISTING_PHOTOS = 8;
/** Days a listing stays active before it expires. */
export const LISTING_LIFETIME_DAYS = 60;
/** Largest price, in minor units (100 000.00). */
export const MAX_PRICE_CENTS = 10_000_000;

export type ListingCategory = (typeof LISTING_CATEGORIES)[number];
export type ListingCondition = (typeof LISTING_CONDITIONS)[number];
export type ListingStatus = (typeof LISTING_STATUSES)[number];
export type Currency = (typeof CURRENCIES)[number];
