import { Router } from 'express';
import type { ClubDto } from '@app/shared';
import { getSetting, listHarbors } from './club.service';

export function clubRouter() {
  const r = Router();
  r.get('/', async (_req, res) => {
    const [name, harbors] = await Promise.all([getSetting('clubName'), listHarbors()]);
    const data: ClubDto = {
      name,
      harbors: harbors.map((h) => ({ id: h.id, name: h.name, slug: h.slug })),
    };
    res.json({ data });
  });
  return r;
}
