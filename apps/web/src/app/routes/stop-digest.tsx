import { Link, useSearchParams } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Page } from '@/components/ui/page';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { errorMessage } from '@/lib/form-errors';
import { useStopDigest } from '@/features/auth/api/stop-digest';

/**
 * The stop link in a digest e-mail lands here (`/notices/stop-digest?token=…`). It asks before it changes
 * anything, so a mail scanner that follows links cannot turn the digest off.
 */
export function StopDigestRoute() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const stop = useStopDigest();
  return (
    <Page title="Stop the daily digest" width="narrow">
      {stop.isSuccess ? (
        <Alert tone="success" title="The daily digest is off">
          <p>
            You will get no more digest e-mails. Your notices still show on the Notices page when
            you sign in, and you can turn the digest back on from your{' '}
            <Link to={paths.account.href()}>account page</Link>.
          </p>
        </Alert>
      ) : (
        <>
          <p>
            The daily digest e-mails you the notices you have not read yet. Stop it for this
            address?
          </p>
          {!token && (
            <Alert tone="error">
              This link has no token. Copy the whole link from the digest e-mail, or turn the digest
              off on your <Link to={paths.account.href()}>account page</Link>.
            </Alert>
          )}
          {stop.isError && (
            <Alert tone="error">
              {stop.error instanceof ApiError && stop.error.fields.token
                ? stop.error.fields.token
                : errorMessage(stop.error)}
            </Alert>
          )}
          <Button
            className="self-start"
            disabled={!token}
            isPending={stop.isPending}
            pendingLabel="Stopping…"
            onClick={() => stop.mutate(token)}
          >
            Stop the digest
          </Button>
        </>
      )}
    </Page>
  );
}
