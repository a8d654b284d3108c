import { Suspense } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Page } from '@/components/ui/page';
import { QueryStatus } from '@/components/ui/query-status';
import { Spinner } from '@/components/ui/spinner';
import { TitledSection } from '@/components/ui/titled-section';
import { paths } from '@/config/paths';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useDuesCalendar, useSaveCalendar } from '@/features/treasury/api/dues-calendar';
import { useMembershipPlans } from '@/features/treasury/api/get-membership-plans';
import { MembershipPlanList } from '@/features/treasury/components/membership-plan-list';
import { lazyNamed } from '@/lib/lazy-named';

// The calendar form loads after the plans above it.
const CalendarForm = lazyNamed(
  () => import('@/features/treasury/components/calendar-form'),
  'CalendarForm',
);

function PlansScreen() {
  const plans = useMembershipPlans();
  const calendar = useDuesCalendar();
  const save = useSaveCalendar();
  return (
    <Page
      title="Membership plans and fiscal calendar"
      intro={
        <p>
          The dues plans members choose from, and the club’s fiscal year they are paid for. Every
          change is recorded in the audit log.
        </p>
      }
    >
      <p>
        <Link to={paths.treasury.href()}>Back to the treasury</Link>
      </p>
      <TitledSection headingId="plans-heading" title="Membership plans">
        <QueryStatus
          query={plans}
          loadingLabel="Loading the plans…"
          errorTitle="Couldn't load the membership plans"
        />
        {plans.data && <MembershipPlanList plans={plans.data} />}
      </TitledSection>
      <TitledSection headingId="calendar-heading" title="Fiscal calendar">
        <QueryStatus
          query={calendar}
          loadingLabel="Loading the calendar…"
          errorTitle="Couldn't load the calendar"
        />
        {save.isSuccess && (
          <Alert tone="success" title="Calendar saved">
            <p>New quotes and the roster follow the new fiscal year from now on.</p>
          </Alert>
        )}
        {calendar.data && (
          <Suspense fallback={<Spinner label="Loading the form…" />}>
            <CalendarForm
              // A fresh form after each save, so the saved values become the new baseline.
              key={JSON.stringify(calendar.data.calendar)}
              saved={calendar.data}
              isPending={save.isPending}
              onSubmit={(input) => save.mutateAsync(input)}
            />
          </Suspense>
        )}
      </TitledSection>
    </Page>
  );
}

/** The treasurer's plans and fiscal-calendar settings. */
export function MembershipPlansRoute() {
  return (
    <RequireAuth roles={['treasurer']}>
      <PlansScreen />
    </RequireAuth>
  );
}
