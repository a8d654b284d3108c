import type { ListingSummaryDto } from '@app/shared';
import { Link } from 'react-router-dom';
import { categoryLabel, conditionLabel, formatPrice, specDetails } from '../utils/format';
import { FitBadge } from './fit-badge';

export interface ListingCardProps {
  listing: ListingSummaryDto;
  href: string;
}

/** One search result: photo, title, price, harbour, key specs and the fit flag. */
export function ListingCard({ listing, href }: ListingCardProps) {
  const specs = specDetails(listing.category, listing.specs).slice(0, 3);
  return (
    <li className="flex flex-col overflow-hidden rounded-lg border border-sand-300 bg-sand-50 shadow-card">
      {listing.thumbUrl ? (
        <img
          src={listing.thumbUrl}
          alt=""
          loading="lazy"
          className="aspect-[4/3] w-full object-cover"
        />
      ) : (
        <div aria-hidden="true" className="aspect-[4/3] w-full bg-sand-200" />
      )}
      <div className="flex flex-1 flex-col gap-1 p-3">
        <p className="text-xs font-bold uppercase tracking-wide text-ink-600">
          {categoryLabel(listing.category)} · {listing.harborName}
        </p>
        <h3 className="text-base">
          <Link to={href} className="font-bold text-ink-900 underline-offset-2 hover:underline">
            {listing.title}
          </Link>
        </h3>
        <p className="text-lg font-bold text-signal-700">
          {formatPrice(listing.priceCents, listing.currency)}
        </p>
        <p className="text-xs text-ink-700">
          {conditionLabel(listing.condition)}
          {specs.map((s) => ` · ${s.short}`).join('')}
        </p>
        {listing.fit && <FitBadge fit={listing.fit} />}
      </div>
    </li>
  );
}
