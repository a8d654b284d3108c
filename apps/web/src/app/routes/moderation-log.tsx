import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Page } from '@/components/ui/page';
import { Spinner } from '@/components/ui/spinner';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useModerationLog } from '@/features/moderation/api/get-queue';
import { ModerationLog } from '@/features/moderation/components/moderation-log';
import { errorMessage } from '@/lib/form-errors';

function LogScreen() {
  const [page, setPage] = useState(1);
  const log = useModerationLog(page);
  if (log.isPending) return <Spinner label="Loading the log…" />;
  if (log.isError)
    return (
      <Alert tone="error">
        <p>{errorMessage(log.error)}</p>
      </Alert>
    );
  return (
    <div className="flex flex-col gap-3">
      <ModerationLog entries={log.data} />
      <div className="flex gap-2">
        <Button
          variant="secondary"
          size="sm"
          disabled={page === 1}
          onClick={() => setPage((p) => p - 1)}
        >
          Newer
        </Button>
        <Button
          variant="secondary"
          size="sm"
          disabled={log.data.length < 50}
          onClick={() => setPage((p) => p + 1)}
        >
          Older
        </Button>
      </div>
    </div>
  );
}

/** The moderation log page: who did what, when and why. */
export function ModerationLogRoute() {
  return (
    <RequireAuth roles={['moderator']}>
      <Page title="Moderation log">
        <LogScreen />
      </Page>
    </RequireAuth>
  );
}
