import type { BoatDto, BoatInput } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { boatKeys } from './keys';

/** POST /api/boats. */
export const createBoat = (input: BoatInput) =>
  apiFetch<BoatDto>('/boats', { method: 'POST', body: input });

/** Adds a boat and refreshes the list. */
export function useCreateBoat() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createBoat,
    onSuccess: (boat) => {
      queryClient.setQueryData(boatKeys.detail(boat.id), boat);
      return queryClient.invalidateQueries({ queryKey: boatKeys.lists() });
    },
  });
}
