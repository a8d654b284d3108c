import type { NotificationDto } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { noticeKeys } from './keys';

/** POST /api/notifications/read: every notice of the member. */
export const markAllNoticesRead = () =>
  apiFetch<undefined>('/notifications/read', { method: 'POST' });

/** POST /api/notifications/:id/read. */
export const markNoticeRead = (id: number) =>
  apiFetch<NotificationDto>(`/notifications/${id}/read`, { method: 'POST' });

/** Marks all notices read; the list and the badge refresh. */
export function useMarkAllNoticesRead() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: markAllNoticesRead,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: noticeKeys.all }),
  });
}

/** Marks one notice read (when the member follows its link). */
export function useMarkNoticeRead() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: markNoticeRead,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: noticeKeys.all }),
  });
}
