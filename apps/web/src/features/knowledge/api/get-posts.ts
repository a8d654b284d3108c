import type { PostSummaryDto } from '@app/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { knowledgeKeys } from './keys';

export interface PostFilters {
  topic?: string;
  kind?: 'article' | 'question';
  page: number;
}

export const postsQuery = (f: PostFilters) =>
  queryOptions({
    queryKey: knowledgeKeys.list(f),
    queryFn: ({ signal }) =>
      apiFetch<PostSummaryDto[]>('/posts', {
        query: { topic: f.topic, kind: f.kind, page: f.page },
        signal,
      }),
    placeholderData: keepPreviousData,
  });

/** GET /api/posts: published posts, pinned first. */
export const usePosts = (f: PostFilters) => useQuery(postsQuery(f));

/** GET /api/posts/mine: the signed-in member's posts in every status. */
export const useMyPosts = (enabled: boolean) =>
  useQuery({
    queryKey: knowledgeKeys.mine(),
    queryFn: ({ signal }) => apiFetch<PostSummaryDto[]>('/posts/mine', { signal }),
    enabled,
  });
