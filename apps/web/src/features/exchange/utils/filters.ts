/** The filters that narrow results (not the text, the order or the page): counted on the phone's toggle. */
export const FACET_KEYS = [
  'category',
  'harborId',
  'condition',
  'priceMin',
  'priceMax',
  'sizeMinMm',
  'sizeMaxMm',
  'fitsBoat',
  'fitsOnly',
] as const;

export const activeFilterCount = (value: Record<string, string>) =>
  FACET_KEYS.filter((k) => value[k] !== undefined && value[k] !== '').length;

/** Every key of the exchange's address the search reads: the text, the facets, the order, the wind, the page. */
export const SEARCH_KEYS = ['q', ...FACET_KEYS, 'sort', 'windKn', 'page'] as const;
