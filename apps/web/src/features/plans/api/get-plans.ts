import type { TacklePlanDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { planKeys } from './keys';

/** GET /api/tackle-plans?boatId=: a boat's saved plans, newest first. */
export const getPlans = (boatId: number, signal?: AbortSignal) =>
  apiFetch<TacklePlanDto[]>('/tackle-plans', { query: { boatId }, signal });

export const plansQuery = (boatId: number) =>
  queryOptions({
    queryKey: planKeys.list(boatId),
    queryFn: ({ signal }) => getPlans(boatId, signal),
  });

export const usePlans = (boatId: number) => useQuery(plansQuery(boatId));
