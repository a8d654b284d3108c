import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';
import { threadKeys } from './keys';

/** GET /api/threads/unread. */
export const getUnread = (signal?: AbortSignal) =>
  apiFetch<{ unread: number }>('/threads/unread', { signal });

export const unreadQuery = () =>
  queryOptions({
    queryKey: threadKeys.unread(),
    queryFn: ({ signal }) => getUnread(signal),
    refetchInterval: 60_000,
  });

/** Unread messages across the member's conversations. */
export const useUnread = (enabled: boolean) => useQuery({ ...unreadQuery(), enabled });
