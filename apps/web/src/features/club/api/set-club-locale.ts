import type { ClubDto, ClubLocale } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { applyClubLocale } from '@/lib/club-locale';
import { clubKeys } from './keys';

/** PUT /api/club/locale (admin): the club's region, currency and default units. */
export const setClubLocale = (locale: ClubLocale) =>
  apiFetch<ClubDto>('/club/locale', { method: 'PUT', body: locale });

export function useSetClubLocale() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setClubLocale,
    onSuccess: (club) => {
      applyClubLocale(club.locale);
      queryClient.setQueryData(clubKeys.detail(), club);
    },
  });
}
