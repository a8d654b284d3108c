import type { SavedSearchDto, SavedSearchInput } from '@app/shared';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { listingKeys } from './keys';

/** GET /api/saved-searches. */
export const getSavedSearches = (signal?: AbortSignal) =>
  apiFetch<SavedSearchDto[]>('/saved-searches', { signal });

export const savedSearchesQuery = () =>
  queryOptions({
    queryKey: listingKeys.saved(),
    queryFn: ({ signal }) => getSavedSearches(signal),
  });

/** The member's saved searches (`enabled` when signed in). */
export const useSavedSearches = (enabled: boolean) =>
  useQuery({ ...savedSearchesQuery(), enabled });

/** POST /api/saved-searches. */
export function useCreateSavedSearch() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SavedSearchInput) =>
      apiFetch<SavedSearchDto>('/saved-searches', { method: 'POST', body: input }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: listingKeys.saved() }),
  });
}

/** DELETE /api/saved-searches/:id. */
export function useDeleteSavedSearch() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => apiFetch<void>(`/saved-searches/${id}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: listingKeys.saved() }),
  });
}
