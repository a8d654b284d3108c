import { LRUCache } from 'lru-cache';
import type { ClubDto } from '@app/shared';
import { ClubSetting, Harbor } from '../../models';
import { getSetting, listHarbors } from './club.service';

/** How long the club's name and harbours may be reused; writes in this process clear them at once. */
export const CLUB_TTL_MS = 30_000;

// Every page asks for the club (name and harbours), which changes a few times a year: read it from MariaDB
// once per 30 s per process instead of twice per request; concurrent misses share one load.
const cache = new LRUCache<'club', ClubDto>({
  max: 1,
  ttl: CLUB_TTL_MS,
  fetchMethod: loadClub,
});

async function loadClub(): Promise<ClubDto> {
  const [name, harbors] = await Promise.all([getSetting('clubName'), listHarbors()]);
  return { name, harbors: harbors.map((h) => ({ id: h.id, name: h.name, slug: h.slug })) };
}

/** The club as GET /api/club answers it. */
export async function cachedClub(): Promise<ClubDto> {
  return (await cache.fetch('club')) ?? loadClub();
}

export const clearClubCache = () => cache.clear();

const HOOKS = [
  'afterCreate',
  'afterUpdate',
  'afterSave',
  'afterDestroy',
  'afterUpsert',
  'afterBulkCreate',
  'afterBulkUpdate',
  'afterBulkDestroy',
] as const;
interface HookTarget {
  removeHook(hook: string, name: string): unknown;
  addHook(hook: string, name: string, fn: () => void): unknown;
}

/** Clears the cache on any write to club settings or harbours (named hooks: building the app again replaces them). */
export function clearClubCacheOnWrites() {
  for (const model of [ClubSetting, Harbor] as unknown as HookTarget[])
    for (const hook of HOOKS) {
      model.removeHook(hook, 'club-cache');
      model.addHook(hook, 'club-cache', clearClubCache);
    }
}
