import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { conversationKeys } from './keys';

/** GET /api/threads/unread. */
export const getUnread = (signal?: AbortSignal) =>
  apiFetch<{ unread: number }>('/threads/unread', { signal });

export const unreadQuery = () =>
  queryOptions({
    queryKey: conversationKeys.unread(),
    queryFn: ({ signal }) => getUnread(signal),
    // The nav badge: every 30 s, and again when the member comes back to the tab.
    refetchInterval: 30_000,
    staleTime: 10_000,
    refetchOnWindowFocus: true,
  });

/** Unread messages across the member's conversations. */
export const useUnread = (enabled: boolean) => useQuery({ ...unreadQuery(), enabled });
