import { clubLocaleSchema } from '@app/shared';
import { Router } from 'express';
import { currentUser, requireRole } from '../../middleware/require-auth';
import { recordAudit } from '../audit/audit.service';
import { cachedClub, clearClubCache } from './club-cache';
import { getSetting, setSetting } from './club.service';
import { ROLES_ADMIN } from '../../policies/roles';

export function clubRouter() {
  const r = Router();
  r.get('/', async (_req, res) => {
    res.json({ data: await cachedClub() });
  });
  /** `PUT /api/club/locale` (admin): the club's region, currency and default units. */
  r.put('/locale', requireRole(...ROLES_ADMIN), async (req, res) => {
    const next = clubLocaleSchema.parse(req.body);
    const before = await getSetting('locale');
    await setSetting('locale', next);
    await recordAudit({
      actorId: currentUser(req).id,
      area: 'admin',
      action: 'club.locale',
      subjectType: 'club',
      subjectId: 'locale',
      details: { before, after: next },
    });
    clearClubCache();
    res.json({ data: await cachedClub() });
  });
  return r;
}
