import { Link, useSearchParams } from 'react-router-dom';
import { formatMoney } from '@app/shared/locale';
import { Alert } from '@/components/ui/alert';
import { Page } from '@/components/ui/page';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/form-errors';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useCheckoutStatus } from '@/features/dues/api/get-checkout-status';
import { readableDate } from '@/lib/format-date';

function PaidScreen({ sessionId }: { sessionId: string }) {
  const status = useCheckoutStatus(sessionId);
  const s = status.data;
  return (
    <Page title="Payment" width="narrow">
      {status.isPending && <Spinner label="Checking your payment…" />}
      {status.isError && (
        <Alert tone="error" title="Couldn't find this payment">
          <p>{errorMessage(status.error)}</p>
        </Alert>
      )}
      {s?.status === 'pending' && (
        <>
          <Spinner label="Waiting for the payment provider to confirm…" />
          <p>{s.message}</p>
        </>
      )}
      {s?.status === 'succeeded' && (
        <Alert tone="success" title="Payment received">
          <p>{formatMoney(s.amountMinor, s.currency)} received.</p>
          {s.paidThrough && (
            <p data-testid="paid-through">
              Paid through <time dateTime={s.paidThrough}>{readableDate(s.paidThrough)}</time>
            </p>
          )}
          <p>A receipt is on its way to your e-mail.</p>
        </Alert>
      )}
      {s && s.status !== 'pending' && s.status !== 'succeeded' && (
        <Alert tone="warning" title="Not credited">
          <p>{s.message}</p>
        </Alert>
      )}
      <p>
        <Link to={paths.dues.href()}>Back to your dues</Link>
      </p>
    </Page>
  );
}

/** Where the payment provider sends the member back after paying. */
export function DuesPaidRoute() {
  const [params] = useSearchParams();
  const sessionId = params.get('session_id') ?? '';
  return (
    <RequireAuth>
      {sessionId ? (
        <PaidScreen sessionId={sessionId} />
      ) : (
        <Page title="Payment" width="narrow">
          <Alert tone="error" title="No payment to show">
            <p>This page needs a checkout reference. Go back to your dues to start again.</p>
          </Alert>
        </Page>
      )}
    </RequireAuth>
  );
}
