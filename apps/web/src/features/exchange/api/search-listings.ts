import type { ListingSearchResultDto } from '@app/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiUrl, ApiError } from '@/lib/api-client';
import { listingKeys } from './keys';

/** Search filters as strings (the query string of `GET /api/listings`, validated by the server). */
export type ListingFilters = Record<string, string>;

/** GET /api/listings with filters; returns data and meta (total, fit basis). */
export async function searchListings(
  filters: ListingFilters,
  signal?: AbortSignal,
): Promise<ListingSearchResultDto> {
  const query: Record<string, string> = {};
  for (const [k, v] of Object.entries(filters)) if (v !== '') query[k] = v;
  let res: Response;
  try {
    res = await fetch(apiUrl('/listings', query), { credentials: 'include', signal });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError(0, 'NETWORK_ERROR', "Can't reach Rodewise right now.");
  }
  const body = (await res.json()) as ListingSearchResultDto & {
    error?: { code: 'VALIDATION_FAILED'; message: string; fields?: Record<string, string> };
  };
  if (!res.ok || body.error)
    throw new ApiError(
      res.status,
      body.error?.code ?? 'BAD_RESPONSE',
      body.error?.message ?? 'Search failed',
      body.error?.fields ?? {},
    );
  return body;
}

export const listingSearchQuery = (filters: ListingFilters) =>
  queryOptions({
    queryKey: listingKeys.search(filters),
    queryFn: ({ signal }) => searchListings(filters, signal),
    placeholderData: keepPreviousData,
  });

/** Search results for `filters`; keeps the last page on screen while a new search runs. */
export const useListingSearch = (filters: ListingFilters) => useQuery(listingSearchQuery(filters));
