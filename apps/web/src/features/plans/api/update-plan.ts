import type { TacklePlanInput } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { planKeys } from './keys';
import type { PlanWithResult } from './types';

export type PlanPatch = Partial<Omit<TacklePlanInput, 'boatId'>>;

/** PUT /api/tackle-plans/:planId. */
export const updatePlan = (planId: number, input: PlanPatch) =>
  apiFetch<PlanWithResult>(`/tackle-plans/${planId}`, { method: 'PUT', body: input });

/** Saves changes to a plan; the answer (with fresh figures) replaces the cached plan. */
export function useUpdatePlan(planId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: PlanPatch) => updatePlan(planId, input),
    onSuccess: (saved) => {
      queryClient.setQueryData(planKeys.detail(planId), saved);
      return queryClient.invalidateQueries({ queryKey: planKeys.lists() });
    },
  });
}
