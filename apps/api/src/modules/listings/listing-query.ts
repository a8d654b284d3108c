// Pure pieces of the listing search: facet filters, query plans (with swapped-letter spellings), orders, top k.
import type { FitDto, ListingSearch } from '@app/shared';
import { parseQuery } from './search-terms';
import type { IndexedListing } from './indexed-listing';

export type Filters = Pick<
  ListingSearch,
  'category' | 'harborId' | 'condition' | 'priceMin' | 'priceMax' | 'sizeMinMm' | 'sizeMaxMm'
>;

export function passes(d: IndexedListing, f: Filters, nowMs: number): boolean {
  if (d.expiresAtMs <= nowMs) return false;
  if (f.category && d.category !== f.category) return false;
  if (f.harborId && d.harborId !== f.harborId) return false;
  if (f.condition && d.condition !== f.condition) return false;
  if (f.priceMin !== undefined && d.priceCents < f.priceMin) return false;
  if (f.priceMax !== undefined && d.priceCents > f.priceMax) return false;
  if (f.sizeMinMm !== undefined && (d.sizeMm === null || d.sizeMm < f.sizeMinMm - 0.05))
    return false;
  if (f.sizeMaxMm !== undefined && (d.sizeMm === null || d.sizeMm > f.sizeMaxMm + 0.05))
    return false;
  return true;
}

/** Adjacent-letter swaps of a word ("chian" → "hcian", "cihan", "chain", "china"). */
function swaps(term: string): string[] {
  const out: string[] = [];
  for (let i = 0; i < term.length - 1; i += 1)
    out.push(term.slice(0, i) + term.charAt(i + 1) + term.charAt(i) + term.slice(i + 2));
  return out;
}

export interface QueryPlan {
  /** One group per query term: the term, or (`withSwaps`) a word with its swapped-letter spellings. */
  groups: string[][];
  minLengthM?: number;
}

/** The query's term groups and its minimum length (`parseQuery`: a length in the query is a minimum). */
export function planOf(q: string, withSwaps: boolean): QueryPlan {
  const { terms, minLengthM } = parseQuery(q);
  const groups = terms.map((t) =>
    withSwaps && t.kind === 'word' && t.text.length >= 4 ? [t.text, ...swaps(t.text)] : [t.text],
  );
  return minLengthM === undefined ? { groups } : { groups, minLengthM };
}

export const longEnough = (d: IndexedListing, minLengthM: number | undefined) =>
  minLengthM === undefined || (d.lengthM !== null && d.lengthM >= minLengthM - 0.005);

type Order = (a: IndexedListing, b: IndexedListing) => number;
export const ORDERS: Record<'newest' | 'price-asc' | 'price-desc', Order> = {
  newest: (a, b) => b.publishedAtMs - a.publishedAtMs || b.id - a.id,
  'price-asc': (a, b) => a.priceCents - b.priceCents || b.id - a.id,
  'price-desc': (a, b) => b.priceCents - a.priceCents || b.id - a.id,
};

/** The first `k` of `items` under `before` (negative: a comes first), without sorting the rest. */
export function topK<T>(items: T[], k: number, before: (a: T, b: T) => number): T[] {
  if (k >= items.length / 4) return [...items].sort(before).slice(0, k);
  const best: T[] = [];
  for (const x of items) {
    const worst = best[best.length - 1];
    if (best.length === k && worst !== undefined && before(x, worst) >= 0) continue;
    let lo = 0;
    let hi = best.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (before(best[mid] as T, x) <= 0) lo = mid + 1;
      else hi = mid;
    }
    best.splice(lo, 0, x);
    if (best.length > k) best.pop();
  }
  return best;
}

export interface Scored {
  doc: IndexedListing;
  score: number;
  fit?: FitDto;
}
