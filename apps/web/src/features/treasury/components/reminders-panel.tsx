import { DUES_STATUS_LABELS } from '@app/shared/values';
import { formatMoney } from '@app/shared/locale';
import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { errorMessage } from '@/lib/form-errors';
import { countOf } from '@/lib/plural';
import { useReminderPreview, useSendReminders } from '../api/reminders';
import { sendLabel } from '../utils/reminder-label';

/**
 * Reminders to the selected members (only due and overdue ones who owe something receive one). Who would be
 * reminded is asked as soon as the selection is known, so the button counts them; Preview shows the message.
 */
export function RemindersPanel({ userIds }: { userIds: number[] }) {
  const preview = useReminderPreview(userIds);
  const send = useSendReminders();
  const [showPreview, setShowPreview] = useState(false);
  const count = userIds.length === 0 ? 0 : preview.data?.recipients.length;
  return (
    <section aria-labelledby="reminders-heading" className="flex flex-col gap-3">
      <h2 id="reminders-heading" className="text-xl">
        Reminders
      </h2>
      <p className="text-sm">{countOf(userIds.length, 'member', 'members')} selected.</p>
      <div className="flex flex-wrap gap-2">
        <Button
          variant="secondary"
          disabled={userIds.length === 0 || !preview.data}
          aria-expanded={showPreview}
          onClick={() => setShowPreview((v) => !v)}
        >
          {showPreview ? 'Hide the preview' : 'Preview reminders'}
        </Button>
        <Button
          disabled={!count}
          isPending={send.isPending}
          onClick={() => send.mutate({ userIds })}
        >
          {sendLabel(count)}
        </Button>
      </div>
      {(preview.isError || send.isError) && (
        <Alert tone="error" title="Reminders not sent">
          <p>{errorMessage(preview.error ?? send.error)}</p>
        </Alert>
      )}
      {send.data && (
        <Alert tone="success" title="Reminders queued">
          <p>{countOf(send.data.sent, 'reminder is', 'reminders are')} on their way.</p>
        </Alert>
      )}
      {preview.data && showPreview && (
        <div className="flex flex-col gap-2 rounded-lg border border-sand-300 bg-sand-50 p-3">
          <h3 className="font-bold">Will receive: “{preview.data.subject}”</h3>
          <ul className="text-sm">
            {preview.data.recipients.map((r) => (
              <li key={r.userId}>
                {r.displayName} · {DUES_STATUS_LABELS[r.status].toLowerCase()} · owes{' '}
                {formatMoney(r.owedMinor, r.currency)}
              </li>
            ))}
          </ul>
          {preview.data.skipped.length > 0 && (
            <p className="text-sm text-ink-700">
              {countOf(preview.data.skipped.length, 'member', 'members')} skipped (current, lapsed,
              no plan or nothing owed).
            </p>
          )}
          {preview.data.sampleText && (
            <pre className="whitespace-pre-wrap rounded-md bg-white p-2 text-xs">
              {preview.data.sampleText}
            </pre>
          )}
        </div>
      )}
    </section>
  );
}
