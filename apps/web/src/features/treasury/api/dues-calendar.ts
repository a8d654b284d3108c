import type { DuesCalendarDto, DuesCalendarInput } from '@app/shared';
import {
  keepPreviousData,
  queryOptions,
  useMutation,
  useQuery,
  useQueryClient,
} from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { treasuryKeys } from './keys';

/** GET /api/treasury/calendar: the saved calendar and what it gives today. */
export const calendarQuery = () =>
  queryOptions({
    queryKey: treasuryKeys.calendar(),
    queryFn: ({ signal }) => apiFetch<DuesCalendarDto>('/treasury/calendar', { signal }),
  });
export const useDuesCalendar = () => useQuery(calendarQuery());

/** GET /api/treasury/calendar/preview: a proposed fiscal-year start, before it is saved. */
export function useCalendarPreview(month: number, day: number, enabled: boolean) {
  return useQuery({
    queryKey: treasuryKeys.calendarPreview(month, day),
    queryFn: ({ signal }) =>
      apiFetch<DuesCalendarDto>('/treasury/calendar/preview', {
        signal,
        query: { fiscalYearStartMonth: month, fiscalYearStartDay: day },
      }),
    enabled,
    placeholderData: keepPreviousData,
  });
}

/** PUT /api/treasury/calendar. */
export function useSaveCalendar() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: DuesCalendarInput) =>
      apiFetch<DuesCalendarDto>('/treasury/calendar', { method: 'PUT', body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: treasuryKeys.all }),
  });
}
