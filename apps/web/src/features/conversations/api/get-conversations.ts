import type { ThreadSummaryDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { conversationKeys } from './keys';

/** GET /api/threads: the member's conversations as buyer or seller. */
export const getConversations = (signal?: AbortSignal) =>
  apiFetch<ThreadSummaryDto[]>('/threads', { signal });

export const conversationsQuery = () =>
  queryOptions({
    queryKey: conversationKeys.list(),
    queryFn: ({ signal }) => getConversations(signal),
  });

/** The inbox. */
export const useConversations = () => useQuery(conversationsQuery());
