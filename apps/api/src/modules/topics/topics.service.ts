import type { z } from 'zod';
import type { topicInputSchema, topicOrderSchema, topicPatchSchema } from '@app/shared';
import { AppError, invalid, notFound } from '../../errors/app-error';
import { Post, Topic, type User } from '../../models';
import { recordAudit } from '../audit/audit.service';

type TopicInput = z.output<typeof topicInputSchema>;
type TopicPatch = z.output<typeof topicPatchSchema>;
type TopicOrder = z.output<typeof topicOrderSchema>;

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
  if (await nameTaken(input.name))
    throw new AppError('CONFLICT', 'A topic with that name already exists', {
      name: 'Another topic has this name',
    });
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

/**
 * Renames, describes, moves, retires or restores a topic (its slug stays, so links keep working). A new name
 * another topic already uses answers CONFLICT. Logged: retiring and restoring as their own actions.
 */
export async function updateTopic(actor: User, topicId: number, input: TopicPatch) {
  const topic = await Topic.findByPk(topicId);
  if (!topic) throw notFound('Topic');
  const { retired, ...fields } = input;
  if (fields.name !== undefined && (await nameTaken(fields.name, topicId)))
    throw new AppError('CONFLICT', 'A topic with that name already exists', {
      name: 'Another topic has this name',
    });
  const wasRetired = topic.retiredAt !== null;
  const previousName = topic.name;
  const changes: Partial<Pick<Topic, 'name' | 'description' | 'position' | 'retiredAt'>> = {
    ...fields,
  };
  if (retired !== undefined && retired !== wasRetired)
    changes.retiredAt = retired ? new Date() : null;
  await topic.update(changes);
  if (Object.keys(fields).length > 0)
    await audit(actor, 'topic.update', topic, { ...fields, previousName });
  if (retired !== undefined && retired !== wasRetired)
    await audit(actor, retired ? 'topic.retire' : 'topic.restore', topic, { name: topic.name });
  return topic;
}

/** Puts every topic in the given order (positions 10, 20, …) in one transaction. The list must name each topic once. Logged. */
export async function reorderTopics(actor: User, input: TopicOrder) {
  const all = await Topic.findAll({ attributes: ['id'] });
  const known = new Set(all.map((t) => t.id));
  if (input.topicIds.length !== known.size || input.topicIds.some((id) => !known.has(id)))
    throw invalid({ topicIds: 'List every topic exactly once' });
  const sequelize = Topic.sequelize;
  if (!sequelize) throw new Error('Models are not initialised');
  await sequelize.transaction(async (transaction) => {
    for (const [i, id] of input.topicIds.entries())
      await Topic.update({ position: (i + 1) * 10 }, { where: { id }, transaction });
    await recordAudit(
      {
        actorId: actor.id,
        area: 'admin',
        action: 'topic.reorder',
        subjectType: 'topic',
        subjectId: 'all',
        details: { topicIds: input.topicIds },
      },
      transaction,
    );
  });
  return listTopics();
}

const nameTaken = async (name: string, exceptId?: number) => {
  const others = await Topic.findAll({ attributes: ['id', 'name', 'slug'] });
  const slug = slugify(name);
  return others.some(
    (t) => t.id !== exceptId && (t.slug === slug || t.name.toLowerCase() === name.toLowerCase()),
  );
};

const audit = (actor: User, action: string, topic: Topic, details: Record<string, unknown>) =>
  recordAudit({
    actorId: actor.id,
    area: 'admin',
    action,
    subjectType: 'topic',
    subjectId: String(topic.id),
    details,
  });

/** Deletes a topic no post uses; otherwise CONFLICT (retire it instead). Logged. */
export async function deleteTopic(actor: User, topicId: number) {
  const topic = await Topic.findByPk(topicId);
  if (!topic) throw notFound('Topic');
  if ((await Post.count({ where: { topicId } })) > 0)
    throw new AppError('CONFLICT', 'Posts are filed under this topic: retire it instead');
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
