import { Op, type WhereOptions } from 'sequelize';
import { notFound } from '../../errors/app-error';
import { Comment, Post, Topic, User } from '../../models';
import { canEditPost, canSeePost } from '../../policies/posts';

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
  if (!post || !canSeePost(user, post)) throw notFound('Post');
  return post;
}

/** One of `user`'s own posts; someone else's reads as not found. */
export async function loadOwnPost(user: User, postId: number): Promise<Post> {
  const post = await Post.findByPk(postId, { include: POST_INCLUDE });
  if (!post || !canEditPost(user, post)) throw notFound('Post');
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
