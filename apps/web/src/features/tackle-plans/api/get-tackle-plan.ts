import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { tacklePlanKeys } from './keys';
import type { TacklePlanWithResult } from './types';

/** GET /api/tackle-plans/:planId: the plan, its boat and the computed result. */
export const getTacklePlan = (planId: number, signal?: AbortSignal) =>
  apiFetch<TacklePlanWithResult>(`/tackle-plans/${planId}`, { signal });

export const tacklePlanQuery = (planId: number) =>
  queryOptions({
    queryKey: tacklePlanKeys.detail(planId),
    queryFn: ({ signal }) => getTacklePlan(planId, signal),
  });

export const useTacklePlan = (planId: number) => useQuery(tacklePlanQuery(planId));
