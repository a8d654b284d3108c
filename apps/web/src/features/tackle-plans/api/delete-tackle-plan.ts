import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { tacklePlanKeys } from './keys';

/** DELETE /api/tackle-plans/:planId. */
export const deleteTacklePlan = (planId: number) =>
  apiFetch<undefined>(`/tackle-plans/${planId}`, { method: 'DELETE' });

/** Deletes a plan and drops it from the cache. */
export function useDeleteTacklePlan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteTacklePlan,
    onSuccess: (_data, planId) => {
      queryClient.removeQueries({ queryKey: tacklePlanKeys.detail(planId) });
      return queryClient.invalidateQueries({ queryKey: tacklePlanKeys.lists() });
    },
  });
}
