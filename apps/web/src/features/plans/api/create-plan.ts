import type { TacklePlanInput } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { planKeys } from './keys';
import type { PlanWithResult } from './types';

/** POST /api/tackle-plans. */
export const createPlan = (input: TacklePlanInput) =>
  apiFetch<PlanWithResult>('/tackle-plans', { method: 'POST', body: input });

/** Saves a new plan; its detail is cached and the boat's list refreshed. */
export function useCreatePlan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPlan,
    onSuccess: (saved) => {
      queryClient.setQueryData(planKeys.detail(saved.plan.id), saved);
      return queryClient.invalidateQueries({ queryKey: planKeys.lists() });
    },
  });
}
