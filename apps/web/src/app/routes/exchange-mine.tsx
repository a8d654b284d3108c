import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { EmptyState } from '@/components/ui/empty-state';
import { Page } from '@/components/ui/page';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/form-errors';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useMyListings } from '@/features/exchange/api/get-my-listings';
import { formatPrice } from '@/features/exchange/utils/format';

function MineScreen() {
  const mine = useMyListings();
  return (
    <Page
      title="My listings"
      intro={<p>Drafts, gear for sale, sold and expired listings. Expired ones can be relisted.</p>}
    >
      <Link to={paths.listingNew.href()}>List more gear</Link>
      {mine.isPending && <Spinner label="Loading your listings…" />}
      {mine.isError && <Alert tone="error">{errorMessage(mine.error)}</Alert>}
      {mine.data?.length === 0 && <EmptyState title="Nothing listed yet" />}
      {mine.data && mine.data.length > 0 && (
        <ul className="flex flex-col divide-y divide-sand-300 rounded-lg border border-sand-300 bg-sand-50">
          {mine.data.map((l) => (
            <li key={l.id} className="flex flex-wrap items-center gap-3 p-3">
              <Link to={paths.listing.href(l.id)} className="font-bold">
                {l.title}
              </Link>
              <span className="rounded-pill border border-sand-500 px-2 text-xs font-bold">
                {l.status}
              </span>
              {l.hidden && (
                <span className="text-xs font-bold text-flare-700">hidden by a moderator</span>
              )}
              <span className="text-sm">{formatPrice(l.priceCents, l.currency)}</span>
            </li>
          ))}
        </ul>
      )}
    </Page>
  );
}

/** The member's own listings. */
export function ExchangeMineRoute() {
  return (
    <RequireAuth>
      <MineScreen />
    </RequireAuth>
  );
}
