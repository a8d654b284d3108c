import type { ThreadDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';
import { threadKeys } from './keys';

/** GET /api/threads/:id (marks it read). */
export const getThread = (id: number, signal?: AbortSignal) =>
  apiFetch<ThreadDto>(`/threads/${id}`, { signal });

export const threadQuery = (id: number) =>
  queryOptions({
    queryKey: threadKeys.detail(id),
    queryFn: ({ signal }) => getThread(id, signal),
    refetchInterval: 15_000,
  });

/** One conversation with its messages, refreshed every 15 s while open. */
export const useThread = (id: number) => useQuery(threadQuery(id));
