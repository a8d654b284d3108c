import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { planKeys } from './keys';

/** DELETE /api/tackle-plans/:planId. */
export const deletePlan = (planId: number) =>
  apiFetch<undefined>(`/tackle-plans/${planId}`, { method: 'DELETE' });

/** Deletes a plan and drops it from the cache. */
export function useDeletePlan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deletePlan,
    onSuccess: (_data, planId) => {
      queryClient.removeQueries({ queryKey: planKeys.detail(planId) });
      return queryClient.invalidateQueries({ queryKey: planKeys.lists() });
    },
  });
}
