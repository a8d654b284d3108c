import { Router } from 'express';
import { currentUser, requireAuth } from '../../middleware/require-auth';
import { listNotifications, markAllRead } from './notifications.service';
import { toNotificationDto } from './posts.presenter';

/** The signed-in member's in-app notices. */
export function notificationsRouter() {
  const r = Router();
  r.use(requireAuth());
  r.get('/', async (req, res) => {
    const { rows, unread } = await listNotifications(currentUser(req));
    res.json({ data: rows.map(toNotificationDto), meta: { unread } });
  });
  r.post('/read', async (req, res) => {
    await markAllRead(currentUser(req));
    res.status(204).end();
  });
  return r;
}
