import { LRUCache } from 'lru-cache';
import { setDisplayLocale, type ClubDto } from '@app/shared';
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
  const [name, harbors, locale] = await Promise.all([
    getSetting('clubName'),
    listHarbors(),
    getSetting('locale'),
  ]);
  // Mails and messages this process writes use the club's region from here on.
  setDisplayLocale(locale.region);
  return { name, harbors: harbors.map((h) => ({ id: h.id, name: h.name, slug: h.slug })), locale };
}

/** The club as GET /api/club answers it. */
export async function cachedClub(): Promise<ClubDto> {
  try {
    return (await cache.fetch('club')) ?? (await loadClub());
  } catch {
    // A write cleared the cache during the load, which aborts it (so no copy from before the write is kept);
    // a database error simply happens again here and reaches the error handler.
    return loadClub();
  }
}

export const clearClubCache = () => cache.clear();
