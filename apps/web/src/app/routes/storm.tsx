import { formatDateTime } from '@app/shared/locale';
import type { StormWatchDto } from '@app/shared';
import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { EmptyState } from '@/components/ui/empty-state';
import { Page } from '@/components/ui/page';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/form-errors';
import { useCurrentUser } from '@/features/auth/api/get-session';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useWatches } from '@/features/storm/api/get-watches';
import { isModeratorOrAdmin } from '@/lib/roles';

const day = (iso: string) => formatDateTime(iso);

function WatchItem({ watch }: { watch: StormWatchDto }) {
  return (
    <li className="rounded-lg border border-sand-300 bg-sand-50 p-4 shadow-card">
      <Link to={paths.stormWatch.href(watch.id)} className="text-lg font-bold">
        {watch.name}
      </Link>
      <p className="text-sm">
        {watch.sustainedKn} kn gusting {watch.gustKn} kn · {day(watch.arrivesAt)} to{' '}
        {day(watch.endsAt)}
      </p>
      <p className="text-sm font-bold">{watch.status === 'open' ? 'Open' : 'Closed'}</p>
    </li>
  );
}

function StormScreen() {
  const watches = useWatches();
  const { user } = useCurrentUser();
  const manages = isModeratorOrAdmin(user);
  const open = watches.data?.filter((w) => w.status === 'open') ?? [];
  const closed = watches.data?.filter((w) => w.status === 'closed') ?? [];
  return (
    <Page
      title="Storm watch"
      intro={
        <p>
          When a storm is forecast the club gets ready together: each member says where their boats
          will ride it out, on which tackle plan, and works through the checklist.
        </p>
      }
    >
      {manages && (
        <p className="flex flex-wrap gap-4">
          <Link to={paths.stormNew.href()} className="font-bold">
            Open a storm watch
          </Link>
          <Link to={paths.stormChecklist.href()}>Edit the checklist</Link>
        </p>
      )}
      {watches.isPending && <Spinner label="Loading storm watches…" />}
      {watches.isError && (
        <Alert tone="error" title="Couldn't load the storm watches">
          <p>{errorMessage(watches.error)}</p>
        </Alert>
      )}
      {watches.data && (
        <>
          <section aria-labelledby="open-heading" className="flex flex-col gap-3">
            <h2 id="open-heading" className="text-xl">
              Open watches
            </h2>
            {open.length === 0 ? (
              <EmptyState title="No storm watch is open">
                A moderator opens one when a storm or a deep gale is forecast; you get a notice and
                an e-mail.
              </EmptyState>
            ) : (
              <ul className="grid gap-3 sm:grid-cols-2">
                {open.map((w) => (
                  <WatchItem key={w.id} watch={w} />
                ))}
              </ul>
            )}
          </section>
          {closed.length > 0 && (
            <section aria-labelledby="past-heading" className="flex flex-col gap-3">
              <h2 id="past-heading" className="text-xl">
                Past watches
              </h2>
              <ul className="grid gap-3 sm:grid-cols-2">
                {closed.map((w) => (
                  <WatchItem key={w.id} watch={w} />
                ))}
              </ul>
            </section>
          )}
        </>
      )}
    </Page>
  );
}

/** Every storm watch, open ones first. */
export function StormRoute() {
  return (
    <RequireAuth>
      <StormScreen />
    </RequireAuth>
  );
}
