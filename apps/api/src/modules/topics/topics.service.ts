import type { z } from 'zod';
import type { topicInputSchema, topicPatchSchema } from '@app/shared';
import { AppError, notFound } from '../../errors/app-error';
import { Post, Topic, type User } from '../../models';
import { recordAudit } from '../audit/audit.service';

type TopicInput = z.output<typeof topicInputSchema>;
type TopicPatch = z.output<typeof topicPatchSchema>;

/** A URL-safe slug from a topic name ("Rode & chain" → "rode-chain"). */
export const slugify = (name: string) =>
  name
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^\w\s-]/g, '')
    .trim()
    .replace(/[\s_-]+/g, '-')
    .slice(0, 60) || 'topic';

/** Every topic in display order, with how many published posts each holds. */
export async function listTopics() {
  const [topics, rows] = await Promise.all([
    Topic.findAll({
      order: [
        ['position', 'ASC'],
        ['name', 'ASC'],
      ],
    }),
    Post.count({ where: { status: 'approved' }, group: ['topicId'] }) as unknown as Promise<
      Array<{ topicId: number | null; count: number }>
    >,
  ]);
  const counts = new Map(rows.map((r) => [r.topicId, Number(r.count)]));
  return topics.map((t) => ({ topic: t, postCount: counts.get(t.id) ?? 0 }));
}

/** Adds a topic (admins); a name whose slug is taken answers CONFLICT. Logged. */
export async function createTopic(actor: User, input: TopicInput) {
  const slug = slugify(input.name);
  if (await Topic.findOne({ where: { slug } }))
    throw new AppError('CONFLICT', 'A topic with that name already exists');
  const topic = await Topic.create({ ...input, slug });
  await recordAudit({
    actorId: actor.id,
    area: 'admin',
    action: 'topic.create',
    subjectType: 'topic',
    subjectId: String(topic.id),
    details: { name: topic.name },
  });
  return topic;
}

/** Renames, describes or moves a topic (its slug stays, so links keep working). Logged. */
export async function updateTopic(actor: User, topicId: number, input: TopicPatch) {
  const topic = await Topic.findByPk(topicId);
  if (!topic) throw notFound('Topic');
  await topic.update(input);
  await recordAudit({
    actorId: actor.id,
    area: 'admin',
    action: 'topic.update',
    subjectType: 'topic',
    subjectId: String(topic.id),
    details: input,
  });
  return topic;
}

/** Deletes a topic no post uses; otherwise CONFLICT. Logged. */
export async function deleteTopic(actor: User, topicId: number) {
  const topic = await Topic.findByPk(topicId);
  if (!topic) throw notFound('Topic');
  if ((await Post.count({ where: { topicId } })) > 0)
    throw new AppError('CONFLICT', 'Posts are filed under this topic: move them first');
  await topic.destroy();
  await recordAudit({
    actorId: actor.id,
    area: 'admin',
    action: 'topic.delete',
    subjectType: 'topic',
    subjectId: String(topicId),
    details: { name: topic.name },
  });
}
