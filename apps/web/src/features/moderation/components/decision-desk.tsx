import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { errorMessage } from '@/lib/form-errors';
import type { DecisionDesk } from './use-decision-desk';

/** The desk's error (a refused decision or undo) and a polite status line for screen readers. */
export function DeskAlerts({ desk }: { desk: DecisionDesk }) {
  return (
    <>
      {desk.error && (
        <Alert tone="error">
          <p>{errorMessage(desk.error)}</p>
        </Alert>
      )}
      <p role="status" className="sr-only">
        {desk.said}
      </p>
    </>
  );
}

/**
 * What a decided card shows instead of its buttons: the outcome where the first button was (plain text, so a
 * second click lands on nothing) and Undo further along while the window lasts.
 */
export function DecidedLine({
  desk,
  itemKey,
  title,
}: {
  desk: DecisionDesk;
  itemKey: string;
  title: string;
}) {
  const d = desk.decidedOf(itemKey);
  if (!d) return null;
  return (
    <div className="flex min-h-9 flex-wrap items-center gap-x-4 gap-y-2">
      <p className="font-bold text-kelp-700">
        <span aria-hidden="true">✓</span> <span>{d.done}</span>
      </p>
      {desk.canUndo(d) ? (
        <Button
          size="sm"
          variant="ghost"
          className="ml-auto underline"
          aria-label={`Undo: ${d.done.toLowerCase()} “${title}”`}
          isPending={desk.isUndoing}
          onClick={() => void desk.undo(itemKey)}
        >
          Undo
        </Button>
      ) : (
        d.decisionId !== null && (
          <p className="ml-auto text-sm text-ink-600">Too late to undo here</p>
        )
      )}
    </div>
  );
}
