import type { TacklePlanInput } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { tacklePlanKeys } from './keys';
import type { TacklePlanWithResult } from './types';

export type TacklePlanPatch = Partial<Omit<TacklePlanInput, 'boatId'>>;

/** PUT /api/tackle-plans/:planId. */
export const updateTacklePlan = (planId: number, input: TacklePlanPatch) =>
  apiFetch<TacklePlanWithResult>(`/tackle-plans/${planId}`, { method: 'PUT', body: input });

/** Saves changes to a plan; the answer (with fresh figures) replaces the cached plan. */
export function useUpdateTacklePlan(planId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: TacklePlanPatch) => updateTacklePlan(planId, input),
    onSuccess: (saved) => {
      queryClient.setQueryData(tacklePlanKeys.detail(planId), saved);
      return queryClient.invalidateQueries({ queryKey: tacklePlanKeys.lists() });
    },
  });
}
