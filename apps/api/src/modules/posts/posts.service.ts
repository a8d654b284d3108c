import type { z } from 'zod';
import { Op } from 'sequelize';
import type { createPostSchema, postListQuerySchema, postPatchSchema } from '@app/shared';
import { AppError, invalid, notFound } from '../../errors/app-error';
import { Boat, Post, Topic, Vote, type PostRevision, type User } from '../../models';
import { recordAudit } from '../audit/audit.service';
import { getSetting } from '../club/club.service';
import { indexPost } from './post-index';
import { renderBody } from './body-render';
import { editRatio } from './edit-size';
import { POST_INCLUDE, loadOwnPost, publicWhere } from './post-access';
import { publishesWithoutReview } from '../../policies/posts';
import { computeSetupCard } from './setup-card';
import { trackPostImages } from '../uploads/image-quota';
import { ownsBoat } from '../../policies/boats';

type CreateInput = z.output<typeof createPostSchema>;
type PatchInput = z.output<typeof postPatchSchema>;
type ListQuery = z.output<typeof postListQuerySchema>;

export const PAGE_SIZE = 20;

/** `currentTopicId`: the post's topic before this edit, which it may keep even when retired. */
async function checkRefs(actor: User, input: PatchInput, currentTopicId?: number | null) {
  if (input.topicId !== undefined && input.topicId !== currentTopicId) {
    const topic = await Topic.findByPk(input.topicId);
    if (!topic) throw invalid({ topicId: 'Choose one of the topics' });
    if (topic.retiredAt !== null)
      throw invalid({ topicId: 'This topic is retired: choose another one' });
  }
  if (input.boatId) {
    const boat = await Boat.findByPk(input.boatId);
    if (!boat || !ownsBoat(actor, boat)) throw invalid({ boatId: 'Choose one of your boats' });
  }
  if (input.visibility === 'members' && !(await getSetting('membersOnlyPostsAllowed')))
    throw invalid({ visibility: 'This club publishes every post publicly' });
  if (input.setup) computeSetupCard(input.setup);
}

async function selfPublishAudit(actor: User, post: Post, action: string) {
  await recordAudit({
    actorId: actor.id,
    area: 'moderation',
    action,
    subjectType: 'post',
    subjectId: String(post.id),
    details: { title: post.title },
  });
}

/**
 * Creates a post. A draft unless `submit`; submitted posts go to the moderation queue as pending, while a
 * moderator's own post is published at once and logged. Throws VALIDATION_FAILED on a bad body or reference.
 */
export async function createPost(actor: User, input: CreateInput): Promise<Post> {
  await checkRefs(actor, input);
  const { html, text } = renderBody(input.body);
  const publishNow = input.submit && publishesWithoutReview(actor);
  const post = await Post.create({
    authorId: actor.id,
    topicId: input.topicId,
    boatId: input.boatId ?? null,
    kind: input.kind,
    title: input.title,
    bodyJson: input.body,
    bodyHtml: html,
    bodyText: text,
    approvedText: publishNow ? text : null,
    approvedTitle: publishNow ? input.title : null,
    status: publishNow ? 'approved' : input.submit ? 'pending' : 'draft',
    visibility: input.visibility,
    setup: input.setup ?? null,
    moderationNote: null,
    acceptedCommentId: null,
    pinnedAt: null,
    lockedAt: null,
    publishedAt: publishNow ? new Date() : null,
  });
  if (publishNow) await selfPublishAudit(actor, post, 'post.self-publish');
  await trackPostImages(null, html);
  await indexPost(post.id);
  return post;
}

const LINK = /<a\s[^>]*?href="([^"]*)"/g;
const IMAGE = /<img\s[^>]*?src="([^"]*)"/g;
const all = (re: RegExp, html: string) => [...html.matchAll(re)].map((m) => m[1] ?? '').sort();
const same = (a: unknown, b: unknown) => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

/** The reader-facing fields of a post as it stands (the published version for an approved post). */
const liveOf = (post: Post): PostRevision => ({
  kind: post.kind,
  title: post.title,
  topicId: post.topicId,
  boatId: post.boatId,
  visibility: post.visibility,
  setup: post.setup,
  bodyJson: post.bodyJson,
  bodyHtml: post.bodyHtml,
  bodyText: post.bodyText,
});

/**
 * Whether `next` differs from the published post only by a small text edit: the same kind, topic, boat,
 * visibility and setup card, the same links and images, and title plus text within the club's
 * `substantialEditRatio` of the version a moderator approved (not of the latest small edit, so small edits
 * cannot add up to a rewrite).
 */
async function isSmallTextEdit(post: Post, next: PostRevision): Promise<boolean> {
  const live = liveOf(post);
  const sameFrame =
    next.kind === live.kind &&
    next.topicId === live.topicId &&
    next.boatId === live.boatId &&
    next.visibility === live.visibility &&
    same(next.setup, live.setup) &&
    same(all(LINK, next.bodyHtml), all(LINK, live.bodyHtml)) &&
    same(all(IMAGE, next.bodyHtml), all(IMAGE, live.bodyHtml));
  if (!sameFrame) return false;
  const before = `${post.approvedTitle ?? post.title}\n${post.approvedText ?? post.bodyText}`;
  const after = `${next.title}\n${next.bodyText}`;
  return editRatio(before, after) <= (await getSetting('substantialEditRatio'));
}

/**
 * Saves the author's edit (autosave uses this too). Drafts and posts not yet published take the edit as it is.
 * For a published post, a small text edit is published at once; anything more (see isSmallTextEdit) becomes a
 * revision that waits for a moderator while readers keep seeing the published version. A moderator's own edit
 * is published at once and logged. Someone else's post reads as not found.
 */
export async function updatePost(actor: User, postId: number, input: PatchInput): Promise<Post> {
  const post = await loadOwnPost(actor, postId);
  await checkRefs(actor, input, post.revision?.topicId ?? post.topicId);
  const base: PostRevision = post.revision ?? liveOf(post);
  const next: PostRevision = { ...base };
  if (input.kind !== undefined) next.kind = input.kind;
  if (input.title !== undefined) next.title = input.title;
  if (input.topicId !== undefined) next.topicId = input.topicId;
  if (input.visibility !== undefined) next.visibility = input.visibility;
  if (input.boatId !== undefined) next.boatId = input.boatId;
  if (input.setup !== undefined) next.setup = input.setup;
  if (input.body !== undefined) {
    const { html, text } = renderBody(input.body);
    Object.assign(next, { bodyJson: input.body, bodyHtml: html, bodyText: text });
  }
  if (post.status !== 'approved') {
    await post.update(next);
  } else if (publishesWithoutReview(actor)) {
    await post.update({
      ...next,
      approvedText: next.bodyText,
      approvedTitle: next.title,
      revision: null,
      revisionStatus: null,
    });
    await selfPublishAudit(actor, post, 'post.self-edit');
  } else if (await isSmallTextEdit(post, next)) {
    await post.update({ ...next, revision: null, revisionStatus: null });
  } else {
    await post.update({ revision: next, revisionStatus: 'pending' });
  }
  if (input.body !== undefined) await trackPostImages(base.bodyHtml, next.bodyHtml);
  await indexPost(post.id);
  return post;
}

/** Sends a draft, rejected or sent-back post to moderation (a moderator's own post publishes at once). */
export async function submitPost(actor: User, postId: number): Promise<Post> {
  const post = await loadOwnPost(actor, postId);
  // A published post: its edits are already where they belong (published, or a revision in the queue); a
  // revision a moderator sent back goes to the queue again.
  if (post.status === 'approved') {
    if (post.revision && post.revisionStatus !== 'pending')
      await post.update({ revisionStatus: 'pending' });
    return post;
  }
  if (!['draft', 'rejected', 'changes-requested'].includes(post.status))
    throw new AppError('CONFLICT', `This post is ${post.status}; there is nothing to submit`);
  if (publishesWithoutReview(actor)) {
    await post.update({
      status: 'approved',
      approvedText: post.bodyText,
      approvedTitle: post.title,
      publishedAt: post.publishedAt ?? new Date(),
      moderationNote: null,
    });
    await selfPublishAudit(actor, post, 'post.self-publish');
  } else await post.update({ status: 'pending' });
  await indexPost(post.id);
  return post;
}

/** Deletes one of the actor's posts with its comments and votes. */
export async function deletePost(actor: User, postId: number) {
  const post = await loadOwnPost(actor, postId);
  const shown = `${post.bodyHtml}${post.revision?.bodyHtml ?? ''}`;
  await post.destroy();
  await trackPostImages(shown, null);
  await indexPost(postId);
}

/** Approved posts the viewer may read, pinned first, then newest; filtered by topic slug and kind. */
export async function listPosts(viewer: User | null, q: ListQuery) {
  const topic = q.topic ? await Topic.findOne({ where: { slug: q.topic } }) : null;
  if (q.topic && !topic) throw notFound('Topic');
  const where = {
    ...publicWhere(viewer),
    ...(topic ? { topicId: topic.id } : {}),
    ...(q.kind ? { kind: q.kind } : {}),
  };
  const { rows, count } = await Post.findAndCountAll({
    where,
    include: POST_INCLUDE,
    order: [
      ['pinnedAt', 'DESC'],
      ['publishedAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: PAGE_SIZE,
    offset: (q.page - 1) * PAGE_SIZE,
    distinct: true,
  });
  return { rows, total: count };
}

/** Every post of the actor, any status, newest change first. */
export const listOwnPosts = (actor: User) =>
  Post.findAll({
    where: { authorId: actor.id },
    include: POST_INCLUDE,
    order: [['updatedAt', 'DESC']],
    limit: 200,
  });

/** Posts by ids in the given order, for search results (ids no longer present drop out). */
export async function postsByIds(ids: number[]): Promise<Post[]> {
  if (ids.length === 0) return [];
  const rows = await Post.findAll({ where: { id: { [Op.in]: ids } }, include: POST_INCLUDE });
  const byId = new Map(rows.map((p) => [p.id, p]));
  return ids.flatMap((id) => byId.get(id) ?? []);
}

/** Whether the viewer has marked the post helpful. */
export async function hasVoted(viewer: User | null, postId: number) {
  return viewer ? (await Vote.count({ where: { postId, userId: viewer.id } })) > 0 : false;
}
