import type { BoatDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { boatKeys } from './keys';

/** GET /api/boats/:boatId (404 for another member's boat). */
export const getBoat = (boatId: number, signal?: AbortSignal) =>
  apiFetch<BoatDto>(`/boats/${boatId}`, { signal });

export const boatQuery = (boatId: number) =>
  queryOptions({
    queryKey: boatKeys.detail(boatId),
    queryFn: ({ signal }) => getBoat(boatId, signal),
  });

export const useBoat = (boatId: number) => useQuery(boatQuery(boatId));
