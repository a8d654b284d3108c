import { usePromptDialog } from '@/components/ui/prompt-dialog';

export interface ReasonQuestion {
  title: string;
  /** Who reads the answer, e.g. "The author reads this." */
  hint: string;
  confirmLabel: string;
  isDestructive?: boolean;
  /** The field's label; "Reason" unless given (a note sent back to the author is "Note to the author"). */
  label?: string;
}

/**
 * Asks a moderator for a reason (at least 3 characters) or an optional note for the log, in the app's own
 * dialog. Each resolves to the trimmed text, or null when cancelled. Render `dialog` once.
 */
export function useReasonDialog() {
  const { ask, dialog } = usePromptDialog();
  const askReason = (q: ReasonQuestion) =>
    ask({ ...q, label: q.label ?? 'Reason', minLength: 3, maxLength: 1000 });
  const askNote = (q: ReasonQuestion) =>
    ask({ ...q, label: 'Note for the log (optional)', minLength: 0, maxLength: 1000 });
  return { askReason, askNote, dialog };
}
