import { Suspense } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Page } from '@/components/ui/page';
import { QueryStatus } from '@/components/ui/query-status';
import { Spinner } from '@/components/ui/spinner';
import { TitledSection } from '@/components/ui/titled-section';
import { paths } from '@/config/paths';
import { apiUrl } from '@/lib/api-client';
import { lazyNamed } from '@/lib/lazy-named';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { usePayments } from '@/features/treasury/api/get-payments';
import { useMembershipPlans } from '@/features/treasury/api/get-membership-plans';
import { useRoster } from '@/features/treasury/api/get-roster';
import { useSummary } from '@/features/treasury/api/get-summary';
import { useRecordPayment } from '@/features/treasury/api/record-payment';
import { PaymentsTable } from '@/features/treasury/components/payments-table';
import { SummaryChart } from '@/features/treasury/components/summary-chart';
import { SummaryTiles } from '@/features/treasury/components/summary-tiles';

// The form (and the form library) arrives just after the summary it sits below.
const OfflinePaymentForm = lazyNamed(
  () => import('@/features/treasury/components/offline-payment-form'),
  'OfflinePaymentForm',
);

function TreasuryScreen() {
  const summary = useSummary();
  const payments = usePayments();
  const roster = useRoster();
  const plans = useMembershipPlans();
  const record = useRecordPayment();
  const s = summary.data;
  const held = payments.data?.filter((p) => p.status === 'held') ?? [];
  return (
    <Page
      title="Treasury"
      intro={
        <p>
          The club’s dues ledger: what came in, what is still owed, and payments waiting for you.
          Nothing here is ever deleted; corrections are new entries.
        </p>
      }
    >
      <nav aria-label="Treasury" className="flex flex-wrap gap-4">
        <Link to={paths.treasuryRoster.href()} className="font-bold">
          Member roster and reminders
        </Link>
        <Link to={paths.membershipPlans.href()} className="font-bold">
          Membership plans and fiscal calendar
        </Link>
        <a href={apiUrl('/treasury/ledger.csv')} download className="font-bold">
          Download the ledger (CSV)
        </a>
      </nav>
      <QueryStatus
        query={summary}
        loadingLabel="Loading the summary…"
        errorTitle="Couldn't load the summary"
      />
      {s && (
        <TitledSection headingId="summary-heading" title={`Fiscal year ${s.fiscalYear.label}`}>
          <SummaryTiles summary={s} />
          <p className="text-sm">
            Members: {s.counts.current} current, {s.counts.due} due, {s.counts.overdue} overdue,{' '}
            {s.counts.lapsed} lapsed.
          </p>
          <SummaryChart summary={s} />
        </TitledSection>
      )}
      {held.length > 0 && (
        <TitledSection
          headingId="held-heading"
          title="Held for the treasurer"
          className="flex flex-col gap-2"
        >
          <p className="text-sm">
            These payments arrived but did not match the plan; they are not credited until you
            decide.
          </p>
          <PaymentsTable payments={held} caption="Held payments" />
        </TitledSection>
      )}
      <TitledSection
        headingId="offline-heading"
        title="Record a cheque, cash or transfer"
        className="flex flex-col gap-2"
      >
        {record.isSuccess && (
          <Alert tone="success" title="Payment recorded">
            <p>The member is credited and a receipt is on its way.</p>
          </Alert>
        )}
        {roster.data && plans.data && (
          <Suspense fallback={<Spinner label="Loading the form…" />}>
            <OfflinePaymentForm
              members={roster.data}
              plans={plans.data}
              isPending={record.isPending}
              onSubmit={(input) => record.mutateAsync(input)}
            />
          </Suspense>
        )}
      </TitledSection>
      <TitledSection headingId="ledger-heading" title="Ledger" className="flex flex-col gap-2">
        {payments.isPending && <Spinner label="Loading the ledger…" />}
        {payments.data && (
          <PaymentsTable payments={payments.data} caption="Recent entries, newest first" />
        )}
      </TitledSection>
    </Page>
  );
}

/** The treasurer's desk: summary with chart, held payments, offline payments, ledger. */
export function TreasuryRoute() {
  return (
    <RequireAuth roles={['treasurer']}>
      <TreasuryScreen />
    </RequireAuth>
  );
}
