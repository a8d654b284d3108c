/** Query keys for listings and saved searches. */
export const listingKeys = {
  all: ['listings'] as const,
  searches: () => [...listingKeys.all, 'search'] as const,
  search: (filters: Record<string, string>) => [...listingKeys.searches(), filters] as const,
  mine: () => [...listingKeys.all, 'mine'] as const,
  details: () => [...listingKeys.all, 'detail'] as const,
  detail: (id: number, fitsBoat?: number) => [...listingKeys.details(), id, fitsBoat ?? 0] as const,
  threads: (id: number) => [...listingKeys.all, 'threads', id] as const,
  saved: () => [...listingKeys.all, 'saved-searches'] as const,
};
