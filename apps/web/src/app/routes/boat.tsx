import { Suspense, useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Page } from '@/components/ui/page';
import { UnavailablePage } from '@/components/ui/unavailable-page';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/form-errors';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useDeleteBoat } from '@/features/boats/api/delete-boat';
import { useBoat } from '@/features/boats/api/get-boat';
import { useUpdateBoat } from '@/features/boats/api/update-boat';
import {
  BoatRecommendation,
  type PlanDraft,
} from '@/features/boats/components/boat-recommendation';
import { useClub } from '@/features/club/api/get-club';
import { useCreateTacklePlan } from '@/features/tackle-plans/api/create-tackle-plan';
import { useTacklePlans } from '@/features/tackle-plans/api/get-tackle-plans';
import { Quantity } from '@/components/units/quantity';
import { UnitToggle } from '@/components/units/unit-toggle';
import { TackleUnits } from './calculators-units';
import { IdParams } from '../id-params';
import { lazyNamed } from '@/lib/lazy-named';

// The profile form sits in a closed details box: it loads after the recommendation.
const BoatForm = lazyNamed(() => import('@/features/boats/components/boat-form'), 'BoatForm');

function PlanList({ boatId }: { boatId: number }) {
  const plans = useTacklePlans(boatId);
  if (plans.isPending) return <Spinner label="Loading plans…" />;
  if (plans.isError) return <Alert tone="error">{errorMessage(plans.error)}</Alert>;
  if (plans.data.length === 0) return <p className="text-sm">No saved plans yet.</p>;
  return (
    <ul className="flex flex-col gap-1">
      {plans.data.map((plan) => (
        <li key={plan.id}>
          <Link to={paths.tacklePlan.href(plan.id)}>{plan.name}</Link>{' '}
          <span className="text-sm text-ink-600">
            (<Quantity value={plan.windKn} kind="speed" />)
          </span>
        </li>
      ))}
    </ul>
  );
}

function BoatScreen({ boatId }: { boatId: number }) {
  const boat = useBoat(boatId);
  const club = useClub();
  const update = useUpdateBoat(boatId);
  const remove = useDeleteBoat();
  const createTacklePlan = useCreateTacklePlan();
  const navigate = useNavigate();
  const [savingWind, setSavingWind] = useState<number | undefined>(undefined);
  const [confirmDelete, setConfirmDelete] = useState(false);

  if (boat.isPending) return <Spinner label="Loading the boat…" />;
  if (boat.isError) {
    return (
      <UnavailablePage
        title="Boat not available"
        reason="Couldn't load this boat"
        back={{ to: paths.boats.href(), label: 'Back to your boats' }}
      >
        <p>{errorMessage(boat.error)}</p>
      </UnavailablePage>
    );
  }
  const handleSavePlan = (draft: PlanDraft) => {
    setSavingWind(draft.windKn);
    createTacklePlan
      .mutateAsync({ boatId, ...draft })
      .then((saved) => navigate(paths.tacklePlan.href(saved.plan.id)))
      .catch(() => undefined)
      .finally(() => setSavingWind(undefined));
  };
  return (
    <Page title={boat.data.name} intro={<p>Suggested ground tackle for 30 kn and for 60 kn.</p>}>
      <UnitToggle />
      {createTacklePlan.isError && (
        <Alert tone="error" title="Couldn't save the plan">
          <p>{errorMessage(createTacklePlan.error)}</p>
        </Alert>
      )}
      <section aria-labelledby="rec-heading" className="flex flex-col gap-3">
        <h2 id="rec-heading" className="text-xl">
          Recommendation
        </h2>
        <BoatRecommendation
          boat={boat.data}
          onSavePlan={handleSavePlan}
          savingWindKn={savingWind}
        />
      </section>
      <section aria-labelledby="plans-heading" className="flex flex-col gap-2">
        <h2 id="plans-heading" className="text-xl">
          Saved plans
        </h2>
        <PlanList boatId={boatId} />
      </section>
      <details className="rounded-lg border border-sand-300 bg-sand-50 p-4">
        <summary className="cursor-pointer font-bold">Edit the boat profile</summary>
        <div className="mt-3 max-w-2xl">
          <Suspense fallback={<Spinner label="Loading the form…" />}>
            <BoatForm
              key={boat.data.updatedAt}
              boat={boat.data}
              harbors={club.data?.harbors ?? []}
              submitLabel="Save profile"
              isPending={update.isPending}
              onSubmit={(input) => update.mutateAsync(input)}
            />
          </Suspense>
        </div>
        <Button variant="danger" className="mt-4" onClick={() => setConfirmDelete(true)}>
          Delete this boat
        </Button>
      </details>
      <ConfirmDialog
        isOpen={confirmDelete}
        title={`Delete ${boat.data.name}?`}
        confirmLabel="Delete boat"
        isDestructive
        isPending={remove.isPending}
        onCancel={() => setConfirmDelete(false)}
        onConfirm={() =>
          remove.mutate(boatId, { onSuccess: () => void navigate(paths.boats.href()) })
        }
      >
        <p>Its saved plans go with it. This cannot be undone.</p>
      </ConfirmDialog>
    </Page>
  );
}

/** One boat: its 30 kn and 60 kn recommendation, saved plans and profile. */
export function BoatRoute() {
  return (
    <RequireAuth>
      <TackleUnits>
        <IdParams
          names={['boatId']}
          unavailable={{
            title: 'Boat not available',
            reason: 'No such boat',
            back: { to: paths.boats.href(), label: 'Back to your boats' },
          }}
        >
          {({ boatId }) => <BoatScreen boatId={boatId} />}
        </IdParams>
      </TackleUnits>
    </RequireAuth>
  );
}
