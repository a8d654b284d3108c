import type { ClubDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';
import { clubKeys } from './keys';

/** GET /api/club: the club's name and harbours. */
export const getClub = (signal?: AbortSignal) => apiFetch<ClubDto>('/club', { signal });

export const clubQuery = () =>
  queryOptions({
    queryKey: clubKeys.detail(),
    queryFn: ({ signal }) => getClub(signal),
    staleTime: 30 * 60_000,
  });

export const useClub = () => useQuery(clubQuery());
