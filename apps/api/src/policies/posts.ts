import type { PostStatus, PostVisibility } from '@app/shared';
import { hasModeratorRole, type Actor } from './roles';

interface PostLike {
  authorId: number;
  status: PostStatus;
  visibility: PostVisibility;
}

/** The post's author. */
export const isPostAuthor = (user: Actor | null, post: Pick<PostLike, 'authorId'>) =>
  user !== null && post.authorId === user.id;

/**
 * Whether `user` (null: visitor) may read `post`: approved public posts are open to all, approved members-only
 * posts to signed-in people; drafts, pending, rejected and hidden posts to their author and moderators only.
 */
export function canSeePost(user: Actor | null, post: PostLike): boolean {
  if (post.status === 'approved') return post.visibility === 'public' || user !== null;
  return isPostAuthor(user, post) || hasModeratorRole(user);
}

/** Who may read a comment on a post they can see: approved ones everyone; others the author and moderators. */
export const canSeeComment = (user: Actor | null, comment: { authorId: number; status: string }) =>
  comment.status === 'approved' ||
  (user !== null && (comment.authorId === user.id || hasModeratorRole(user)));

/** Only the author edits or deletes a post (a moderator decides through the queue instead). */
export const canEditPost = (user: Actor, post: Pick<PostLike, 'authorId'>) =>
  isPostAuthor(user, post);

/** A moderator's own posts and edits are published at once; everyone else's wait for a moderator. */
export const publishesWithoutReview = (user: Actor) => hasModeratorRole(user);

/** The asker or a moderator marks which answer worked. */
export const canAcceptAnswer = (user: Actor, post: Pick<PostLike, 'authorId'>) =>
  isPostAuthor(user, post) || hasModeratorRole(user);

/** A member marks other members' posts helpful, never their own. */
export const canVoteOn = (user: Actor, post: Pick<PostLike, 'authorId'>) =>
  !isPostAuthor(user, post);
