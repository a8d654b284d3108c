import type { AuditEntryDto, ModerationCountDto, ModerationQueueDto } from '@app/shared';
import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { moderationKeys } from './keys';

/** GET /api/moderation/queue: pending posts and comments, open reports. */
export const useModerationQueue = () =>
  useQuery({
    queryKey: moderationKeys.queue(),
    queryFn: ({ signal }) => apiFetch<ModerationQueueDto>('/moderation/queue', { signal }),
  });

/** GET /api/moderation/count, for the navigation badge (moderators only). */
export const useModerationCount = (enabled: boolean) =>
  useQuery({
    queryKey: moderationKeys.count(),
    queryFn: ({ signal }) => apiFetch<ModerationCountDto>('/moderation/count', { signal }),
    enabled,
    refetchInterval: 60_000,
  });

/** GET /api/moderation/log: who did what, when and why. */
export const useModerationLog = (page: number) =>
  useQuery({
    queryKey: moderationKeys.log(page),
    queryFn: ({ signal }) =>
      apiFetch<AuditEntryDto[]>('/moderation/log', { query: { page }, signal }),
  });
