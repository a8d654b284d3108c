import { formatMoney } from '@app/shared';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { errorMessage } from '../../../lib/form-errors';
import { countOf } from '../../../lib/plural';
import { usePreviewReminders, useSendReminders } from '../api/reminders';

/** Preview, then send, reminders to the selected members (only due and overdue ones receive one). */
export function RemindersPanel({ userIds }: { userIds: number[] }) {
  const preview = usePreviewReminders();
  const send = useSendReminders();
  return (
    <section aria-labelledby="reminders-heading" className="flex flex-col gap-3">
      <h2 id="reminders-heading" className="text-xl">
        Reminders
      </h2>
      <p className="text-sm">{countOf(userIds.length, 'member', 'members')} selected.</p>
      <div className="flex flex-wrap gap-2">
        <Button
          variant="secondary"
          disabled={userIds.length === 0}
          isPending={preview.isPending}
          onClick={() => preview.mutate({ userIds })}
        >
          Preview reminders
        </Button>
        <Button
          disabled={!preview.data || preview.data.recipients.length === 0}
          isPending={send.isPending}
          onClick={() => send.mutate({ userIds })}
        >
          {/* The count is known only once the preview has said who is due or overdue. */}
          {preview.data
            ? `Send ${countOf(preview.data.recipients.length, 'reminder', 'reminders')}`
            : 'Send reminders (preview first)'}
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
      {preview.data && (
        <div className="flex flex-col gap-2 rounded-lg border border-sand-300 bg-sand-50 p-3">
          <h3 className="font-bold">Will receive: “{preview.data.subject}”</h3>
          <ul className="text-sm">
            {preview.data.recipients.map((r) => (
              <li key={r.userId}>
                {r.displayName} · {r.status} · owes {formatMoney(r.owedMinor, r.currency)}
              </li>
            ))}
          </ul>
          {preview.data.skipped.length > 0 && (
            <p className="text-sm text-ink-700">
              {preview.data.skipped.length} skipped (current, lapsed or no plan).
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
