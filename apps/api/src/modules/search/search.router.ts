import { Router } from 'express';
import { searchQuerySchema, type SearchHitDto } from '@app/shared';
import type { Logger } from '../../logger';
import { approvedCommentCounts } from '../posts/post-access';
import { canSeePost } from '../../policies/posts';
import { toPostSummaryDto } from '../posts/posts.presenter';
import { postsByIds } from '../posts/posts.service';
import { ensurePostIndex, highlight, searchPosts, snippet } from '../posts/post-index';

/** Search over published posts; the index is built from MariaDB when the app starts. */
export function searchRouter(logger: Logger) {
  ensurePostIndex().catch((err: unknown) => logger.warn({ err }, 'post index not built at start'));
  const r = Router();
  r.get('/posts', async (req, res) => {
    const { q, topic } = searchQuerySchema.parse(req.query);
    const viewer = req.user ?? null;
    const results = await searchPosts(q, { signedIn: viewer !== null, topicSlug: topic });
    const posts = await postsByIds(results.map((x) => Number(x.id)));
    const byId = new Map(posts.map((p) => [p.id, p]));
    const counts = await approvedCommentCounts(posts.map((p) => p.id));
    const data: SearchHitDto[] = results.flatMap((x) => {
      const post = byId.get(Number(x.id));
      if (!post || post.status !== 'approved' || !canSeePost(viewer, post)) return [];
      return [
        {
          post: toPostSummaryDto(post, counts.get(post.id) ?? 0),
          score: x.score,
          title: highlight(post.title, x.terms),
          snippet: snippet(post.bodyText, x.terms),
          terms: x.terms,
        },
      ];
    });
    res.json({ data });
  });
  return r;
}
