import type { z } from 'zod';
import { UniqueConstraintError, type Transaction } from 'sequelize';
import type { CommentDto, commentInputSchema } from '@app/shared';
import { AppError, invalid, notFound } from '../../errors/app-error';
import { Comment, Post, User, Vote } from '../../models';
import { recordAudit } from '../audit/audit.service';
import { notify } from './notifications.service';
import { loadVisiblePost } from './post-access';
import { canAcceptAnswer, canSeeComment, canVoteOn, isPostAuthor } from '../../policies/posts';
import { hasModeratorRole } from '../../policies/roles';
import { toCommentDto } from './posts.presenter';

type CommentInput = z.output<typeof commentInputSchema>;

export const postPath = (postId: number) => `/knowledge/${postId}`;

/** Tells the post's author (and the parent comment's author) about a newly visible reply. */
export async function notifyReply(
  comment: Comment,
  transaction?: Transaction,
): Promise<Array<{ userId: number; notificationId: number }>> {
  const post = await Post.findByPk(comment.postId, { transaction });
  if (!post) return [];
  const told = new Set<number>([comment.authorId]);
  const sent: Array<{ userId: number; notificationId: number }> = [];
  const tell = async (userId: number, message: string) => {
    if (told.has(userId)) return;
    told.add(userId);
    const n = await notify(userId, 'reply', message, postPath(post.id), transaction);
    sent.push({ userId, notificationId: n.id });
  };
  if (comment.parentId) {
    const parent = await Comment.findByPk(comment.parentId, { transaction });
    if (parent) await tell(parent.authorId, `New reply to your comment on “${post.title}”`);
  }
  await tell(
    post.authorId,
    `New ${post.kind === 'question' ? 'answer' : 'comment'} on “${post.title}”`,
  );
  return sent;
}

/**
 * Adds a comment (or a reply one level under a top-level comment) to an approved, unlocked post. A member's
 * comment waits for moderation; a moderator's is published at once and logged.
 */
export async function addComment(actor: User, postId: number, input: CommentInput) {
  const post = await loadVisiblePost(actor, postId);
  if (post.status !== 'approved')
    throw new AppError('CONFLICT', 'Comments open once the post is published');
  if (post.lockedAt) throw new AppError('CONFLICT', 'This post is locked: no new comments');
  if (input.parentId) {
    const parent = await Comment.findByPk(input.parentId);
    if (!parent || parent.postId !== post.id || !canSeeComment(actor, parent))
      throw invalid({ parentId: 'That comment is not on this post' });
    if (parent.parentId !== null) throw invalid({ parentId: 'Reply to the top-level comment' });
  }
  const mod = hasModeratorRole(actor);
  const comment = await Comment.create({
    postId: post.id,
    authorId: actor.id,
    parentId: input.parentId ?? null,
    body: input.body,
    status: mod ? 'approved' : 'pending',
    moderationNote: null,
  });
  if (mod) {
    await recordAudit({
      actorId: actor.id,
      area: 'moderation',
      action: 'comment.self-publish',
      subjectType: 'comment',
      subjectId: String(comment.id),
      details: { postId: post.id },
    });
    await notifyReply(comment);
  }
  return comment;
}

/** The comments of a post the viewer may read, as a thread one level deep, oldest first. */
export async function commentThread(viewer: User | null, post: Post): Promise<CommentDto[]> {
  const rows = await Comment.findAll({
    where: { postId: post.id },
    include: [{ model: User, as: 'author', attributes: ['id', 'displayName'] }],
    order: [['id', 'ASC']],
  });
  const visible = rows.filter((c) => canSeeComment(viewer, c));
  const top = new Map<number, CommentDto>();
  for (const c of visible)
    if (c.parentId === null) top.set(c.id, toCommentDto(c, post.acceptedCommentId));
  for (const c of visible)
    if (c.parentId !== null) top.get(c.parentId)?.replies.push(toCommentDto(c, null));
  return [...top.values()];
}

/**
 * Marks (or, with null, clears) the accepted answer of a question. The asker or a moderator may do it; the
 * answer must be an approved top-level comment. A moderator doing it on someone else's question is logged.
 */
export async function acceptAnswer(actor: User, postId: number, commentId: number | null) {
  const post = await loadVisiblePost(actor, postId);
  if (!canAcceptAnswer(actor, post))
    throw new AppError('FORBIDDEN', 'Only the asker or a moderator can accept an answer');
  if (post.kind !== 'question') throw new AppError('CONFLICT', 'Only questions have answers');
  let answer: Comment | null = null;
  if (commentId !== null) {
    answer = await Comment.findByPk(commentId);
    if (!answer || answer.postId !== post.id || answer.status !== 'approved' || answer.parentId)
      throw invalid({ commentId: 'Choose a published answer on this question' });
  }
  await post.update({ acceptedCommentId: commentId });
  if (!isPostAuthor(actor, post))
    await recordAudit({
      actorId: actor.id,
      area: 'moderation',
      action: commentId ? 'post.accept-answer' : 'post.clear-answer',
      subjectType: 'post',
      subjectId: String(post.id),
      details: { commentId },
    });
  if (answer && answer.authorId !== actor.id)
    await notify(
      answer.authorId,
      'accepted',
      `The asker says your answer on “${post.title}” worked`,
      postPath(post.id),
    );
  return post;
}

async function recount(post: Post) {
  await post.update({ helpfulCount: await Vote.count({ where: { postId: post.id } }) });
  return post.helpfulCount;
}

/** Marks a published post helpful (once per member; voting again changes nothing). Not on one's own post. */
export async function vote(actor: User, postId: number) {
  const post = await loadVisiblePost(actor, postId);
  if (post.status !== 'approved') throw notFound('Post');
  if (!canVoteOn(actor, post))
    throw new AppError('CONFLICT', 'You cannot mark your own post helpful');
  try {
    await Vote.create({ postId: post.id, userId: actor.id });
  } catch (err) {
    if (!(err instanceof UniqueConstraintError)) throw err;
  }
  return recount(post);
}

/** Takes back the actor's helpful vote. */
export async function unvote(actor: User, postId: number) {
  const post = await loadVisiblePost(actor, postId);
  await Vote.destroy({ where: { postId: post.id, userId: actor.id } });
  return recount(post);
}
