import type { PlanDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { treasuryKeys } from './keys';

/** GET /api/treasury/plans. */
export const getMembershipPlans = (signal?: AbortSignal) =>
  apiFetch<PlanDto[]>('/treasury/plans', { signal });

export const membershipPlansQuery = () =>
  queryOptions({
    queryKey: treasuryKeys.plans(),
    queryFn: ({ signal }) => getMembershipPlans(signal),
  });

/** Every dues plan. */
export const useMembershipPlans = () => useQuery(membershipPlansQuery());
