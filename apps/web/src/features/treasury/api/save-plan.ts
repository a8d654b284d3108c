import type { PlanDto, PlanInput, PlanPatch } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { treasuryKeys } from './keys';

/** POST /api/treasury/plans. */
export const createPlan = (input: PlanInput) =>
  apiFetch<PlanDto>('/treasury/plans', { method: 'POST', body: input });

/** PATCH /api/treasury/plans/:planId. */
export const updatePlan = ({ planId, ...patch }: PlanPatch & { planId: number }) =>
  apiFetch<PlanDto>(`/treasury/plans/${planId}`, { method: 'PATCH', body: patch });

/** Adds a plan; the plan list, calendar preview and roster reload. */
export function useCreatePlan() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: createPlan,
    onSuccess: () => qc.invalidateQueries({ queryKey: treasuryKeys.all }),
  });
}

/** Changes a plan (new amounts apply to checkouts opened from now on). */
export function useUpdatePlan() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: updatePlan,
    onSuccess: () => qc.invalidateQueries({ queryKey: treasuryKeys.all }),
  });
}
