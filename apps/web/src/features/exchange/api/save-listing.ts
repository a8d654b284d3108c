import type { ListingDto, ListingInput } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { listingKeys } from './keys';

export interface SaveListingVariables {
  /** Absent: create a draft; present: replace that listing's fields. */
  id?: number;
  input: ListingInput;
}

/** POST /api/listings (draft) or PUT /api/listings/:id. */
export const saveListing = ({ id, input }: SaveListingVariables) =>
  id === undefined
    ? apiFetch<ListingDto>('/listings', { method: 'POST', body: input })
    : apiFetch<ListingDto>(`/listings/${id}`, { method: 'PUT', body: input });

/** Saves a listing and refreshes every listing query. */
export function useSaveListing() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveListing,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: listingKeys.all }),
  });
}
