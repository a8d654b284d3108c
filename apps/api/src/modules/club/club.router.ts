import { Router } from 'express';
import { cachedClub, clearClubCacheOnWrites } from './club-cache';

export function clubRouter() {
  const r = Router();
  clearClubCacheOnWrites();
  r.get('/', async (_req, res) => {
    res.json({ data: await cachedClub() });
  });
  return r;
}
