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
