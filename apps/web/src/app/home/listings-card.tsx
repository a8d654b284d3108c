import type { ListingSummaryDto } from '@app/shared';
import { formatMoney } from '@app/shared/locale';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useListingSearch, type ListingFilters } from '@/features/exchange/api/search-listings';
import { HomeCard, HomeEmpty, HomeLoading } from './home-card';

function ListingLine({ listing, fitsBoat }: { listing: ListingSummaryDto; fitsBoat?: number }) {
  return (
    <li>
      <Link to={paths.listing.href(listing.id, fitsBoat)}>{listing.title}</Link>{' '}
      <span className="text-ink-600">
        · {formatMoney(listing.priceCents, listing.currency)} · {listing.harborName}
      </span>
    </li>
  );
}

export interface ListingsCardProps {
  title: string;
  filters: ListingFilters;
  /** Passed on to the listing page so it shows the fit for this boat. */
  fitsBoat?: number;
  empty: string;
}

/** A few listings from the exchange for the given filters. */
export function ListingsCard({ title, filters, fitsBoat, empty }: ListingsCardProps) {
  const search = useListingSearch({ sort: 'newest', pageSize: '4', ...filters });
  const listings = search.data?.data ?? [];
  return (
    <HomeCard title={title} more={{ to: paths.exchange.href(), label: 'Browse the exchange' }}>
      {search.isPending && <HomeLoading>Looking through the exchange…</HomeLoading>}
      {search.isError && <HomeEmpty>The exchange could not be searched just now.</HomeEmpty>}
      {search.data && listings.length === 0 && <HomeEmpty>{empty}</HomeEmpty>}
      {listings.length > 0 && (
        <ul className="flex flex-col gap-1">
          {listings.map((listing) => (
            <ListingLine key={listing.id} listing={listing} fitsBoat={fitsBoat} />
          ))}
        </ul>
      )}
    </HomeCard>
  );
}
