import type {
  StormChecklistInput,
  StormChecklistItem,
  StormCloseInput,
  StormWatchDto,
  StormWatchInput,
  ReadinessDto,
} from '@app/shared';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { stormKeys } from './keys';

/** POST /api/storm-watches (moderator or admin). */
export const openWatch = (input: StormWatchInput) =>
  apiFetch<StormWatchDto>('/storm-watches', { method: 'POST', body: input });

export function useOpenWatch() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: openWatch,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: stormKeys.lists() }),
  });
}

/** POST /api/storm-watches/:watchId/close. */
export const closeWatch = (watchId: number, input: StormCloseInput) =>
  apiFetch<StormWatchDto>(`/storm-watches/${watchId}/close`, { method: 'POST', body: input });

export function useCloseWatch(watchId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: StormCloseInput) => closeWatch(watchId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: stormKeys.all }),
  });
}

/** PUT /api/storm-watches/:watchId/boats/:boatId/buddy. */
export const setBuddy = (watchId: number, boatId: number, buddyUserId: number | null) =>
  apiFetch<ReadinessDto>(`/storm-watches/${watchId}/boats/${boatId}/buddy`, {
    method: 'PUT',
    body: { buddyUserId },
  });

export function useSetBuddy(watchId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ boatId, buddyUserId }: { boatId: number; buddyUserId: number | null }) =>
      setBuddy(watchId, boatId, buddyUserId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: stormKeys.all }),
  });
}

/** GET /api/storm-watches/:watchId/buddies: the members a moderator may name. */
export const buddiesQuery = (watchId: number) =>
  queryOptions({
    queryKey: stormKeys.buddies(watchId),
    queryFn: ({ signal }) =>
      apiFetch<Array<{ id: number; name: string }>>(`/storm-watches/${watchId}/buddies`, {
        signal,
      }),
  });

export const useBuddies = (watchId: number, enabled: boolean) =>
  useQuery({ ...buddiesQuery(watchId), enabled });

/** GET and PUT /api/storm-watches/checklist: the club's template. */
export const checklistQuery = () =>
  queryOptions({
    queryKey: stormKeys.checklist(),
    queryFn: ({ signal }) =>
      apiFetch<{ items: StormChecklistItem[] }>('/storm-watches/checklist', { signal }),
  });

export const useChecklist = () => useQuery(checklistQuery());

export function useSaveChecklist() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: StormChecklistInput) =>
      apiFetch<{ items: StormChecklistItem[] }>('/storm-watches/checklist', {
        method: 'PUT',
        body: input,
      }),
    onSuccess: (saved) => queryClient.setQueryData(stormKeys.checklist(), saved),
  });
}
