import type { ListingDto } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { listingKeys } from './keys';

export type ListingAction = 'publish' | 'relist' | 'withdraw' | 'sold';

export interface ChangeListingStatusVariables {
  id: number;
  action: ListingAction;
  /** For `sold`: the conversation whose buyer bought it. */
  threadId?: number;
}

/** POST /api/listings/:id/{publish|relist|withdraw|sold}. */
export const changeListingStatus = ({ id, action, threadId }: ChangeListingStatusVariables) =>
  apiFetch<ListingDto>(`/listings/${id}/${action}`, {
    method: 'POST',
    body: action === 'sold' ? (threadId ? { threadId } : {}) : undefined,
  });

/** Moves a listing through its life-cycle and refreshes listing queries. */
export function useChangeListingStatus() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: changeListingStatus,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: listingKeys.all }),
  });
}
