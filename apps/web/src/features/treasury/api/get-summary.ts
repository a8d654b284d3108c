import type { SummaryDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { treasuryKeys } from './keys';

/** GET /api/treasury/summary (the current fiscal year). */
export const getSummary = (signal?: AbortSignal) =>
  apiFetch<SummaryDto>('/treasury/summary', { signal });

export const summaryQuery = () =>
  queryOptions({ queryKey: treasuryKeys.summary(), queryFn: ({ signal }) => getSummary(signal) });

/** Collected vs expected for the year. */
export const useSummary = () => useQuery(summaryQuery());
