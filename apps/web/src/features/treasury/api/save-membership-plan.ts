import type { PlanDto, PlanInput, PlanPatch } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { treasuryKeys } from './keys';

/** POST /api/treasury/plans. */
export const createMembershipPlan = (input: PlanInput) =>
  apiFetch<PlanDto>('/treasury/plans', { method: 'POST', body: input });

/** PATCH /api/treasury/plans/:planId. */
export const updateMembershipPlan = ({ planId, ...patch }: PlanPatch & { planId: number }) =>
  apiFetch<PlanDto>(`/treasury/plans/${planId}`, { method: 'PATCH', body: patch });

/** Adds a plan; the plan list, calendar preview and roster reload. */
export function useCreateMembershipPlan() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: createMembershipPlan,
    onSuccess: () => qc.invalidateQueries({ queryKey: treasuryKeys.all }),
  });
}

/** Changes a plan (new amounts apply to checkouts opened from now on). */
export function useUpdateMembershipPlan() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: updateMembershipPlan,
    onSuccess: () => qc.invalidateQueries({ queryKey: treasuryKeys.all }),
  });
}
