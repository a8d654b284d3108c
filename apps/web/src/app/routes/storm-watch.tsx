import { Suspense } from 'react';
import { formatDateTime } from '@app/shared/locale';
import type { ReadinessDto, StormWatchDto } from '@app/shared';
import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { EmptyState } from '@/components/ui/empty-state';
import { Page } from '@/components/ui/page';
import { Spinner } from '@/components/ui/spinner';
import { UnavailablePage } from '@/components/ui/unavailable-page';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/form-errors';
import { useCurrentUser } from '@/features/auth/api/get-session';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useClub } from '@/features/club/api/get-club';
import { useWatch } from '@/features/storm/api/get-watch';
import { useCloseWatch } from '@/features/storm/api/manage-watch';
import { MarginBadge } from '@/features/storm/components/margin-badge';
import { StatusBadge } from '@/features/storm/components/status-badge';
import { StormCautions } from '@/features/storm/components/storm-cautions';
import { isModeratorOrAdmin } from '@/lib/roles';
import { IdParams } from '../id-params';
import { lazyNamed } from '@/lib/lazy-named';

// Only the organiser sees the close form.
const CloseForm = lazyNamed(() => import('@/features/storm/components/close-form'), 'CloseForm');

const when = (iso: string) => formatDateTime(iso);

function BoatList({
  watchId,
  rows,
  label,
}: {
  watchId: number;
  rows: ReadinessDto[];
  label: string;
}) {
  return (
    <ul className="grid gap-3 sm:grid-cols-2" aria-label={label}>
      {rows.map((r) => {
        const check = r.details?.check ?? null;
        return (
          <li
            key={r.boatId}
            className="flex flex-col gap-2 rounded-lg border border-sand-300 bg-sand-50 p-4"
          >
            <Link to={paths.stormBoat.href(watchId, r.boatId)} className="text-lg font-bold">
              {r.boatName}
            </Link>
            {!r.mine && <p className="text-sm">Owner: {r.ownerName}</p>}
            <div className="flex flex-wrap items-center gap-2">
              <StatusBadge status={r.status} />
              {check && (
                <MarginBadge band={check.band} margin={check.weakestLink?.wllMargin ?? null} />
              )}
            </div>
            {check?.weakestLink && (
              <p className="text-sm">
                Weakest link at {check.windKn} kn: {check.weakestLink.label}
              </p>
            )}
          </li>
        );
      })}
    </ul>
  );
}

function Forecast({ watch, harbours }: { watch: StormWatchDto; harbours: string }) {
  return (
    <dl className="grid gap-x-6 gap-y-1 sm:grid-cols-[auto_1fr]">
      <dt className="font-bold">Forecast</dt>
      <dd>
        {watch.sustainedKn} kn sustained, gusting {watch.gustKn} kn
        {watch.surgeM > 0 ? `, surge ${watch.surgeM} m` : ''}
      </dd>
      <dt className="font-bold">Expected</dt>
      <dd>
        {when(watch.arrivesAt)} to {when(watch.endsAt)}
      </dd>
      <dt className="font-bold">Harbours</dt>
      <dd>{harbours}</dd>
      <dt className="font-bold">Opened by</dt>
      <dd>{watch.openedBy || '—'}</dd>
    </dl>
  );
}

function WatchScreen({ watchId }: { watchId: number }) {
  const query = useWatch(watchId);
  const club = useClub();
  const close = useCloseWatch(watchId);
  const { user } = useCurrentUser();
  const manages = isModeratorOrAdmin(user);
  if (query.isPending) return <Spinner label="Loading the storm watch…" />;
  if (query.isError)
    return (
      <UnavailablePage
        title="Storm watch not available"
        reason="Couldn't load this storm watch"
        back={{ to: paths.storm.href(), label: 'Back to storm watches' }}
      >
        <p>{errorMessage(query.error)}</p>
      </UnavailablePage>
    );
  const { watch, mine, buddyOf, cautions } = query.data;
  const harbours = (club.data?.harbors ?? [])
    .filter((h) => watch.harborIds.includes(h.id))
    .map((h) => h.name)
    .join(', ');
  return (
    <Page
      title={watch.name}
      intro={<p>{watch.status === 'open' ? 'Storm watch, open.' : 'Storm watch, closed.'}</p>}
    >
      <p className="flex flex-wrap gap-4">
        <Link to={paths.storm.href()}>All storm watches</Link>
        <Link to={paths.stormBoard.href(watch.id)} className="font-bold">
          The club’s board
        </Link>
      </p>
      <Forecast watch={watch} harbours={harbours} />
      {watch.note && <p className="max-w-prose whitespace-pre-line">{watch.note}</p>}
      <StormCautions cautions={cautions} />
      <section aria-labelledby="mine-heading" className="flex flex-col gap-3">
        <h2 id="mine-heading" className="text-xl">
          Your boats
        </h2>
        {mine.length === 0 ? (
          <EmptyState
            title="You have no boats yet"
            action={<Link to={paths.boats.href()}>Add a boat</Link>}
          >
            Add your boat and save a tackle plan to have it checked against the forecast.
          </EmptyState>
        ) : (
          <BoatList watchId={watch.id} rows={mine} label="Your boats" />
        )}
      </section>
      {buddyOf.length > 0 && (
        <section aria-labelledby="buddy-heading" className="flex flex-col gap-3">
          <h2 id="buddy-heading" className="text-xl">
            Boats you check on as a buddy
          </h2>
          <BoatList watchId={watch.id} rows={buddyOf} label="Boats you check on" />
        </section>
      )}
      {watch.status === 'closed' && (
        <section aria-labelledby="lessons-heading" className="flex flex-col gap-2">
          <h2 id="lessons-heading" className="text-xl">
            Lessons
          </h2>
          <p className="max-w-prose whitespace-pre-line">{watch.lessons}</p>
          {watch.lessonsPostId && manages && (
            <p>
              <Link to={paths.postEdit.href(watch.lessonsPostId)}>
                Edit and publish the lessons post
              </Link>
            </p>
          )}
        </section>
      )}
      {watch.status === 'open' && manages && (
        <section aria-labelledby="close-heading" className="flex flex-col gap-3">
          <h2 id="close-heading" className="text-xl">
            Close the watch
          </h2>
          {close.isSuccess && <Alert tone="success">The watch is closed.</Alert>}
          <Suspense fallback={<Spinner label="Loading the form…" />}>
            <CloseForm isPending={close.isPending} onSubmit={(input) => close.mutateAsync(input)} />
          </Suspense>
        </section>
      )}
    </Page>
  );
}

/** One storm watch: the forecast, the member's boats and, for moderators, closing it. */
export function StormWatchRoute() {
  return (
    <RequireAuth>
      <IdParams
        names={['watchId']}
        unavailable={{
          title: 'Storm watch not available',
          reason: 'No such storm watch',
          back: { to: paths.storm.href(), label: 'Back to storm watches' },
        }}
      >
        {({ watchId }) => <WatchScreen watchId={watchId} />}
      </IdParams>
    </RequireAuth>
  );
}
