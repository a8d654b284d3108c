import { Suspense } from 'react';
import { STORM_LOCATION_LABELS } from '@app/shared/values';
import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Page } from '@/components/ui/page';
import { Spinner } from '@/components/ui/spinner';
import { UnavailablePage } from '@/components/ui/unavailable-page';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/form-errors';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useTacklePlans } from '@/features/tackle-plans/api/get-tackle-plans';
import { useReadiness, useSaveReadiness } from '@/features/storm/api/readiness';
import { CheckPanel } from '@/features/storm/components/check-panel';
import { StatusBadge } from '@/features/storm/components/status-badge';
import { StormCautions } from '@/features/storm/components/storm-cautions';
import { TackleUnits } from './calculators-units';
import { IdParams } from '../id-params';
import { lazyNamed } from '@/lib/lazy-named';

// Only the boat's owner sees the readiness form; it loads after the check above it.
const ReadinessForm = lazyNamed(
  () => import('@/features/storm/components/readiness-form'),
  'ReadinessForm',
);

function OwnerForm({ watchId, boatId }: { watchId: number; boatId: number }) {
  const query = useReadiness(watchId, boatId);
  const plans = useTacklePlans(boatId);
  const save = useSaveReadiness(watchId, boatId);
  if (!query.data || plans.isPending) return <Spinner label="Loading the boat's plans…" />;
  const { watch, readiness } = query.data;
  return (
    <section aria-labelledby="form-heading" className="flex flex-col gap-3">
      <h2 id="form-heading" className="text-xl">
        Your readiness
      </h2>
      {save.isSuccess && <Alert tone="success">Saved. The board shows it now.</Alert>}
      <Suspense fallback={<Spinner label="Loading the form…" />}>
        <ReadinessForm
          key={readiness.details?.updatedAt ?? 'new'}
          readiness={readiness}
          checklist={watch.checklist}
          plans={plans.data ?? []}
          isPending={save.isPending}
          onSubmit={(input) => save.mutateAsync(input)}
        />
      </Suspense>
    </section>
  );
}

function BoatScreen({ watchId, boatId }: { watchId: number; boatId: number }) {
  const query = useReadiness(watchId, boatId);
  if (query.isPending) return <Spinner label="Loading the boat…" />;
  if (query.isError)
    return (
      <UnavailablePage
        title="Boat not available"
        reason="Couldn't load this boat's readiness"
        back={{ to: paths.stormWatch.href(watchId), label: 'Back to the watch' }}
      >
        <p>{errorMessage(query.error)}</p>
      </UnavailablePage>
    );
  const { watch, readiness } = query.data;
  const d = readiness.details;
  const open = watch.status === 'open';
  return (
    <Page
      title={`${readiness.boatName}: ${watch.name}`}
      intro={<p>{readiness.mine ? 'Your boat.' : `${readiness.ownerName}’s boat.`}</p>}
    >
      <p className="flex flex-wrap items-center gap-3">
        <Link to={paths.stormWatch.href(watch.id)}>Back to the watch</Link>
        <Link to={paths.stormBoard.href(watch.id)}>The board</Link>
        <StatusBadge status={readiness.status} />
      </p>
      {d && (
        <dl className="grid gap-x-6 gap-y-1 sm:grid-cols-[auto_1fr]">
          <dt className="font-bold">Where</dt>
          <dd>{d.location ? STORM_LOCATION_LABELS[d.location] : 'Not decided yet'}</dd>
          <dt className="font-bold">Checklist</dt>
          <dd>
            {d.ticked.length} of {watch.checklist.length} done
          </dd>
          <dt className="font-bold">Buddy</dt>
          <dd>{d.buddy?.name ?? 'None yet'}</dd>
          {d.helpWanted && (
            <>
              <dt className="font-bold">Help wanted</dt>
              <dd>{d.helpNote || 'Yes'}</dd>
            </>
          )}
        </dl>
      )}
      {d?.check && <CheckPanel check={d.check} />}
      {readiness.mine && open && <OwnerForm watchId={watchId} boatId={boatId} />}
      {!open && <Alert tone="info">This watch is closed; readiness can no longer change.</Alert>}
      <StormCautions cautions={d?.check?.cautions ?? []} />
    </Page>
  );
}

/** One boat in a watch: its check against the forecast and, for its owner, the readiness form. */
export function StormBoatRoute() {
  return (
    <RequireAuth>
      <TackleUnits>
        <IdParams
          names={['watchId', 'boatId']}
          unavailable={{
            title: 'Boat not available',
            reason: 'No such boat or watch',
            back: { to: paths.storm.href(), label: 'Back to storm watches' },
          }}
        >
          {(ids) => <BoatScreen {...ids} />}
        </IdParams>
      </TackleUnits>
    </RequireAuth>
  );
}
