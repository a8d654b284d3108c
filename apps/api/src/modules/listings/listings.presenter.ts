import type {
  FitDto,
  ListingDto,
  ListingPhotoDto,
  ListingSummaryDto,
  SellerDto,
} from '@app/shared';
import type { Listing, ListingPhoto } from '../../models';
import { getStorage } from '../uploads/storage';
import type { SearchHit } from './listing-index';

/** A photo as clients see it: URLs, never storage paths. */
export function toListingPhotoDto(p: ListingPhoto): ListingPhotoDto {
  const storage = getStorage();
  return {
    id: p.id,
    url: storage.url(p.storageKey),
    thumbUrl: storage.url(p.thumbKey),
    width: p.width,
    height: p.height,
    position: p.position,
  };
}

/** A search result card. */
export function toListingSummaryDto({ doc, fit }: SearchHit): ListingSummaryDto {
  return {
    id: doc.id,
    category: doc.category,
    title: doc.title,
    condition: doc.condition,
    priceCents: doc.priceCents,
    currency: doc.currency,
    harborId: doc.harborId,
    harborName: doc.harborName,
    specs: doc.specs,
    sizeMm: doc.sizeMm,
    thumbUrl: doc.thumbUrl,
    sellerName: doc.sellerName,
    publishedAt: new Date(doc.publishedAtMs).toISOString(),
    ...(fit ? { fit } : {}),
  };
}

/** The full listing page. `listing` must be loaded with its harbour and photos. */
export function toListingDto(
  listing: Listing,
  seller: SellerDto,
  opts: { isMine: boolean; fit?: FitDto; soldTo?: ListingDto['soldTo'] },
): ListingDto {
  const photos = [...(listing.photos ?? [])].sort((a, b) => a.position - b.position || a.id - b.id);
  const first = photos[0];
  return {
    id: listing.id,
    category: listing.category,
    title: listing.title,
    description: listing.description,
    condition: listing.condition,
    priceCents: listing.priceCents,
    currency: listing.currency,
    harborId: listing.harborId,
    harborName: listing.harbor?.name ?? '',
    specs: listing.specs,
    sizeMm: listing.sizeMm,
    thumbUrl: first ? getStorage().url(first.thumbKey) : null,
    publishedAt: listing.publishedAt?.toISOString() ?? null,
    status: listing.status,
    hidden: listing.hiddenAt !== null,
    expiresAt: listing.expiresAt?.toISOString() ?? null,
    soldAt: listing.soldAt?.toISOString() ?? null,
    photos: photos.map(toListingPhotoDto),
    seller,
    isMine: opts.isMine,
    createdAt: listing.createdAt.toISOString(),
    updatedAt: listing.updatedAt.toISOString(),
    ...(opts.fit ? { fit: opts.fit } : {}),
    ...(opts.soldTo ? { soldTo: opts.soldTo } : {}),
  };
}
