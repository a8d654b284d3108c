import type { ThreadSummaryDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { listingKeys } from './keys';

/** GET /api/listings/:id/threads: the seller's conversations about one listing. */
export const getListingThreads = (id: number, signal?: AbortSignal) =>
  apiFetch<ThreadSummaryDto[]>(`/listings/${id}/threads`, { signal });

export const listingThreadsQuery = (id: number) =>
  queryOptions({
    queryKey: listingKeys.threads(id),
    queryFn: ({ signal }) => getListingThreads(id, signal),
  });

/** The buyers who wrote about the seller's listing (`enabled` only for the seller). */
export const useListingThreads = (id: number, enabled: boolean) =>
  useQuery({ ...listingThreadsQuery(id), enabled });
