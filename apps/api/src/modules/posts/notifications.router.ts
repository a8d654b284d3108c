import { Router } from 'express';
import { idParam } from '@app/shared';
import { currentUser, requireAuth } from '../../middleware/require-auth';
import { countUnread, listNotifications, markAllRead, markOneRead } from './notifications.service';
import { toNotificationDto } from './posts.presenter';

const params = idParam('notificationId');

/** The signed-in member's in-app notices. */
export function notificationsRouter() {
  const r = Router();
  r.use(requireAuth());
  r.get('/', async (req, res) => {
    const { rows, unread } = await listNotifications(currentUser(req));
    res.json({ data: rows.map(toNotificationDto), meta: { unread } });
  });
  r.get('/unread', async (req, res) => {
    res.json({ data: { unread: await countUnread(currentUser(req)) } });
  });
  r.post('/read', async (req, res) => {
    await markAllRead(currentUser(req));
    res.status(204).end();
  });
  r.post('/:notificationId/read', async (req, res) => {
    const { notificationId } = params.parse(req.params);
    const notice = await markOneRead(currentUser(req), Number(notificationId));
    res.json({ data: toNotificationDto(notice) });
  });
  return r;
}
