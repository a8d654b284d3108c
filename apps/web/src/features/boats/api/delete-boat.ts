import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { boatKeys } from './keys';

/** DELETE /api/boats/:boatId. */
export const deleteBoat = (boatId: number) =>
  apiFetch<undefined>(`/boats/${boatId}`, { method: 'DELETE' });

/** Deletes a boat and drops it from the cache. */
export function useDeleteBoat() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteBoat,
    onSuccess: (_data, boatId) => {
      queryClient.removeQueries({ queryKey: boatKeys.detail(boatId) });
      return queryClient.invalidateQueries({ queryKey: boatKeys.lists() });
    },
  });
}
