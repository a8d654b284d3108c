import { LRUCache } from 'lru-cache';
import type { ListingDto } from '@app/shared';
import { AppError } from '../../errors/app-error';
import { onListingsReread } from './listing-index';
import { toListingDto } from './listings.presenter';
import { getVisibleListingPage } from './listing-reads.service';

/**
 * How long a visitor's copy of a listing page may be reused. Writes in this process clear it at once; a change
 * another process makes to the listing itself (edit, photos, status, hiding) drops it at the next index catch-up
 * (1.5 s), so only the seller's name and membership date can be this old.
 */
export const ANONYMOUS_LISTING_TTL_MS = 30_000;

/** The page as a visitor sees it, read now (throws NOT_FOUND for a listing a visitor may not see). */
async function buildVisitorCopy(listingId: number): Promise<ListingDto> {
  const { listing, seller } = await getVisibleListingPage(null, listingId);
  return toListingDto(listing, seller, { isMine: false });
}

// Visitors (no session user) all see the same listing page, so it is built once per few seconds rather than on
// every read; concurrent misses for one listing share a single load. Errors (not found) are never cached, so
// only listings everyone may see (active or sold, not hidden) are ever held here.
const cache = new LRUCache<number, ListingDto>({
  max: 5000,
  ttl: ANONYMOUS_LISTING_TTL_MS,
  fetchMethod: (listingId) => buildVisitorCopy(listingId),
});

/** The listing page as a visitor sees it (throws NOT_FOUND like getVisibleListing). */
export async function anonymousListingDetail(listingId: number): Promise<ListingDto> {
  try {
    return (await cache.fetch(listingId)) ?? (await buildVisitorCopy(listingId));
  } catch (err) {
    if (err instanceof AppError) throw err;
    // A write cleared the cache while this copy was being built, which aborts the load (so a copy read before
    // the write is never kept): read it again, fresh, without caching. A database error simply happens again
    // here and reaches the error handler.
    return buildVisitorCopy(listingId);
  }
}

onListingsReread((ids) => {
  for (const id of ids) cache.delete(id);
});

export const clearAnonymousListingCache = () => cache.clear();
