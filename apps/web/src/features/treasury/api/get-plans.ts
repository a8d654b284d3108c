import type { PlanDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { treasuryKeys } from './keys';

/** GET /api/treasury/plans. */
export const getPlans = (signal?: AbortSignal) =>
  apiFetch<PlanDto[]>('/treasury/plans', { signal });

export const plansQuery = () =>
  queryOptions({ queryKey: treasuryKeys.plans(), queryFn: ({ signal }) => getPlans(signal) });

/** Every dues plan. */
export const usePlans = () => useQuery(plansQuery());
