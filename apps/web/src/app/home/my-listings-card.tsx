import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useMyListings } from '@/features/exchange/api/get-my-listings';
import { countOf } from '@/lib/plural';
import { HomeCard, HomeEmpty } from './home-card';

/** The seller's side of the exchange: what they have live and in draft, and the way to list more. */
export function MyListingsCard() {
  const mine = useMyListings();
  const listings = mine.data ?? [];
  const live = listings.filter((l) => l.status === 'active');
  const drafts = listings.filter((l) => l.status === 'draft');
  return (
    <HomeCard
      title="Your gear on the exchange"
      more={{ to: paths.exchangeMine.href(), label: 'All your listings' }}
    >
      {mine.isPending && <HomeEmpty>Loading your listings…</HomeEmpty>}
      {mine.isError && <HomeEmpty>Your listings could not be loaded.</HomeEmpty>}
      {mine.data && listings.length === 0 && (
        <HomeEmpty>Nothing listed yet. Surplus chain, an old anchor or a coil of rode?</HomeEmpty>
      )}
      {mine.data && listings.length > 0 && (
        <p>
          {countOf(live.length, 'listing', 'listings')} live
          {drafts.length > 0 && `, ${countOf(drafts.length, 'draft', 'drafts')} not yet published`}
        </p>
      )}
      {drafts.length > 0 && (
        <ul className="flex flex-col gap-1">
          {drafts.slice(0, 3).map((l) => (
            <li key={l.id}>
              <Link to={paths.listingEdit.href(l.id)}>{l.title}</Link>{' '}
              <span className="text-ink-600">· draft</span>
            </li>
          ))}
        </ul>
      )}
      <Link to={paths.listingNew.href()} className="self-start font-bold">
        List gear you no longer need
      </Link>
    </HomeCard>
  );
}
