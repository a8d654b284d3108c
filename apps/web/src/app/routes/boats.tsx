import { Suspense } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { EmptyState } from '@/components/ui/empty-state';
import { Page } from '@/components/ui/page';
import { QueryStatus } from '@/components/ui/query-status';
import { Spinner } from '@/components/ui/spinner';
import { TitledSection } from '@/components/ui/titled-section';
import { paths } from '@/config/paths';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useCreateBoat } from '@/features/boats/api/create-boat';
import { useBoats } from '@/features/boats/api/get-boats';
import { useClub } from '@/features/club/api/get-club';
import { Quantity } from '@/components/units/quantity';
import { UnitToggle } from '@/components/units/unit-toggle';
import { TackleUnits } from './calculators-units';
import { lazyNamed } from '@/lib/lazy-named';

// The form (and the form library) arrives just after the list of boats above it.
const BoatForm = lazyNamed(() => import('@/features/boats/components/boat-form'), 'BoatForm');

function BoatsScreen() {
  const boats = useBoats();
  const club = useClub();
  const create = useCreateBoat();
  const navigate = useNavigate();
  return (
    <Page
      title="My boats"
      intro={<p>Keep a profile of each boat; Rodewise sizes its ground tackle from it.</p>}
    >
      <UnitToggle />
      <TitledSection headingId="boat-list-heading" title="Your boats">
        <QueryStatus
          query={boats}
          loadingLabel="Loading your boats…"
          errorTitle="Couldn't load your boats"
        />
        {boats.data?.length === 0 && (
          <EmptyState title="No boats yet">
            Add your boat below to see its ground tackle.
          </EmptyState>
        )}
        {boats.data && boats.data.length > 0 && (
          <ul className="grid gap-3 sm:grid-cols-2">
            {boats.data.map((boat) => (
              <li
                key={boat.id}
                className="rounded-lg border border-sand-300 bg-sand-50 p-4 shadow-card"
              >
                <Link to={paths.boat.href(boat.id)} className="text-lg font-bold">
                  {boat.name}
                </Link>
                <p className="text-sm text-ink-700">
                  {boat.hull}, LOA <Quantity value={boat.loaM} kind="length" />
                </p>
              </li>
            ))}
          </ul>
        )}
      </TitledSection>
      <TitledSection
        headingId="new-boat-heading"
        title="Add a boat"
        className="flex max-w-2xl flex-col gap-3"
      >
        <Suspense fallback={<Spinner label="Loading the form…" />}>
          <BoatForm
            harbors={club.data?.harbors ?? []}
            submitLabel="Add boat"
            isPending={create.isPending}
            onSubmit={async (input) => {
              const boat = await create.mutateAsync(input);
              await navigate(paths.boat.href(boat.id));
            }}
          />
        </Suspense>
      </TitledSection>
    </Page>
  );
}

/** A member's boats and the form to add one. */
export function BoatsRoute() {
  return (
    <RequireAuth>
      <TackleUnits>
        <BoatsScreen />
      </TackleUnits>
    </RequireAuth>
  );
}
