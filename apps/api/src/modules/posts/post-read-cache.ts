import { LRUCache } from 'lru-cache';
import type { PostDetailDto } from '@app/shared';
import { AppError } from '../../errors/app-error';
import { loadVisiblePost } from './post-access';
import { toPostDetailDto } from './post-detail';

/** How long a visitor's copy of a post page may be reused. Writes in this process clear it at once. */
export const ANONYMOUS_POST_TTL_MS = 5000;

// Visitors (no session user) all see the same post page, so it is built once per few seconds rather than on
// every read; concurrent misses for one post share a single load. Errors (not found) are never cached.
const cache = new LRUCache<number, PostDetailDto>({
  max: 2000,
  ttl: ANONYMOUS_POST_TTL_MS,
  fetchMethod: async (postId) => toPostDetailDto(await loadVisiblePost(null, postId), null),
});

/** The post page as a visitor sees it (throws NOT_FOUND like loadVisiblePost). */
export async function anonymousPostDetail(postId: number): Promise<PostDetailDto> {
  const build = async () => toPostDetailDto(await loadVisiblePost(null, postId), null);
  try {
    return (await cache.fetch(postId)) ?? (await build());
  } catch (err) {
    if (err instanceof AppError) throw err;
    // A write cleared the cache while this copy was being built, which aborts the load (so a copy read before
    // the write is never kept): read it again, fresh, without caching.
    return build();
  }
}

export const clearAnonymousPostCache = () => cache.clear();
