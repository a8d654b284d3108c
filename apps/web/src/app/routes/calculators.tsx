import { Suspense } from 'react';
import { Alert } from '@/components/ui/alert';
import { Spinner } from '@/components/ui/spinner';
import { Page } from '@/components/ui/page';
import { DesignLoadCalculator } from '@/features/calculators/components/design-load-calculator';
import { UnitToggle } from '@/components/units/unit-toggle';
import { useCurrentUser } from '@/features/auth/api/get-session';
import { useBoats } from '@/features/boats/api/get-boats';
import { ConditionsBlock } from '@/features/calculators/components/conditions-block';
import { ConditionsProvider } from '@/features/calculators/components/conditions-provider';
import { lazyNamed } from '@/lib/lazy-named';
import { TackleUnits } from './calculators-units';

// The boat block and the design load come with the page; the calculators below them follow at once, in
// chunks of their own, so the first screenful on a phone does not wait for all six.
const AnchorCalculator = lazyNamed(
  () => import('@/features/calculators/components/anchor-calculator'),
  'AnchorCalculator',
);
const RatingsCalculator = lazyNamed(
  () => import('@/features/calculators/components/ratings-calculator'),
  'RatingsCalculator',
);
const WeakestLinkBuilder = lazyNamed(
  () => import('@/features/calculators/components/weakest-link-builder'),
  'WeakestLinkBuilder',
);
const ScopeCalculator = lazyNamed(
  () => import('@/features/calculators/components/scope-calculator'),
  'ScopeCalculator',
);
const SwingCircleCalculator = lazyNamed(
  () => import('@/features/calculators/components/swing-circle-calculator'),
  'SwingCircleCalculator',
);

/** The signed-in member's boats for the conditions block (none for a visitor). */
function MemberConditionsBlock() {
  const { user } = useCurrentUser();
  return user ? <WithBoats /> : <ConditionsBlock />;
}

function WithBoats() {
  const boats = useBoats();
  return <ConditionsBlock boats={boats.data ?? []} />;
}

/**
 * The ground-tackle calculators, open to everyone; results update as you type. One boat and conditions block at
 * the top feeds every calculator; each can be given its own figures.
 */
export function CalculatorsRoute() {
  return (
    <TackleUnits>
      <Page
        title="Ground-tackle calculators"
        intro={
          <p>
            Size each part of your anchoring gear from the load your boat puts on it. Type lengths,
            masses and loads in either system (32 ft, 9.75 m, 5/16 in, 900 lbf); hover a result to
            see it in the other.
          </p>
        }
      >
        <UnitToggle />
        <Alert tone="warning" title="Estimates, not certified ratings">
          <p>
            These figures come from published tables and common practice and help you ask the right
            questions. Ratings are for new, undamaged gear; follow the maker&apos;s ratings and
            local regulations; in doubt ask a qualified rigger or surveyor.
          </p>
        </Alert>
        <ConditionsProvider>
          <div className="grid gap-6">
            <MemberConditionsBlock />
            <DesignLoadCalculator />
            <Suspense fallback={<Spinner label="Loading the calculators…" />}>
              <AnchorCalculator />
              <RatingsCalculator />
              <WeakestLinkBuilder />
              <ScopeCalculator />
              <SwingCircleCalculator />
            </Suspense>
          </div>
        </ConditionsProvider>
      </Page>
    </TackleUnits>
  );
}
