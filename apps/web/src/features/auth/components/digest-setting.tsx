import type { UserDto } from '@app/shared';
import { useId, useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { errorMessage } from '@/lib/form-errors';
import { useUpdateAccount } from '../api/update-account';

/**
 * The opt-in for the daily e-mail of unread notices. It saves as soon as it is ticked and says what changed;
 * ticking it again undoes the change.
 */
export function DigestSetting({ user }: { user: UserDto }) {
  const update = useUpdateAccount();
  const hintId = useId();
  const statusId = useId();
  // The wanted state is React state set in the click itself: the mutation's own pending state reaches the
  // component a moment later, and a controlled box would spring back unticked in between.
  const [wanted, setWanted] = useState<boolean | null>(null);
  const isOn = wanted ?? user.notificationDigest;
  return (
    <div className="flex flex-col gap-3">
      <label className="flex min-h-11 items-start gap-3 text-base">
        <input
          type="checkbox"
          className="mt-1 size-5 accent-signal-600"
          checked={isOn}
          disabled={update.isPending}
          aria-describedby={`${hintId} ${statusId}`}
          onChange={(event) => {
            setWanted(event.target.checked);
            update.mutate(
              { notificationDigest: event.target.checked },
              { onSettled: () => setWanted(null) },
            );
          }}
        />
        <span>
          <span className="font-bold">E-mail me a daily digest of unread notices</span>
          <span id={hintId} className="block text-sm text-ink-700">
            At most one e-mail a day to {user.email}, only when a reply, an answer that worked or a
            moderator’s decision is still unread. Every digest has a link to stop it.
          </span>
        </span>
      </label>
      <div id={statusId} aria-live="polite">
        {update.isError && <Alert tone="error">{errorMessage(update.error)}</Alert>}
        {update.isSuccess && (
          <Alert tone="success">
            {user.notificationDigest
              ? 'The daily digest is on. Untick the box to stop it.'
              : 'The daily digest is off. You still see every notice on the Notices page.'}
          </Alert>
        )}
      </div>
    </div>
  );
}
