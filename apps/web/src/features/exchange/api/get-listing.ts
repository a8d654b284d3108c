import type { ListingDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { listingKeys } from './keys';

/** GET /api/listings/:id, with the fit flag when `fitsBoat` is one of the member's boats. */
export const getListing = (id: number, fitsBoat?: number, signal?: AbortSignal) =>
  apiFetch<ListingDto>(`/listings/${id}`, { query: { fitsBoat }, signal });

export const listingQuery = (id: number, fitsBoat?: number) =>
  queryOptions({
    queryKey: listingKeys.detail(id, fitsBoat),
    queryFn: ({ signal }) => getListing(id, fitsBoat, signal),
  });

/** One listing as the viewer may see it. */
export const useListing = (id: number, fitsBoat?: number) => useQuery(listingQuery(id, fitsBoat));
