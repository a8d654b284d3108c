import type { ClubDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { applyClubLocale } from '@/lib/club-locale';
import { clubKeys } from './keys';

/** GET /api/club: the club's name, harbours and locale (which from then on formats dates and money). */
export const getClub = async (signal?: AbortSignal) => {
  const club = await apiFetch<ClubDto>('/club', { signal });
  if (club.locale) applyClubLocale(club.locale);
  return club;
};

export const clubQuery = () =>
  queryOptions({
    queryKey: clubKeys.detail(),
    queryFn: ({ signal }) => getClub(signal),
    staleTime: 30 * 60_000,
  });

export const useClub = () => useQuery(clubQuery());
