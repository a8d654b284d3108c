import { READINESS_STATUS_LABELS, READINESS_STATUSES } from '@app/shared/values';
import { Link, useSearchParams } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { Page } from '@/components/ui/page';
import { SelectField } from '@/components/ui/select-field';
import { Spinner } from '@/components/ui/spinner';
import { UnavailablePage } from '@/components/ui/unavailable-page';
import { paths } from '@/config/paths';
import { apiUrl } from '@/lib/api-client';
import { errorMessage } from '@/lib/form-errors';
import { useCurrentUser } from '@/features/auth/api/get-session';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useClub } from '@/features/club/api/get-club';
import { useBoard } from '@/features/storm/api/get-board';
import { useBuddies, useSetBuddy } from '@/features/storm/api/manage-watch';
import { BoardPrintStyles } from '@/features/storm/components/board-print-styles';
import { BoardTable } from '@/features/storm/components/board-table';
import { BuddySelect } from '@/features/storm/components/buddy-select';
import { countOf } from '@/lib/plural';
import { isModeratorOrAdmin } from '@/lib/roles';
import { IdParams } from '../id-params';

function BoardScreen({ watchId }: { watchId: number }) {
  const [search, setSearch] = useSearchParams();
  const harborId = Number(search.get('harbour')) || undefined;
  const board = useBoard(watchId, harborId);
  const club = useClub();
  const { user } = useCurrentUser();
  const manages = isModeratorOrAdmin(user);
  const buddies = useBuddies(watchId, manages);
  const setBuddy = useSetBuddy(watchId);
  if (board.isPending) return <Spinner label="Loading the board…" />;
  if (board.isError)
    return (
      <UnavailablePage
        title="Board not available"
        reason="Couldn't load the board"
        back={{ to: paths.storm.href(), label: 'Back to storm watches' }}
      >
        <p>{errorMessage(board.error)}</p>
      </UnavailablePage>
    );
  const { watch, rows } = board.data;
  const harbors = club.data?.harbors ?? [];
  const affected = harbors.filter((h) => watch.harborIds.includes(h.id));
  const counts = READINESS_STATUSES.map((s) => ({
    s,
    n: rows.filter((r) => r.status === s).length,
  })).filter((c) => c.n > 0);
  return (
    <Page title={`Board: ${watch.name}`}>
      <BoardPrintStyles />
      <p data-print-heading>
        {watch.sustainedKn} kn gusting {watch.gustKn} kn · margins are checked at the gust ·{' '}
        {watch.status === 'open' ? 'open' : 'closed'} · printed list for the dock
      </p>
      <div className="flex flex-wrap items-end gap-4 print:hidden">
        <Link to={paths.stormWatch.href(watch.id)}>Back to the watch</Link>
        <SelectField
          label="Harbour"
          value={harborId ? String(harborId) : ''}
          onChange={(e) => {
            const next = new URLSearchParams(search);
            if (e.target.value) next.set('harbour', e.target.value);
            else next.delete('harbour');
            setSearch(next, { replace: true });
          }}
          options={[
            { value: '', label: 'Every harbour' },
            ...affected.map((h) => ({ value: String(h.id), label: h.name })),
          ]}
        />
        <Button variant="secondary" onClick={() => window.print()}>
          Print the list
        </Button>
        {manages && (
          <a
            href={apiUrl(`/storm-watches/${watch.id}/board.csv`, { harborId })}
            download
            className="inline-flex min-h-11 items-center font-bold"
          >
            Download CSV
          </a>
        )}
      </div>
      <p className="text-sm" aria-live="polite">
        {countOf(rows.length, 'boat', 'boats')}:{' '}
        {counts.map((c) => `${c.n} ${READINESS_STATUS_LABELS[c.s].toLowerCase()}`).join(', ')}
      </p>
      {!manages && !watch.shareDetails && (
        <p className="text-sm text-ink-700 print:hidden">
          Other members’ boats show only name and status; your own and those you check on as a buddy
          show the details.
        </p>
      )}
      {setBuddy.isError && (
        <Alert tone="error" title="The buddy was not saved">
          <p>{errorMessage(setBuddy.error)}</p>
        </Alert>
      )}
      {rows.length === 0 ? (
        <EmptyState title="No boats here">No member has a boat in this harbour yet.</EmptyState>
      ) : (
        <BoardTable
          watchId={watch.id}
          rows={rows}
          harbors={harbors}
          checklistLength={watch.checklist.length}
          {...(manages && watch.status === 'open'
            ? {
                buddyCell: (r) => (
                  <BuddySelect
                    boatName={r.boatName}
                    ownerId={r.ownerId}
                    value={r.details?.buddy?.id ?? null}
                    people={buddies.data ?? []}
                    disabled={setBuddy.isPending}
                    onChange={(buddyUserId) => setBuddy.mutate({ boatId: r.boatId, buddyUserId })}
                  />
                ),
              }
            : {})}
        />
      )}
      <p className="text-xs text-ink-700">
        Margins are working load limit ÷ load at the forecast gust, from the calc package’s
        tackle-plan check (ABYC H-40 loads extrapolated past 42 kn, chain and shackle ratings from
        published tables). Defer to the harbour master, local rules, the makers’ ratings and
        qualified professionals.
      </p>
    </Page>
  );
}

/** The club's board for a watch, filterable by harbour, printable, and as CSV for moderators. */
export function StormBoardRoute() {
  return (
    <RequireAuth>
      <IdParams
        names={['watchId']}
        unavailable={{
          title: 'Board not available',
          reason: 'No such storm watch',
          back: { to: paths.storm.href(), label: 'Back to storm watches' },
        }}
      >
        {({ watchId }) => <BoardScreen watchId={watchId} />}
      </IdParams>
    </RequireAuth>
  );
}
