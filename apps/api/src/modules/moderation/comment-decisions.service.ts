import type { z } from 'zod';
import type { commentDecisionSchema } from '@app/shared';

import { AppError, notFound } from '../../errors/app-error';
import { Comment, Post, type User } from '../../models';
import { DecisionRecord } from '../audit/decision-record';
import { notifyReply, postPath } from '../posts/comments.service';
import { tellAuthor } from './moderation-mail';
import {
  inTransaction,
  moderationAudit,
  type Decided,
  type ModContext,
} from './moderation.service';

type CommentDecision = z.output<typeof commentDecisionSchema>;

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
    await moderationAudit(
      actor,
      action,
      'comment',
      comment.id,
      d.reason,
      { postId: comment.postId },
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
