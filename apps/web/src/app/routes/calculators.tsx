import { Alert } from '@/components/ui/alert';
import { Page } from '@/components/ui/page';
import { AnchorCalculator } from '@/features/calculators/components/anchor-calculator';
import { DesignLoadCalculator } from '@/features/calculators/components/design-load-calculator';
import { RatingsCalculator } from '@/features/calculators/components/ratings-calculator';
import { ScopeCalculator } from '@/features/calculators/components/scope-calculator';
import { SwingCircleCalculator } from '@/features/calculators/components/swing-circle-calculator';
import { WeakestLinkBuilder } from '@/features/calculators/components/weakest-link-builder';
import { UnitToggle } from '@/components/units/unit-toggle';
import { useCurrentUser } from '@/features/auth/api/get-session';
import { useBoats } from '@/features/boats/api/get-boats';
import { ConditionsBlock } from '@/features/calculators/components/conditions-block';
import { ConditionsProvider } from '@/features/calculators/components/conditions-provider';
import { TackleUnits } from './calculators-units';

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
            <AnchorCalculator />
            <RatingsCalculator />
            <WeakestLinkBuilder />
            <ScopeCalculator />
            <SwingCircleCalculator />
          </div>
        </ConditionsProvider>
      </Page>
    </TackleUnits>
  );
}
