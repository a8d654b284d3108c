import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { planKeys } from './keys';
import type { PlanWithResult } from './types';

/** GET /api/tackle-plans/:planId: the plan, its boat and the computed result. */
export const getPlan = (planId: number, signal?: AbortSignal) =>
  apiFetch<PlanWithResult>(`/tackle-plans/${planId}`, { signal });

export const planQuery = (planId: number) =>
  queryOptions({
    queryKey: planKeys.detail(planId),
    queryFn: ({ signal }) => getPlan(planId, signal),
  });

export const usePlan = (planId: number) => useQuery(planQuery(planId));
