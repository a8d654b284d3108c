import type { ReminderInput, ReminderPreviewDto } from '@app/shared';
import { useMutation } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';

/** POST /api/treasury/reminders/preview. */
export const previewReminders = (input: ReminderInput) =>
  apiFetch<ReminderPreviewDto>('/treasury/reminders/preview', { method: 'POST', body: input });

/** POST /api/treasury/reminders. */
export const sendReminders = (input: ReminderInput) =>
  apiFetch<{ sent: number }>('/treasury/reminders', { method: 'POST', body: input });

/** Shows who would get a reminder and the message. */
export const usePreviewReminders = () => useMutation({ mutationFn: previewReminders });
/** Queues the reminders. */
export const useSendReminders = () => useMutation({ mutationFn: sendReminders });
