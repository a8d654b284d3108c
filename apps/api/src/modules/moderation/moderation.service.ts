import { Op, type Transaction } from 'sequelize';
import type { z } from 'zod';
import type { commentDecisionSchema, decisionSchema, postFlagsSchema } from '@app/shared';

import { AppError, notFound } from '../../errors/app-error';
import type { ModerationDecision } from '../../models';
import {
  AuditEvent,
  Comment,
  ListingReport,
  Post,
  Report,
  User,
  type PostRevision,
} from '../../models';
import { recordAudit } from '../audit/audit.service';
import { notifyReply, postPath } from '../posts/comments.service';
import { POST_INCLUDE } from '../posts/post-access';
import { indexPost } from '../posts/post-index';
import { DecisionRecord } from '../audit/decision-record';
import { tellAuthor } from './moderation-mail';

type Decision = z.output<typeof decisionSchema>;
type CommentDecision = z.output<typeof commentDecisionSchema>;
type Flags = z.output<typeof postFlagsSchema>;

export interface ModContext {
  publicUrl: string;
}

const audit = (
  actor: User,
  action: string,
  type: string,
  id: number,
  reason: string,
  details?: unknown,
) =>
  recordAudit({
    actorId: actor.id,
    area: 'moderation',
    action,
    subjectType: type,
    subjectId: String(id),
    reason: reason || null,
    details: details ?? null,
  });

/** Pending posts and comments, oldest first, and open reports. */
export async function queue() {
  const [posts, comments, reports] = await Promise.all([
    Post.findAll({
      where: {
        [Op.or]: [{ status: 'pending' }, { status: 'approved', revisionStatus: 'pending' }],
      },
      include: POST_INCLUDE,
      order: [['updatedAt', 'ASC']],
    }),
    Comment.findAll({
      where: { status: 'pending' },
      include: [
        { model: User, as: 'author', attributes: ['id', 'displayName'] },
        { model: Post, as: 'post', attributes: ['id', 'title'] },
      ],
      order: [['id', 'ASC']],
    }),
    Report.findAll({
      where: { status: 'open' },
      include: [{ model: User, as: 'reporter', attributes: ['id', 'displayName'] }],
      order: [['id', 'ASC']],
    }),
  ]);
  return { posts, comments, reports };
}

/** What moderators do on the exchange (written by the listings module) also belongs in their log. */
const LISTING_MODERATION_ACTIONS = ['listing.hide', 'listing.unhide', 'listing-report.dismiss'];
const LISTING_AREA_UNDO = { area: 'exchange', action: 'decision.undo' };

/** How much waits for a moderator (for the navigation badge), listing reports included. */
export async function counts() {
  const [pendingPosts, pendingComments, openReports, openListingReports] = await Promise.all([
    Post.count({
      where: {
        [Op.or]: [{ status: 'pending' }, { status: 'approved', revisionStatus: 'pending' }],
      },
    }),
    Comment.count({ where: { status: 'pending' } }),
    Report.count({ where: { status: 'open' } }),
    ListingReport.count({ where: { status: 'open' } }),
  ]);
  return {
    pendingPosts,
    pendingComments,
    openReports,
    openListingReports,
    total: pendingPosts + pendingComments + openReports + openListingReports,
  };
}

/** Each decision's stored status, what the author reads, and its audit action. */
const POST_OUTCOME = {
  publish: {
    status: 'approved',
    subject: 'Your post is published',
    action: 'post.publish',
    line: 'A moderator published it.',
  },
  decline: {
    status: 'rejected',
    subject: 'Your post was declined',
    action: 'post.decline',
    line: 'A moderator declined it:',
  },
  'send-back': {
    status: 'changes-requested',
    subject: 'Your post came back with a note',
    action: 'post.send-back',
    line: 'A moderator sent it back with a note:',
  },
} as const;

export interface Decided<T> {
  row: T;
  decision: ModerationDecision;
}

const inTransaction = <T>(work: (t: Transaction) => Promise<T>): Promise<T> => {
  const sequelize = Post.sequelize;
  if (!sequelize) throw new Error('Models are not initialised');
  return sequelize.transaction(work);
};

/**
 * Publishes, sends back (with a note) or declines (with a reason) a waiting post. The author is told by e-mail
 * and in the app; the text is kept either way so the author can revise it. Logged in the audit log and kept
 * as a decision that can be undone for a while (`undoDecision`).
 */
export async function decidePost(
  ctx: ModContext,
  actor: User,
  postId: number,
  d: Decision,
): Promise<Decided<Post>> {
  const post = await Post.findByPk(postId);
  if (!post) throw notFound('Post');
  if (post.status === 'approved' && post.revision && post.revisionStatus === 'pending')
    return decideRevision(ctx, actor, post, post.revision, d);
  if (post.status !== 'pending')
    throw new AppError('CONFLICT', `This post is ${post.status}, not waiting for a moderator`);
  const o = POST_OUTCOME[d.action];
  const decision = await inTransaction(async (t) => {
    const rec = new DecisionRecord(t);
    await rec.update(
      'post',
      post,
      d.action === 'publish'
        ? {
            status: o.status,
            approvedText: post.bodyText,
            publishedAt: post.publishedAt ?? new Date(),
            moderationNote: null,
          }
        : { status: o.status, moderationNote: d.reason },
    );
    await recordAudit(
      {
        actorId: actor.id,
        area: 'moderation',
        action: o.action,
        subjectType: 'post',
        subjectId: String(post.id),
        reason: d.reason || null,
        details: { title: post.title },
      },
      t,
    );
    const lines = [`“${post.title}”`];
    if (d.action === 'publish') lines.push(o.line);
    else lines.push(`${o.line} ${d.reason}`, 'Your text is kept: change it and send it again.');
    rec.told(
      await tellAuthor(
        ctx.publicUrl,
        { userId: post.authorId, subject: o.subject, lines, path: postPath(post.id) },
        t,
      ),
    );
    return rec.save(actor, {
      area: 'moderation',
      action: o.action,
      subjectType: 'post',
      subjectId: post.id,
      title: post.title,
      path: postPath(post.id),
    });
  });
  await indexPost(post.id);
  return { row: post, decision };
}

const REVISION_OUTCOME = {
  publish: {
    subject: 'Your edit is published',
    action: 'post.revision-publish',
    line: 'A moderator published your edit.',
  },
  decline: {
    subject: 'Your edit was declined',
    action: 'post.revision-decline',
    line: 'A moderator declined your edit:',
  },
  'send-back': {
    subject: 'Your edit came back with a note',
    action: 'post.revision-send-back',
    line: 'A moderator sent your edit back with a note:',
  },
} as const;

/**
 * Decides an edit of a published post: publishing makes the revision the published version; declining or
 * sending it back keeps the published version and the author's revision, with the note.
 */
async function decideRevision(
  ctx: ModContext,
  actor: User,
  post: Post,
  revision: PostRevision,
  d: Decision,
): Promise<Decided<Post>> {
  const o = REVISION_OUTCOME[d.action];
  const decision = await inTransaction(async (t) => {
    const rec = new DecisionRecord(t);
    await rec.update(
      'post',
      post,
      d.action === 'publish'
        ? {
            ...revision,
            approvedText: revision.bodyText,
            approvedTitle: revision.title,
            revision: null,
            revisionStatus: null,
            moderationNote: null,
          }
        : {
            revisionStatus: d.action === 'decline' ? 'rejected' : 'changes-requested',
            moderationNote: d.reason,
          },
    );
    await recordAudit(
      {
        actorId: actor.id,
        area: 'moderation',
        action: o.action,
        subjectType: 'post',
        subjectId: String(post.id),
        reason: d.reason || null,
        details: { title: revision.title },
      },
      t,
    );
    const lines = [`“${revision.title}”`];
    if (d.action === 'publish') lines.push(o.line);
    else
      lines.push(
        `${o.line} ${d.reason}`,
        'Readers still see the published version. Your edit is kept: change it and send it again.',
      );
    rec.told(
      await tellAuthor(
        ctx.publicUrl,
        { userId: post.authorId, subject: o.subject, lines, path: postPath(post.id) },
        t,
      ),
    );
    return rec.save(actor, {
      area: 'moderation',
      action: o.action,
      subjectType: 'post',
      subjectId: post.id,
      title: revision.title,
      path: postPath(post.id),
    });
  });
  await indexPost(post.id);
  return { row: post, decision };
}

/** Publishes or declines a waiting comment; the author hears either way, and the thread hears of a publication. */
export async function decideComment(
  ctx: ModContext,
  actor: User,
  commentId: number,
  d: CommentDecision,
): Promise<Decided<Comment>> {
  const comment = await Comment.findByPk(commentId, { include: [{ model: Post, as: 'post' }] });
  if (!comment) throw notFound('Comment');
  if (comment.status !== 'pending')
    throw new AppError(
      'CONFLICT',
      `This comment is ${comment.status}, not waiting for a moderator`,
    );
  const publish = d.action === 'publish';
  const action = publish ? 'comment.publish' : 'comment.decline';
  const decision = await inTransaction(async (t) => {
    const rec = new DecisionRecord(t);
    await rec.update('comment', comment, {
      status: publish ? 'approved' : 'rejected',
      moderationNote: publish ? null : d.reason,
    });
    await recordAudit(
      {
        actorId: actor.id,
        area: 'moderation',
        action,
        subjectType: 'comment',
        subjectId: String(comment.id),
        reason: d.reason || null,
        details: { postId: comment.postId },
      },
      t,
    );
    if (publish) for (const n of await notifyReply(comment, t)) rec.told(n);
    else
      rec.told(
        await tellAuthor(
          ctx.publicUrl,
          {
            userId: comment.authorId,
            subject: 'Your comment was declined',
            lines: [
              `A moderator declined it: ${d.reason}`,
              `Your comment: ${comment.body.slice(0, 500)}`,
            ],
            path: postPath(comment.postId),
          },
          t,
        ),
      );
    return rec.save(actor, {
      area: 'moderation',
      action,
      subjectType: 'comment',
      subjectId: comment.id,
      title: comment.post?.title ?? '',
      path: postPath(comment.postId),
    });
  });
  return { row: comment, decision };
}

/** Pins, locks or hides (with a reason) a published post, or undoes it; each change is logged. */
export async function setFlags(ctx: ModContext, actor: User, postId: number, f: Flags) {
  const post = await Post.findByPk(postId);
  if (!post) throw notFound('Post');
  if (!['approved', 'hidden'].includes(post.status))
    throw new AppError(
      'CONFLICT',
      'Only published or hidden posts can be pinned, locked or hidden',
    );
  const now = new Date();
  const changes: Partial<Post> = {};
  const actions: string[] = [];
  if (f.pinned !== undefined && f.pinned !== (post.pinnedAt !== null)) {
    changes.pinnedAt = f.pinned ? now : null;
    actions.push(f.pinned ? 'post.pin' : 'post.unpin');
  }
  if (f.locked !== undefined && f.locked !== (post.lockedAt !== null)) {
    changes.lockedAt = f.locked ? now : null;
    actions.push(f.locked ? 'post.lock' : 'post.unlock');
  }
  if (f.hidden !== undefined && f.hidden !== (post.status === 'hidden')) {
    changes.status = f.hidden ? 'hidden' : 'approved';
    if (f.hidden) changes.moderationNote = f.reason;
    actions.push(f.hidden ? 'post.hide' : 'post.unhide');
  }
  await post.update(changes);
  for (const a of actions) await audit(actor, a, 'post', post.id, f.reason, { title: post.title });
  if (changes.status === 'hidden')
    await tellAuthor(ctx.publicUrl, {
      userId: post.authorId,
      subject: 'Your post was hidden',
      lines: [`“${post.title}”`, `A moderator says: ${f.reason}`],
      path: postPath(post.id),
    });
  await indexPost(post.id);
  return post;
}

/** Moderation entries of the audit log, newest first, 50 a page. */
export async function auditLog(page: number) {
  const { rows, count } = await AuditEvent.findAndCountAll({
    where: {
      [Op.or]: [
        { area: 'moderation' },
        { action: { [Op.in]: LISTING_MODERATION_ACTIONS } },
        LISTING_AREA_UNDO,
      ],
    },
    include: [{ model: User, as: 'actor', attributes: ['id', 'displayName'] }],
    order: [['id', 'DESC']],
    limit: 50,
    offset: (page - 1) * 50,
  });
  return { rows, total: count };
}
