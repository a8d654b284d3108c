import { Suspense } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Page } from '@/components/ui/page';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/form-errors';
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
      <section aria-labelledby="plans-heading" className="flex flex-col gap-3">
        <h2 id="plans-heading" className="text-xl">
          Membership plans
        </h2>
        {plans.isPending && <Spinner label="Loading the plans…" />}
        {plans.isError && (
          <Alert tone="error" title="Couldn't load the membership plans">
            <p>{errorMessage(plans.error)}</p>
          </Alert>
        )}
        {plans.data && <MembershipPlanList plans={plans.data} />}
      </section>
      <section aria-labelledby="calendar-heading" className="flex flex-col gap-3">
        <h2 id="calendar-heading" className="text-xl">
          Fiscal calendar
        </h2>
        {calendar.isPending && <Spinner label="Loading the calendar…" />}
        {calendar.isError && (
          <Alert tone="error" title="Couldn't load the calendar">
            <p>{errorMessage(calendar.error)}</p>
          </Alert>
        )}
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
      </section>
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
