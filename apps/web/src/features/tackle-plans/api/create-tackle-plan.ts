import type { TacklePlanInput } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { tacklePlanKeys } from './keys';
import type { TacklePlanWithResult } from './types';

/** POST /api/tackle-plans. */
export const createTacklePlan = (input: TacklePlanInput) =>
  apiFetch<TacklePlanWithResult>('/tackle-plans', { method: 'POST', body: input });

/** Saves a new plan; its detail is cached and the boat's list refreshed. */
export function useCreateTacklePlan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createTacklePlan,
    onSuccess: (saved) => {
      queryClient.setQueryData(tacklePlanKeys.detail(saved.plan.id), saved);
      return queryClient.invalidateQueries({ queryKey: tacklePlanKeys.lists() });
    },
  });
}
