import type { z } from 'zod';
import type { decisionSchema } from '@app/shared';

import { AppError, notFound } from '../../errors/app-error';
import { Post, type PostRevision, type User } from '../../models';
import { DecisionRecord } from '../audit/decision-record';
import { postPath } from '../posts/comments.service';
import { indexPost } from '../posts/post-index';
import { tellAuthor } from './moderation-mail';
import {
  inTransaction,
  moderationAudit,
  type Decided,
  type ModContext,
} from './moderation.service';

type Decision = z.output<typeof decisionSchema>;

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
  const lines = [`“${post.title}”`];
  if (d.action === 'publish') lines.push(o.line);
  else lines.push(`${o.line} ${d.reason}`, 'Your text is kept: change it and send it again.');
  return recordPostDecision(ctx, actor, post, d, {
    action: o.action,
    subject: o.subject,
    title: post.title,
    lines,
    changes: () =>
      d.action === 'publish'
        ? {
            status: o.status,
            approvedText: post.bodyText,
            publishedAt: post.publishedAt ?? new Date(),
            moderationNote: null,
          }
        : { status: o.status, moderationNote: d.reason },
  });
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
function decideRevision(
  ctx: ModContext,
  actor: User,
  post: Post,
  revision: PostRevision,
  d: Decision,
): Promise<Decided<Post>> {
  const o = REVISION_OUTCOME[d.action];
  const lines = [`“${revision.title}”`];
  if (d.action === 'publish') lines.push(o.line);
  else
    lines.push(
      `${o.line} ${d.reason}`,
      'Readers still see the published version. Your edit is kept: change it and send it again.',
    );
  return recordPostDecision(ctx, actor, post, d, {
    action: o.action,
    subject: o.subject,
    title: revision.title,
    lines,
    changes: () =>
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
  });
}

/** One decision on a post: its audit action, what the author reads, and the columns it changes. */
interface PostDecisionStep {
  action: string;
  subject: string;
  /** The title the log, the notice and the decision name. */
  title: string;
  lines: string[];
  /** The new column values, read inside the transaction. */
  changes: () => Record<string, unknown>;
}

/**
 * Applies a decision on a post in one transaction: the row change (kept for Undo), the audit entry and the
 * author's notice; then refreshes the post's search entry.
 */
async function recordPostDecision(
  ctx: ModContext,
  actor: User,
  post: Post,
  d: Decision,
  step: PostDecisionStep,
): Promise<Decided<Post>> {
  const path = postPath(post.id);
  const decision = await inTransaction(async (t) => {
    const rec = new DecisionRecord(t);
    await rec.update('post', post, step.changes());
    await moderationAudit(actor, step.action, 'post', post.id, d.reason, { title: step.title }, t);
    rec.told(
      await tellAuthor(
        ctx.publicUrl,
        { userId: post.authorId, subject: step.subject, lines: step.lines, path },
        t,
      ),
    );
    return rec.save(actor, {
      area: 'moderation',
      action: step.action,
      subjectType: 'post',
      subjectId: post.id,
      title: step.title,
      path,
    });
  });
  await indexPost(post.id);
  return { row: post, decision };
}
