import type { ListingDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { listingKeys } from './keys';

/** GET /api/listings/mine: the member's listings of every status. */
export const getMyListings = (signal?: AbortSignal) =>
  apiFetch<ListingDto[]>('/listings/mine', { signal });

export const myListingsQuery = () =>
  queryOptions({ queryKey: listingKeys.mine(), queryFn: ({ signal }) => getMyListings(signal) });

/** The member's own listings. */
export const useMyListings = () => useQuery(myListingsQuery());
