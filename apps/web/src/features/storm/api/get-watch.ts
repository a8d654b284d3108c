import type { StormWatchDetailDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { stormKeys } from './keys';

/** GET /api/storm-watches/:watchId: the watch, the viewer's boats and the boats they are buddy for. */
export const getWatch = (watchId: number, signal?: AbortSignal) =>
  apiFetch<StormWatchDetailDto>(`/storm-watches/${watchId}`, { signal });

export const watchQuery = (watchId: number) =>
  queryOptions({
    queryKey: stormKeys.detail(watchId),
    queryFn: ({ signal }) => getWatch(watchId, signal),
  });

export const useWatch = (watchId: number) => useQuery(watchQuery(watchId));
