import { Router } from 'express';
import {
  idParam,
  topicInputSchema,
  topicOrderSchema,
  topicPatchSchema,
  type TopicDto,
} from '@app/shared';
import { currentUser, requireRole } from '../../middleware/require-auth';
import type { Topic } from '../../models';
import * as topics from './topics.service';
import { ROLES_ADMIN } from '../../policies/roles';

const params = idParam('topicId');
const toTopicDto = (t: Topic, postCount = 0): TopicDto => ({
  id: t.id,
  slug: t.slug,
  name: t.name,
  description: t.description,
  position: t.position,
  retired: t.retiredAt !== null,
  postCount,
});

/** Topics of the trade: everyone reads the list (retired ones flagged); admins add, rename, reorder and retire. */
export function topicsRouter() {
  const r = Router();
  r.get('/', async (_req, res) => {
    res.json({ data: (await topics.listTopics()).map((x) => toTopicDto(x.topic, x.postCount)) });
  });
  r.post('/', requireRole(...ROLES_ADMIN), async (req, res) => {
    const t = await topics.createTopic(currentUser(req), topicInputSchema.parse(req.body));
    res.status(201).json({ data: toTopicDto(t) });
  });
  r.put('/order', requireRole(...ROLES_ADMIN), async (req, res) => {
    const list = await topics.reorderTopics(currentUser(req), topicOrderSchema.parse(req.body));
    res.json({ data: list.map((x) => toTopicDto(x.topic, x.postCount)) });
  });
  r.patch('/:topicId', requireRole(...ROLES_ADMIN), async (req, res) => {
    const { topicId } = params.parse(req.params);
    const t = await topics.updateTopic(
      currentUser(req),
      Number(topicId),
      topicPatchSchema.parse(req.body),
    );
    res.json({ data: toTopicDto(t) });
  });
  r.delete('/:topicId', requireRole(...ROLES_ADMIN), async (req, res) => {
    const { topicId } = params.parse(req.params);
    await topics.deleteTopic(currentUser(req), Number(topicId));
    res.status(204).end();
  });
  return r;
}
