import type { ThreadDto } from '@app/shared';
import { useEffect } from 'react';
import { queryOptions, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
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

/** One conversation with its messages, refreshed every 15 s while open; each read refreshes the unread counts. */
export function useThread(id: number) {
  const queryClient = useQueryClient();
  const thread = useQuery(threadQuery(id));
  const readAt = thread.dataUpdatedAt;
  useEffect(() => {
    if (!readAt) return;
    void queryClient.invalidateQueries({ queryKey: threadKeys.unread() });
    void queryClient.invalidateQueries({ queryKey: threadKeys.list() });
  }, [readAt, queryClient]);
  return thread;
}
