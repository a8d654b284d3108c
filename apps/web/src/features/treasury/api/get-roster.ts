import type { RosterRowDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { treasuryKeys } from './keys';

/** GET /api/treasury/roster. */
export const getRoster = (signal?: AbortSignal) =>
  apiFetch<RosterRowDto[]>('/treasury/roster', { signal });

export const rosterQuery = () =>
  queryOptions({ queryKey: treasuryKeys.roster(), queryFn: ({ signal }) => getRoster(signal) });

/** Every member with dues status. */
export const useRoster = () => useQuery(rosterQuery());
