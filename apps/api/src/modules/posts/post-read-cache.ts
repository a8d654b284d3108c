import { LRUCache } from 'lru-cache';
import type { PostDetailDto } from '@app/shared';
import { Boat, Comment, Post, Topic, User, Vote } from '../../models';
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
  const dto = await cache.fetch(postId);
  if (!dto) return toPostDetailDto(await loadVisiblePost(null, postId), null);
  return dto;
}

export const clearAnonymousPostCache = () => cache.clear();

const HOOKS = [
  'afterCreate',
  'afterUpdate',
  'afterSave',
  'afterDestroy',
  'afterUpsert',
  'afterBulkCreate',
  'afterBulkUpdate',
  'afterBulkDestroy',
] as const;
/** The two hook methods every model has; the union of model classes is too wide for TypeScript to call them. */
interface HookTarget {
  removeHook(hook: string, name: string): unknown;
  addHook(hook: string, name: string, fn: () => void): unknown;
}

/** Clears the cache on any write to what a post page shows (posts, comments, votes, topics, authors, boats). */
export function clearAnonymousPostCacheOnWrites() {
  for (const model of [Post, Comment, Vote, Topic, User, Boat] as unknown as HookTarget[])
    for (const hook of HOOKS) {
      // Named, so building the app again (tests do) replaces the hook instead of stacking copies.
      model.removeHook(hook, 'anonymous-post-cache');
      model.addHook(hook, 'anonymous-post-cache', clearAnonymousPostCache);
    }
}
