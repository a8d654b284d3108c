import type { BoatDto, BoatInput } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { boatKeys } from './keys';

/** PATCH /api/boats/:boatId. */
export const updateBoat = (boatId: number, input: Partial<BoatInput>) =>
  apiFetch<BoatDto>(`/boats/${boatId}`, { method: 'PATCH', body: input });

/** Saves changes to a boat; the cached boat and list follow. */
export function useUpdateBoat(boatId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: Partial<BoatInput>) => updateBoat(boatId, input),
    onSuccess: (boat) => {
      queryClient.setQueryData(boatKeys.detail(boatId), boat);
      return queryClient.invalidateQueries({ queryKey: boatKeys.lists() });
    },
  });
}
