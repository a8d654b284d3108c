import { QueryTypes, type Sequelize } from 'sequelize';
import type { FitDto, ListingSearch, SavedSearchCriteria } from '@app/shared';
import { Listing } from '../../models';
import { fitOf, type BoatNeeds } from './fit';
import { ListingSearchEngine } from './listing-search-engine';
import { termsOf } from './search-terms';
import { SELECT_SEARCHABLE, toDoc, type IndexedListing, type Row } from './indexed-listing';
import {
  longEnough,
  ORDERS,
  passes,
  planOf,
  topK,
  type QueryPlan,
  type Scored,
} from './listing-query';

const newIndex = () =>
  new ListingSearchEngine<IndexedListing>({
    fields: { title: 3, description: 1, specsText: 2 },
    text: (d, field) =>
      field === 'title' ? d.title : field === 'specsText' ? d.specsText : d.description,
    // Sizes and lengths match exactly; words get prefix and (from 5 letters) one-typo matching.
    prefix: (term) => term.length > 2 && !/\d/.test(term),
    fuzzy: (term) => (term.length < 5 || /\d/.test(term) ? 0 : 1),
    // The exchange's tokenizer, which reads the queries too (sizes, fractions, grades, lengths).
    terms: termsOf,
  });

let index = newIndex();
/** Results of recent identical searches; emptied on every index write, so it never serves stale hits. */
const cache = new Map<string, { hits: SearchHit[]; total: number; atMs: number }>();
const CACHE_MAX = 500;
export const CACHE_TTL_MS = 60_000;
/** Bumped on every index write; anything derived from search results keys on it. */
let version = 0;
let ready: Promise<void> | null = null;
/**
 * Catch-up from other API processes: the newest `listings.updated_at` (DATETIME(3)) this index has read, and
 * which change of each recent row it has applied. Polls re-read from OVERLAP_MS before the watermark, so a
 * transaction that committed late with an earlier timestamp is still seen; the map skips rows already applied.
 */
let watermarkMs = 0;
const applied = new Map<number, number>();
const OVERLAP_MS = 5_000;

function sequelizeOf(): Sequelize {
  const s = Listing.sequelize;
  if (!s) throw new Error('Models are not initialised');
  return s;
}

/** Rebuilds the whole index from MariaDB; returns how many listings it holds. */
export async function rebuildListingIndex(): Promise<number> {
  const [newest] = await sequelizeOf().query<{ at: Date | string | null }>(
    'SELECT MAX(updated_at) AS at FROM listings',
    { type: QueryTypes.SELECT },
  );
  const rows = await sequelizeOf().query<Row>(SELECT_SEARCHABLE, { type: QueryTypes.SELECT });
  const fresh = newIndex();
  const all = rows.map(toDoc);
  for (const d of all) fresh.upsert(d);
  index = fresh;
  cache.clear();
  version += 1;
  watermarkMs = newest?.at ? new Date(newest.at).getTime() : 0;
  applied.clear();
  // What this read already holds is applied: the first catch-up re-reads none of it (a bulk import writes
  // thousands of rows within the overlap, and re-reading them one by one emptied the result cache each time).
  for (const r of rows) {
    const atMs = new Date(r.updated_at).getTime();
    if (atMs >= watermarkMs - OVERLAP_MS) applied.set(r.id, atMs);
  }
  ready = Promise.resolve();
  return all.length;
}

/** Builds the index on first use (at start, or on the first search), once. */
export function ensureListingIndex(): Promise<void> {
  ready ??= rebuildListingIndex().then(
    () => undefined,
    (err: unknown) => {
      ready = null;
      throw err;
    },
  );
  return ready;
}

const rereadListeners: ((ids: readonly number[]) => void)[] = [];
/**
 * Calls `fn` with the ids of listings re-read after a write, in this process or (through the catch-up) another
 * one, so copies of those listings' pages can be dropped.
 */
export function onListingsReread(fn: (ids: readonly number[]) => void) {
  rereadListeners.push(fn);
}

/**
 * Re-reads listings in one query: each indexed when active and visible, removed otherwise. The result cache is
 * emptied once, and only when the index changed (a listing that was neither indexed nor is now changes nothing).
 */
async function reread(ids: readonly number[]): Promise<Row[]> {
  if (!ids.length) return [];
  const rows = await sequelizeOf().query<Row>(`${SELECT_SEARCHABLE} AND l.id IN (?)`, {
    type: QueryTypes.SELECT,
    replacements: [ids],
  });
  const byId = new Map(rows.map((r) => [r.id, r]));
  let changed = false;
  for (const id of ids) {
    const row = byId.get(id);
    if (row) {
      index.upsert(toDoc(row));
      changed = true;
    } else if (index.get(id)) {
      index.remove(id);
      changed = true;
    }
  }
  if (changed) {
    cache.clear();
    version += 1;
  }
  for (const fn of rereadListeners) fn(ids);
  return rows;
}

/** Re-reads one listing after a write: indexed when active and visible, removed otherwise. */
export async function refreshListing(id: number): Promise<void> {
  await ensureListingIndex();
  const [row] = await reread([id]);
  if (row) applied.set(id, new Date(row.updated_at).getTime());
}

/**
 * Re-reads every listing changed since the watermark (by this or another process sharing the database): indexed
 * when active and visible, removed otherwise. Returns how many rows it re-read.
 */
export async function catchUpListingIndex(): Promise<number> {
  await ensureListingIndex();
  const rows = await sequelizeOf().query<{ id: number; updated_at: Date | string }>(
    'SELECT id, updated_at FROM listings WHERE updated_at >= ? ORDER BY updated_at LIMIT 1000',
    { type: QueryTypes.SELECT, replacements: [new Date(watermarkMs - OVERLAP_MS)] },
  );
  const due = new Map<number, number>();
  for (const r of rows) {
    const atMs = new Date(r.updated_at).getTime();
    if (atMs > watermarkMs) watermarkMs = atMs;
    if (applied.get(r.id) !== atMs) due.set(r.id, atMs);
  }
  await reread([...due.keys()]);
  for (const [id, atMs] of due) applied.set(id, atMs);
  for (const [id, atMs] of applied) if (atMs < watermarkMs - OVERLAP_MS) applied.delete(id);
  return due.size;
}

/** Records a change kept outside the listing row (its photos), so other processes re-read the listing too. */
export async function listingChanged(id: number): Promise<void> {
  await sequelizeOf().query('UPDATE listings SET updated_at = ? WHERE id = ?', {
    replacements: [new Date(), id],
  });
  await refreshListing(id);
}

export interface SearchHit {
  doc: IndexedListing;
  fit?: FitDto;
}

/**
 * Full-text search (fuzzy and prefix over title, description and specs) with facet filters, "fits my boat"
 * flags and sorting, entirely in memory. `needs` adds a fit flag to each hit; `fitsOnly` keeps only "fits".
 */
export function searchIndex(
  query: ListingSearch,
  needs?: BoatNeeds,
  nowMs = Date.now(),
): { hits: SearchHit[]; total: number; tookMs: number } {
  const started = performance.now();
  const key = needs ? null : JSON.stringify(query);
  const cached = key ? cache.get(key) : undefined;
  if (cached && nowMs - cached.atMs < CACHE_TTL_MS)
    return { hits: cached.hits, total: cached.total, tookMs: performance.now() - started };
  const result = runSearch(query, needs, nowMs);
  if (key) {
    if (cache.size >= CACHE_MAX) cache.delete(cache.keys().next().value ?? '');
    cache.set(key, { ...result, atMs: nowMs });
  }
  return { ...result, tookMs: performance.now() - started };
}

/** Hits of a planned query over the index (every document passing `keep` when it has no terms). */
function searchPlan(plan: QueryPlan, keep: (d: IndexedListing) => boolean): Scored[] {
  const ok = (d: IndexedListing) => longEnough(d, plan.minLengthM) && keep(d);
  if (plan.groups.length > 0) return index.search(plan.groups, ok);
  const out: Scored[] = [];
  for (const doc of index.all()) if (ok(doc)) out.push({ doc, score: 0 });
  return out;
}

function runSearch(
  query: ListingSearch,
  needs: BoatNeeds | undefined,
  nowMs: number,
): { hits: SearchHit[]; total: number } {
  const q = query.q?.trim();
  const fitsOnly = needs && query.fitsOnly ? needs : undefined;
  const fits = new Map<number, FitDto>();
  const keep = (d: IndexedListing) => {
    if (!passes(d, query, nowMs)) return false;
    if (!fitsOnly) return true;
    const fit = fitOf(d.rating, fitsOnly);
    fits.set(d.id, fit);
    return fit.status === 'fits';
  };
  let matched: Scored[];
  if (q) {
    matched = searchPlan(planOf(q, false), keep);
    // Nothing with one typo per word: also try each word with two neighbouring letters swapped ("chian").
    if (matched.length === 0) matched = searchPlan(planOf(q, true), keep);
  } else {
    matched = [];
    for (const doc of index.all()) if (keep(doc)) matched.push({ doc, score: 0 });
  }
  const sort = query.sort ?? (q ? 'relevance' : 'newest');
  const order: (a: Scored, b: Scored) => number =
    sort === 'relevance' && q
      ? (a, b) => b.score - a.score || ORDERS.newest(a.doc, b.doc)
      : (a, b) => ORDERS[sort === 'relevance' ? 'newest' : sort](a.doc, b.doc);
  const start = (query.page - 1) * query.pageSize;
  const page = topK(matched, start + query.pageSize, order).slice(start);
  const hits: SearchHit[] = page.map(({ doc }) => {
    const fit = needs ? (fits.get(doc.id) ?? fitOf(doc.rating, needs)) : undefined;
    return fit ? { doc, fit } : { doc };
  });
  return { hits, total: matched.length };
}

/** True when the indexed listing `id` matches a saved search's criteria. */
export function matchesCriteria(id: number, c: SavedSearchCriteria, nowMs = Date.now()): boolean {
  const d = index.get(id);
  if (!d || !passes(d, c, nowMs)) return false;
  const q = c.q?.trim();
  if (!q) return true;
  const only = (x: IndexedListing) => x.id === id;
  return (
    searchPlan(planOf(q, false), only).length > 0 || searchPlan(planOf(q, true), only).length > 0
  );
}

/** Changes whenever the index does (a listing written, the index rebuilt). */
export const listingIndexVersion = () => version;

/** Empties the result cache (the benchmark times uncached searches with it). */
export const clearListingSearchCache = () => cache.clear();
