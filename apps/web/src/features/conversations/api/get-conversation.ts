import type { ThreadDto } from '@app/shared';
import { useEffect } from 'react';
import { queryOptions, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { conversationKeys } from './keys';

/** GET /api/threads/:id (marks it read). */
export const getConversation = (id: number, signal?: AbortSignal) =>
  apiFetch<ThreadDto>(`/threads/${id}`, { signal });

export const conversationQuery = (id: number) =>
  queryOptions({
    queryKey: conversationKeys.detail(id),
    queryFn: ({ signal }) => getConversation(id, signal),
    refetchInterval: 15_000,
  });

/** One conversation with its messages, refreshed every 15 s while open; each read refreshes the unread counts. */
export function useConversation(id: number) {
  const queryClient = useQueryClient();
  const thread = useQuery(conversationQuery(id));
  const readAt = thread.dataUpdatedAt;
  useEffect(() => {
    if (!readAt) return;
    void queryClient.invalidateQueries({ queryKey: conversationKeys.unread() });
    void queryClient.invalidateQueries({ queryKey: conversationKeys.list() });
  }, [readAt, queryClient]);
  return thread;
}
