import { formatMoney } from '@app/shared/locale';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useModerationCount } from '@/features/moderation/api/get-queue';
import { useSummary } from '@/features/treasury/api/get-summary';
import { HomeCard, HomeEmpty } from './home-card';
import { countOf } from '@/lib/plural';

function QueueLine({
  count,
  one,
  many,
  to,
}: {
  count: number;
  one: string;
  many: string;
  to: string;
}) {
  return (
    <li className="flex items-center justify-between gap-3">
      <span>{countOf(count, one, many)}</span>
      {count > 0 && (
        <Link to={to} className="font-bold">
          Open
        </Link>
      )}
    </li>
  );
}

/** What waits for a moderator today, with counts. */
export function ModeratorQueue() {
  const count = useModerationCount(true);
  return (
    <HomeCard
      title="Moderation desk"
      more={{ to: paths.moderation.href(), label: 'Go to moderation' }}
    >
      {count.isPending && <HomeEmpty>Counting what waits…</HomeEmpty>}
      {count.isError && <HomeEmpty>The moderation counts could not be loaded.</HomeEmpty>}
      {count.data && count.data.total === 0 && (
        <HomeEmpty>Nothing waits for a moderator.</HomeEmpty>
      )}
      {count.data && count.data.total > 0 && (
        <ul className="flex flex-col gap-1">
          <QueueLine
            count={count.data.pendingPosts}
            one="post waiting"
            many="posts waiting"
            to={paths.moderation.href()}
          />
          <QueueLine
            count={count.data.pendingComments}
            one="comment waiting"
            many="comments waiting"
            to={paths.moderation.href()}
          />
          <QueueLine
            count={count.data.openReports + count.data.openListingReports}
            one="open report"
            many="open reports"
            to={paths.moderation.href()}
          />
        </ul>
      )}
    </HomeCard>
  );
}

/** What waits for the treasurer today: held payments and members overdue. */
export function TreasurerQueue() {
  const summary = useSummary();
  const data = summary.data;
  return (
    <HomeCard
      title="Treasurer's desk"
      more={{ to: paths.treasury.href(), label: 'Go to the treasury' }}
    >
      {summary.isPending && <HomeEmpty>Adding up the year…</HomeEmpty>}
      {summary.isError && <HomeEmpty>The treasury figures could not be loaded.</HomeEmpty>}
      {data && (
        <>
          <ul className="flex flex-col gap-1">
            <QueueLine
              count={data.heldCount}
              one="payment held for a check"
              many="payments held for a check"
              to={paths.treasury.href()}
            />
            <QueueLine
              count={data.counts.overdue}
              one="member overdue"
              many="members overdue"
              to={paths.treasuryRoster.href()}
            />
            <QueueLine
              count={data.counts.due}
              one="member due"
              many="members due"
              to={paths.treasuryRoster.href()}
            />
          </ul>
          <p className="text-ink-700">
            {formatMoney(data.collectedMinor, data.currency)} collected of{' '}
            {formatMoney(data.expectedMinor, data.currency)} expected this year.
          </p>
        </>
      )}
    </HomeCard>
  );
}
