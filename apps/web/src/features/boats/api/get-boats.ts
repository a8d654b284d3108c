import type { BoatDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { boatKeys } from './keys';

/** GET /api/boats: the signed-in member's boats. */
export const getBoats = (signal?: AbortSignal) => apiFetch<BoatDto[]>('/boats', { signal });

export const boatsQuery = () =>
  queryOptions({ queryKey: boatKeys.lists(), queryFn: ({ signal }) => getBoats(signal) });

export const useBoats = () => useQuery(boatsQuery());
