/** Query keys for knowledge posts, topics and search. */
export const knowledgeKeys = {
  all: ['knowledge'] as const,
  topics: () => [...knowledgeKeys.all, 'topics'] as const,
  lists: () => [...knowledgeKeys.all, 'list'] as const,
  list: (filters: { topic?: string; kind?: string; page: number }) =>
    [...knowledgeKeys.lists(), filters] as const,
  mine: () => [...knowledgeKeys.all, 'mine'] as const,
  search: (q: string, topic?: string) => [...knowledgeKeys.all, 'search', { q, topic }] as const,
  detail: (postId: number) => [...knowledgeKeys.all, 'detail', postId] as const,
  boats: () => [...knowledgeKeys.all, 'my-boats'] as const,
};
