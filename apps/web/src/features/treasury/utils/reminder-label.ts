import { countOf } from '@/lib/plural';

/** What the send button says: the real number of members who would be reminded, in the right number. */
export function sendLabel(count: number | undefined): string {
  if (count === undefined) return 'Send reminders (counting…)';
  if (count === 0) return 'No reminders to send';
  return `Send ${countOf(count, 'reminder', 'reminders')}`;
}
