import type { ReminderInput, ReminderPreviewDto } from '@app/shared';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { treasuryKeys } from './keys';

/** POST /api/treasury/reminders/preview. */
export const previewReminders = (input: ReminderInput) =>
  apiFetch<ReminderPreviewDto>('/treasury/reminders/preview', { method: 'POST', body: input });

/** POST /api/treasury/reminders. */
export const sendReminders = (input: ReminderInput) =>
  apiFetch<{ sent: number }>('/treasury/reminders', { method: 'POST', body: input });

/** Who of `userIds` would get a reminder and the message, asked as soon as the selection is known. */
export const useReminderPreview = (userIds: number[]) =>
  useQuery({
    queryKey: treasuryKeys.reminderPreview(userIds),
    queryFn: () => previewReminders({ userIds }),
    enabled: userIds.length > 0,
  });
/** Queues the reminders. */
export const useSendReminders = () => {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: sendReminders,
    onSuccess: () => qc.invalidateQueries({ queryKey: treasuryKeys.all }),
  });
};
