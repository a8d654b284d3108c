// Exchange vocabulary and limits, without the schemas: the web app's first load reads these.
/** What can be listed on the exchange. */
export const LISTING_CATEGORIES = [
  'anchor',
  'chain',
  'rode',
  'connector',
  'snubber',
  'windlass',
  'mooring',
  'other',
] as const;
export type ListingCategory = (typeof LISTING_CATEGORIES)[number];
export const LISTING_CATEGORY_LABELS: Record<ListingCategory, string> = {
  anchor: 'Anchors',
  chain: 'Chain',
  rode: 'Rope rode',
  connector: 'Shackles and swivels',
  snubber: 'Snubbers and bridles',
  windlass: 'Windlass and gypsy',
  mooring: 'Mooring gear',
  other: 'Other',
};

export const LISTING_CONDITIONS = ['new', 'like-new', 'good', 'fair', 'for-parts'] as const;
export type ListingCondition = (typeof LISTING_CONDITIONS)[number];
export const LISTING_CONDITION_LABELS: Record<ListingCondition, string> = {
  new: 'New, unused',
  'like-new': 'Like new',
  good: 'Good, light wear',
  fair: 'Fair, visible wear',
  'for-parts': 'Spares only, not for use',
};

export const LISTING_STATUSES = ['draft', 'active', 'sold', 'expired', 'withdrawn'] as const;
export type ListingStatus = (typeof LISTING_STATUSES)[number];

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
export type Currency = (typeof CURRENCIES)[number];

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
