import type { PostDetailDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { knowledgeKeys } from './keys';

export const postQuery = (postId: number) =>
  queryOptions({
    queryKey: knowledgeKeys.detail(postId),
    queryFn: ({ signal }) => apiFetch<PostDetailDto>(`/posts/${postId}`, { signal }),
  });

/** GET /api/posts/:postId: the post, its setup card, comments and what the viewer may do. */
export const usePost = (postId: number, enabled = true) =>
  useQuery({ ...postQuery(postId), enabled });
