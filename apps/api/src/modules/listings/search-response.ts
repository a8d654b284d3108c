import { createHash } from 'node:crypto';
import type { ListingSearch, ListingSearchResultDto } from '@app/shared';
import type { BoatNeeds } from './fit';
import { CACHE_TTL_MS, listingIndexVersion, searchIndex } from './listing-index';
import { toListingSummaryDto } from './listings.presenter';

interface Prepared {
  body: string;
  etag: string;
}

/** Serialized answers to recent searches without a boat (the same for every viewer), per index version. */
const answers = new Map<string, Prepared & { version: number; atMs: number }>();
const ANSWERS_MAX = 500;

function prepare(query: ListingSearch, needs: BoatNeeds | undefined): Prepared {
  const result = searchIndex(query, needs);
  const payload: ListingSearchResultDto = {
    data: result.hits.map(toListingSummaryDto),
    meta: {
      page: query.page,
      pageSize: query.pageSize,
      total: result.total,
      tookMs: result.tookMs,
      ...(needs ? { fitBasis: needs.basis } : {}),
    },
  };
  const body = JSON.stringify(payload);
  return { body, etag: `W/"${createHash('sha1').update(body).digest('base64url')}"` };
}

/**
 * The JSON body and ETag of a search page. A search without a boat is serialized once per index version (and
 * at most a minute, so listings past their expiry drop out); `fitsBoat` answers depend on the viewer's boat.
 */
export function searchResponse(
  query: ListingSearch,
  needs?: BoatNeeds,
  nowMs = Date.now(),
): Prepared {
  if (needs) return prepare(query, needs);
  const key = JSON.stringify(query);
  const version = listingIndexVersion();
  const hit = answers.get(key);
  if (hit && hit.version === version && nowMs - hit.atMs < CACHE_TTL_MS) return hit;
  const fresh = { ...prepare(query, undefined), version, atMs: nowMs };
  answers.delete(key);
  if (answers.size >= ANSWERS_MAX) answers.delete(answers.keys().next().value ?? '');
  answers.set(key, fresh);
  return fresh;
}
