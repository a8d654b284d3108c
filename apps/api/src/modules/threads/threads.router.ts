import type { Sequelize } from 'sequelize';
import { Router } from 'express';
import { z } from 'zod';
import { idParam, messageInputSchema } from '@app/shared';
import { limiter } from '../../lib/rate-limit';
import { currentUser, requireAuth } from '../../middleware/require-auth';
import * as threads from './threads.service';

const params = idParam('threadId');
const openSchema = messageInputSchema.extend({
  listingId: z.number({ error: 'Choose a listing' }).int().positive('Choose a listing'),
});

/** `/api/threads`: buyer–seller conversations about listings. */
export function threadsRouter(deps: {
  publicUrl: string;
  messageLimit: number;
  sequelize?: Sequelize;
}) {
  const r = Router();
  r.use(requireAuth());
  // Opening a conversation and replying share one budget per member, so no one can flood sellers' inboxes.
  const messageLimit = limiter({
    limit: deps.messageLimit,
    windowMs: 10 * 60_000,
    what: 'messages in a short time',
    ...(deps.sequelize ? { sequelize: deps.sequelize, name: 'messages' } : {}),
    key: (req) => `user:${currentUser(req).id}`,
  });
  r.get('/', async (req, res) => {
    res.json({ data: await threads.inbox(currentUser(req)) });
  });
  r.get('/unread', async (req, res) => {
    res.json({ data: { unread: await threads.unreadTotal(currentUser(req)) } });
  });
  r.post('/', messageLimit, async (req, res) => {
    const input = openSchema.parse(req.body);
    const t = await threads.openThread(
      deps.publicUrl,
      currentUser(req),
      input.listingId,
      input.body,
    );
    res.status(201).json({ data: await threads.readThread(currentUser(req), t.id) });
  });
  r.get('/:threadId', async (req, res) => {
    const { threadId } = params.parse(req.params);
    res.json({ data: await threads.readThread(currentUser(req), Number(threadId)) });
  });
  r.post('/:threadId/messages', messageLimit, async (req, res) => {
    const { threadId } = params.parse(req.params);
    const { body } = messageInputSchema.parse(req.body);
    await threads.reply(deps.publicUrl, currentUser(req), Number(threadId), body);
    res.status(201).json({ data: await threads.readThread(currentUser(req), Number(threadId)) });
  });
  return r;
}
