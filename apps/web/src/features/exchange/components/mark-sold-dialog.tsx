import type { ThreadSummaryDto } from '@app/shared';
import { useState } from 'react';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { countOf } from '@/lib/plural';

/** The "someone else" choice: sold outside the listing's conversations (another buyer, or outside the club). */
export const SOLD_ELSEWHERE = 'elsewhere';

export interface MarkSoldDialogProps {
  isOpen: boolean;
  title: string;
  /** The listing's conversations: the members who wrote about it. */
  threads: readonly ThreadSummaryDto[];
  isPending: boolean;
  /** Why the last attempt failed (a 409 when the listing changed meanwhile). */
  error?: string | null;
  onConfirm: (threadId: number | undefined) => void;
  onCancel: () => void;
}

/**
 * Asks before a listing is marked sold, and to whom: one of the members who wrote about it (they get a notice and
 * an e-mail) or someone else. Everyone else who asked is told it is sold.
 */
export function MarkSoldDialog({
  isOpen,
  title,
  threads,
  isPending,
  error = null,
  onConfirm,
  onCancel,
}: MarkSoldDialogProps) {
  const [choice, setChoice] = useState(threads.length === 0 ? SOLD_ELSEWHERE : '');
  const chosen = threads.find((t) => String(t.id) === choice);
  const others = threads.length - (chosen ? 1 : 0);
  return (
    <ConfirmDialog
      isOpen={isOpen}
      title={`Close “${title}” as sold?`}
      confirmLabel={chosen ? `Went to ${chosen.otherParty.displayName}` : 'Close as sold'}
      isPending={isPending}
      confirmDisabled={choice === ''}
      onConfirm={() => onConfirm(chosen ? chosen.id : undefined)}
      onCancel={onCancel}
    >
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 font-bold">Who took the gear?</legend>
        {threads.map((t) => (
          <label key={t.id} className="flex min-h-11 items-center gap-2">
            <input
              type="radio"
              name="sold-to"
              value={String(t.id)}
              checked={choice === String(t.id)}
              onChange={() => setChoice(String(t.id))}
              className="size-5"
            />
            {t.otherParty.displayName}
          </label>
        ))}
        <label className="flex min-h-11 items-center gap-2">
          <input
            type="radio"
            name="sold-to"
            value={SOLD_ELSEWHERE}
            checked={choice === SOLD_ELSEWHERE}
            onChange={() => setChoice(SOLD_ELSEWHERE)}
            className="size-5"
          />
          Someone else, or outside the club
        </label>
      </fieldset>
      <p className="mt-3">
        {chosen
          ? `${chosen.otherParty.displayName} gets a notice and an e-mail, and your conversation stays open for the hand-over.`
          : 'No member is recorded as the buyer.'}
        {others > 0 &&
          ` ${others === 1 ? 'The other member who asked is' : `The ${countOf(others, 'other member', 'other members')} who asked are`} told it is sold.`}{' '}
        The listing leaves the search; you can relist it if the sale falls through.
      </p>
      {error && (
        <p role="alert" className="mt-3 font-bold text-flare-700">
          {error}
        </p>
      )}
    </ConfirmDialog>
  );
}
