import { displayLocale } from '@app/shared/locale';
import type { ListingDto } from '@app/shared';
import { useState } from 'react';
import { categoryLabel, conditionLabel, formatPrice, specRows } from '../utils/format';
import { FitBadge } from './fit-badge';

const STATUS_LABELS: Record<ListingDto['status'], string> = {
  draft: 'Draft (not visible to others)',
  active: 'For sale',
  sold: 'Sold',
  expired: 'Expired',
  withdrawn: 'Withdrawn',
};

/** The listing: photos, price, specs, description and the seller's card. */
export function ListingDetail({ listing }: { listing: ListingDto }) {
  const [current, setCurrent] = useState(0);
  const photo = listing.photos[current] ?? listing.photos[0];
  return (
    <article className="grid gap-6 md:grid-cols-2">
      <div className="flex flex-col gap-2">
        {photo ? (
          <img
            src={photo.url}
            alt={`${listing.title}, photo ${current + 1}`}
            className="w-full rounded-lg border border-sand-300 object-contain"
            width={photo.width}
            height={photo.height}
          />
        ) : (
          <div
            className="aspect-[4/3] w-full rounded-lg bg-sand-200"
            role="img"
            aria-label="No photos"
          />
        )}
        {listing.photos.length > 1 && (
          <div className="flex flex-wrap gap-2">
            {listing.photos.map((p, i) => (
              <button
                key={p.id}
                type="button"
                onClick={() => setCurrent(i)}
                aria-pressed={i === current}
                className="rounded-md border-2 border-transparent aria-pressed:border-signal-600"
              >
                <img
                  src={p.thumbUrl}
                  alt={`Show photo ${i + 1}`}
                  className="h-16 w-20 rounded-sm object-cover"
                />
              </button>
            ))}
          </div>
        )}
      </div>
      <div className="flex flex-col gap-3">
        <p className="text-xs font-bold uppercase tracking-wide text-ink-600">
          {categoryLabel(listing.category)} · {listing.harborName} · {STATUS_LABELS[listing.status]}
          {listing.hidden && ' · hidden by a moderator'}
        </p>
        <p className="text-2xl font-bold text-signal-700">
          {formatPrice(listing.priceCents, listing.currency)}
        </p>
        {listing.fit && <FitBadge fit={listing.fit} />}
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
          <dt className="font-bold">Condition</dt>
          <dd>{conditionLabel(listing.condition)}</dd>
          {specRows(listing.category, listing.specs).map(([k, v]) => (
            <div key={k} className="contents">
              <dt className="font-bold">{k}</dt>
              <dd>{v}</dd>
            </div>
          ))}
        </dl>
        <p className="whitespace-pre-line">{listing.description}</p>
        <aside
          aria-label="Seller"
          className="rounded-md border border-sand-300 bg-sand-100 p-3 text-sm"
        >
          <p className="font-bold">{listing.seller.displayName}</p>
          <p>
            Member since{' '}
            {new Date(listing.seller.memberSince).toLocaleDateString(displayLocale(), {
              year: 'numeric',
              month: 'long',
            })}
          </p>
          {listing.seller.paidUp === undefined ? null : listing.seller.paidUp ? (
            <p className="mt-1 inline-flex rounded-pill border border-kelp-700 bg-kelp-50 px-2 text-xs font-bold text-kelp-700">
              Paid-up member
            </p>
          ) : (
            <p className="mt-1 text-xs text-ink-600">Dues not shown as paid</p>
          )}
        </aside>
        <p className="text-xs text-ink-600">
          Inspect used gear before you buy: look for worn links, corrosion and bent shanks. Ratings
          are for new gear; follow the maker&apos;s markings and ask a rigger if in doubt. Pay in
          person or by a method you trust.
        </p>
      </div>
    </article>
  );
}
