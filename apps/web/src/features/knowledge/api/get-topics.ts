import type { TopicDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { knowledgeKeys } from './keys';

export const topicsQuery = () =>
  queryOptions({
    queryKey: knowledgeKeys.topics(),
    queryFn: ({ signal }) => apiFetch<TopicDto[]>('/topics', { signal }),
    staleTime: 5 * 60_000,
  });

/** GET /api/topics: the topics of the trade, in display order. */
export const useTopics = () => useQuery(topicsQuery());
