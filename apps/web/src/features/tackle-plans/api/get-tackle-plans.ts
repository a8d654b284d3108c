import type { TacklePlanDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { tacklePlanKeys } from './keys';

/** GET /api/tackle-plans?boatId=: a boat's saved plans, newest first. */
export const getTacklePlans = (boatId: number, signal?: AbortSignal) =>
  apiFetch<TacklePlanDto[]>('/tackle-plans', { query: { boatId }, signal });

export const tacklePlansQuery = (boatId: number) =>
  queryOptions({
    queryKey: tacklePlanKeys.list(boatId),
    queryFn: ({ signal }) => getTacklePlans(boatId, signal),
  });

export const useTacklePlans = (boatId: number) => useQuery(tacklePlansQuery(boatId));
