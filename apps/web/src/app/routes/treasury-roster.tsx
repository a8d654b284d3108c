import { useCallback, useEffect, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Page } from '@/components/ui/page';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/form-errors';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useRoster } from '@/features/treasury/api/get-roster';
import { RemindersPanel } from '@/features/treasury/components/reminders-panel';
import { RosterTable } from '@/features/treasury/components/roster-table';

function RosterScreen() {
  const roster = useRoster();
  const [selected, setSelected] = useState<Set<number>>(new Set());
  const toggle = useCallback(
    (id: number) =>
      setSelected((prev) => {
        const next = new Set(prev);
        if (next.has(id)) next.delete(id);
        else next.add(id);
        return next;
      }),
    [],
  );
  const selectBehind = useCallback(
    () =>
      setSelected(
        new Set(
          (roster.data ?? [])
            .filter((r) => r.status === 'due' || r.status === 'overdue')
            .map((r) => r.userId),
        ),
      ),
    [roster.data],
  );
  // Everyone due or overdue starts selected, so the reminders panel counts who would be reminded at once.
  const preselected = useRef(false);
  useEffect(() => {
    if (preselected.current || !roster.data) return;
    preselected.current = true;
    selectBehind();
  }, [roster.data, selectBehind]);
  return (
    <Page
      title="Member roster"
      intro={<p>Every member, their plan, paid-through date and what they owe.</p>}
    >
      <p>
        <Link to={paths.treasury.href()}>Back to the treasury</Link>
      </p>
      {roster.isPending && <Spinner label="Loading the roster…" />}
      {roster.isError && (
        <Alert tone="error" title="Couldn't load the roster">
          <p>{errorMessage(roster.error)}</p>
        </Alert>
      )}
      {roster.data && (
        <>
          <div>
            <button type="button" onClick={selectBehind} className="font-bold underline">
              Select everyone due or overdue
            </button>
          </div>
          <RosterTable rows={roster.data} selected={selected} onToggle={toggle} />
          <RemindersPanel userIds={[...selected]} />
        </>
      )}
    </Page>
  );
}

/** The roster on its own route (the table library loads only here). */
export function TreasuryRosterRoute() {
  return (
    <RequireAuth roles={['treasurer']}>
      <RosterScreen />
    </RequireAuth>
  );
}
