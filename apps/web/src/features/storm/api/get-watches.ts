import type { StormWatchDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { stormKeys } from './keys';

/** GET /api/storm-watches: open watches first, then closed ones. */
export const getWatches = (signal?: AbortSignal) =>
  apiFetch<StormWatchDto[]>('/storm-watches', { signal });

export const watchesQuery = () =>
  queryOptions({ queryKey: stormKeys.lists(), queryFn: ({ signal }) => getWatches(signal) });

export const useWatches = () => useQuery(watchesQuery());
