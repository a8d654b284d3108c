import type { SearchHitDto } from '@app/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { knowledgeKeys } from './keys';

export const searchQuery = (q: string, topic?: string) =>
  queryOptions({
    queryKey: knowledgeKeys.search(q, topic),
    queryFn: ({ signal }) =>
      apiFetch<SearchHitDto[]>('/search/posts', { query: { q, topic }, signal }),
    enabled: q.trim().length > 0,
    placeholderData: keepPreviousData,
  });

/** GET /api/search/posts?q=: fuzzy and prefix search with highlighted matches. */
export const useSearchPosts = (q: string, topic?: string) => useQuery(searchQuery(q.trim(), topic));
