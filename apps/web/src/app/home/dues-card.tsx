import { formatMoney } from '@app/shared/locale';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useMyDues } from '@/features/dues/api/get-my-dues';
import { DuesStatusBadge } from '@/features/dues/components/status-badge';
import { HomeCard, HomeEmpty } from './home-card';
import { readableDate } from '@/lib/format-date';

/** The calendar day after `iso` (YYYY-MM-DD): when a membership paid through `iso` falls due again. */
function dayAfter(iso: string): string {
  return new Date(Date.parse(`${iso}T12:00:00Z`) + 86_400_000).toISOString().slice(0, 10);
}

/** The member's dues: status, when the membership runs to, and a way to pay what is owed. */
export function DuesCard() {
  const dues = useMyDues();
  const data = dues.data;
  const owed = data?.quote ?? null;
  return (
    <HomeCard title="My dues" more={{ to: paths.dues.href(), label: 'Dues and payments' }}>
      {dues.isPending && <HomeEmpty>Loading your dues…</HomeEmpty>}
      {dues.isError && <HomeEmpty>Your dues could not be loaded.</HomeEmpty>}
      {data && (
        <>
          <p className="flex flex-wrap items-center gap-2">
            <DuesStatusBadge status={data.status} />
            {data.membership && <span>{data.membership.planName}</span>}
          </p>
          {data.membership?.paidThrough && (
            <p>Your membership runs to {readableDate(data.membership.paidThrough)}.</p>
          )}
          {data.paidUp && data.membership?.paidThrough && (
            <p data-testid="next-due">
              Next due on{' '}
              <time dateTime={dayAfter(data.membership.paidThrough)}>
                {readableDate(dayAfter(data.membership.paidThrough))}
              </time>
              .
            </p>
          )}
          {!data.paidUp && owed && (
            <p data-testid="next-due">
              Due from <time dateTime={owed.coversFrom}>{readableDate(owed.coversFrom)}</time>.
            </p>
          )}
          {!data.paidUp && owed && (
            <>
              <p>
                {formatMoney(owed.amountMinor, owed.currency)} covers{' '}
                {readableDate(owed.coversFrom)} to {readableDate(owed.coversTo)}.
              </p>
              <Link
                to={paths.dues.href()}
                className="inline-flex min-h-11 items-center self-start rounded-md bg-signal-600 px-4 font-bold text-white no-underline hover:bg-signal-700 hover:text-white"
              >
                Pay {formatMoney(owed.amountMinor, owed.currency)}
              </Link>
            </>
          )}
          {!data.membership && <p>You have no membership yet; the dues page shows the plans.</p>}
        </>
      )}
    </HomeCard>
  );
}
