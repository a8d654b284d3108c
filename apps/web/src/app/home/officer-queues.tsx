import { formatMoney } from '@app/shared/locale';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useModerationCount } from '@/features/moderation/api/get-queue';
import { useSummary } from '@/features/treasury/api/get-summary';
import { HomeCard, HomeEmpty } from './home-card';
import { countOf } from '@/lib/plural';

/** One line of a desk: how many wait, the words for one and for several, and where to open them. */
type QueueRow = readonly [count: number, one: string, many: string, to: string];

function QueueList({ rows }: { rows: readonly QueueRow[] }) {
  return (
    <ul className="flex flex-col gap-1">
      {rows.map(([count, one, many, to]) => (
        <li key={one} className="flex items-center justify-between gap-3">
          <span>{countOf(count, one, many)}</span>
          {count > 0 && (
            <Link to={to} className="font-bold">
              Open
            </Link>
          )}
        </li>
      ))}
    </ul>
  );
}

/** What waits for a moderator today, with counts. */
export function ModeratorQueue() {
  const count = useModerationCount(true);
  const moderation = paths.moderation.href();
  return (
    <HomeCard title="Moderation desk" more={{ to: moderation, label: 'Go to moderation' }}>
      {count.isPending && <HomeEmpty>Counting what waits…</HomeEmpty>}
      {count.isError && <HomeEmpty>The moderation counts could not be loaded.</HomeEmpty>}
      {count.data && count.data.total === 0 && (
        <HomeEmpty>Nothing waits for a moderator.</HomeEmpty>
      )}
      {count.data && count.data.total > 0 && (
        <QueueList
          rows={[
            [count.data.pendingPosts, 'post waiting', 'posts waiting', moderation],
            [count.data.pendingComments, 'comment waiting', 'comments waiting', moderation],
            [
              count.data.openReports + count.data.openListingReports,
              'open report',
              'open reports',
              moderation,
            ],
          ]}
        />
      )}
    </HomeCard>
  );
}

/** What waits for the treasurer today: held payments and members overdue. */
export function TreasurerQueue() {
  const summary = useSummary();
  const data = summary.data;
  const treasury = paths.treasury.href();
  const roster = paths.treasuryRoster.href();
  return (
    <HomeCard title="Treasurer's desk" more={{ to: treasury, label: 'Go to the treasury' }}>
      {summary.isPending && <HomeEmpty>Adding up the year…</HomeEmpty>}
      {summary.isError && <HomeEmpty>The treasury figures could not be loaded.</HomeEmpty>}
      {data && (
        <>
          <QueueList
            rows={[
              [data.heldCount, 'payment held for a check', 'payments held for a check', treasury],
              [data.counts.overdue, 'member overdue', 'members overdue', roster],
              [data.counts.due, 'member due', 'members due', roster],
            ]}
          />
          <p className="text-ink-700">
            {formatMoney(data.collectedMinor, data.currency)} collected of{' '}
            {formatMoney(data.expectedMinor, data.currency)} expected this year.
          </p>
        </>
      )}
    </HomeCard>
  );
}
