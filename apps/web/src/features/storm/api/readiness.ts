import type { ReadinessDto, ReadinessInput, StormWatchDto } from '@app/shared';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { stormKeys } from './keys';

export interface BoatReadinessDto {
  watch: StormWatchDto;
  readiness: ReadinessDto;
}

/** GET /api/storm-watches/:watchId/boats/:boatId. */
export const getReadiness = (watchId: number, boatId: number, signal?: AbortSignal) =>
  apiFetch<BoatReadinessDto>(`/storm-watches/${watchId}/boats/${boatId}`, { signal });

export const readinessQuery = (watchId: number, boatId: number) =>
  queryOptions({
    queryKey: stormKeys.boat(watchId, boatId),
    queryFn: ({ signal }) => getReadiness(watchId, boatId, signal),
  });

export const useReadiness = (watchId: number, boatId: number) =>
  useQuery(readinessQuery(watchId, boatId));

/** PUT /api/storm-watches/:watchId/boats/:boatId: the owner saves the boat's readiness. */
export const saveReadiness = (watchId: number, boatId: number, input: ReadinessInput) =>
  apiFetch<ReadinessDto>(`/storm-watches/${watchId}/boats/${boatId}`, {
    method: 'PUT',
    body: input,
  });

export function useSaveReadiness(watchId: number, boatId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ReadinessInput) => saveReadiness(watchId, boatId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: stormKeys.all }),
  });
}
