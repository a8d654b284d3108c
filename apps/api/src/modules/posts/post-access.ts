import { Op, type WhereOptions } from 'sequelize';
import { notFound } from '../../errors/app-error';
import { Comment, Post, Topic, User } from '../../models';

/** True for a moderator. */
export const isModerator = (user: User | null | undefined): user is User =>
  !!user && user.hasRole('moderator');

/**
 * Whether `user` (null: visitor) may read `post`: approved public posts are open to all, approved members-only
 * posts to signed-in people; drafts, pending, rejected and hidden posts to their author and moderators only.
 */
export function canSeePost(post: Post, user: User | null): boolean {
  if (post.status === 'approved') return post.visibility === 'public' || user !== null;
  return user !== null && (post.authorId === user.id || isModerator(user));
}

/** Who may read `comment` on a post they can see: approved ones everyone; others the author and moderators. */
export const canSeeComment = (comment: Comment, user: User | null) =>
  comment.status === 'approved' ||
  (user !== null && (comment.authorId === user.id || isModerator(user)));

/** The filter for posts anyone in `user`'s position may list (approved, visibility by sign-in). */
export const publicWhere = (user: User | null): WhereOptions<Post> =>
  user ? { status: 'approved' } : { status: 'approved', visibility: 'public' };

export const POST_INCLUDE = [
  { model: User, as: 'author', attributes: ['id', 'displayName'] },
  { model: Topic, as: 'topic' },
];

/** A post `user` may read, with author and topic; anything else reads as not found. */
export async function loadVisiblePost(user: User | null, postId: number): Promise<Post> {
  const post = await Post.findByPk(postId, { include: POST_INCLUDE });
  if (!post || !canSeePost(post, user)) throw notFound('Post');
  return post;
}

/** One of `user`'s own posts; someone else's reads as not found. */
export async function loadOwnPost(user: User, postId: number): Promise<Post> {
  const post = await Post.findByPk(postId, { include: POST_INCLUDE });
  if (!post || post.authorId !== user.id) throw notFound('Post');
  return post;
}

/** Ids → visible-to-all counts of approved comments. */
export async function approvedCommentCounts(postIds: number[]): Promise<Map<number, number>> {
  if (postIds.length === 0) return new Map();
  const rows = (await Comment.count({
    where: { postId: { [Op.in]: postIds }, status: 'approved' },
    group: ['postId'],
  })) as unknown as Array<{ postId: number; count: number }>;
  return new Map(rows.map((r) => [r.postId, Number(r.count)]));
}
