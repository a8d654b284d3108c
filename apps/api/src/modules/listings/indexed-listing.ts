// A listing as the search index keeps it, and the query and mapping that build it from MariaDB rows.
import type { Currency, ListingCategory, ListingCondition } from '@app/shared';
import { getStorage } from '../uploads/storage';
import { ratingOf, specsText, type ListingRating } from './listing-specs';

/** One searchable (active, visible) listing as the index keeps it, with what the result card shows. */
export interface IndexedListing {
  id: number;
  category: ListingCategory;
  title: string;
  description: string;
  specsText: string;
  specs: Record<string, unknown>;
  condition: ListingCondition;
  priceCents: number;
  currency: Currency;
  harborId: number;
  harborName: string;
  sizeMm: number | null;
  /** The stated length (chain, rope, snubber), m, or null. */
  lengthM: number | null;
  thumbUrl: string | null;
  sellerName: string;
  publishedAtMs: number;
  expiresAtMs: number;
  rating: ListingRating;
}

export interface Row {
  id: number;
  category: ListingCategory;
  title: string;
  description: string;
  specs: string | Record<string, unknown>;
  condition: ListingCondition;
  price_cents: number;
  currency: Currency;
  harbor_id: number;
  harbor_name: string;
  size_mm: number | null;
  thumb_key: string | null;
  seller_name: string;
  published_at: Date | string;
  expires_at: Date | string;
  updated_at: Date | string;
}

export const SELECT_SEARCHABLE = `
  SELECT l.id, l.category, l.title, l.description, l.specs, l.\`condition\`, l.price_cents, l.currency,
         l.harbor_id, h.name AS harbor_name, l.size_mm, l.published_at, l.expires_at, l.updated_at,
         u.display_name AS seller_name,
         (SELECT p.thumb_key FROM listing_photos p WHERE p.listing_id = l.id ORDER BY p.position, p.id LIMIT 1) AS thumb_key
    FROM listings l
    JOIN users u ON u.id = l.seller_id
    JOIN harbors h ON h.id = l.harbor_id
   WHERE l.status = 'active' AND l.hidden_at IS NULL`;

export function toDoc(r: Row): IndexedListing {
  const specs =
    typeof r.specs === 'string' ? (JSON.parse(r.specs) as Record<string, unknown>) : r.specs;
  return {
    id: r.id,
    category: r.category,
    title: r.title,
    description: r.description,
    specsText: specsText(r.category, specs),
    specs,
    condition: r.condition,
    priceCents: Number(r.price_cents),
    currency: r.currency,
    harborId: r.harbor_id,
    harborName: r.harbor_name,
    sizeMm: r.size_mm === null ? null : Number(r.size_mm),
    lengthM: typeof specs.lengthM === 'number' ? specs.lengthM : null,
    thumbUrl: r.thumb_key ? getStorage().url(r.thumb_key) : null,
    sellerName: r.seller_name,
    publishedAtMs: new Date(r.published_at).getTime(),
    expiresAtMs: new Date(r.expires_at).getTime(),
    rating: ratingOf(r.category, specs, r.condition),
  };
}
