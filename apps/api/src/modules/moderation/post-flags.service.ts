import type { z } from 'zod';
import type { postFlagsSchema } from '@app/shared';

import { AppError, notFound } from '../../errors/app-error';
import { Post, type User } from '../../models';
import { postPath } from '../posts/comments.service';
import { indexPost } from '../posts/post-index';
import { tellAuthor } from './moderation-mail';
import { moderationAudit as audit, type ModContext } from './moderation.service';

type Flags = z.output<typeof postFlagsSchema>;

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
