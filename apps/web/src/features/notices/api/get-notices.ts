import type { NotificationDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { noticeKeys } from './keys';

/** GET /api/notifications: the member's latest 30 notices, newest first. */
export const getNotices = (signal?: AbortSignal) =>
  apiFetch<NotificationDto[]>('/notifications', { signal });

/** GET /api/notifications/unread. */
export const getUnreadNotices = (signal?: AbortSignal) =>
  apiFetch<{ unread: number }>('/notifications/unread', { signal });

export const noticesQuery = () =>
  queryOptions({ queryKey: noticeKeys.list(), queryFn: ({ signal }) => getNotices(signal) });

export const unreadNoticesQuery = () =>
  queryOptions({
    queryKey: noticeKeys.unread(),
    queryFn: ({ signal }) => getUnreadNotices(signal),
    // The nav badge: every 60 s, and again when the member comes back to the tab.
    refetchInterval: 60_000,
    staleTime: 15_000,
    refetchOnWindowFocus: true,
  });

/** The member's latest notices. */
export const useNotices = () => useQuery(noticesQuery());

/** How many notices are unread (for the navigation badge). */
export const useUnreadNotices = (enabled: boolean) =>
  useQuery({ ...unreadNoticesQuery(), enabled });
