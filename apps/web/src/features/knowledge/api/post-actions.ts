import type { CommentDto, CommentInput, ReportInput } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { knowledgeKeys } from './keys';

function useInvalidatePost(postId: number) {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: knowledgeKeys.detail(postId) });
}

/** POST /api/posts/:postId/comments: a comment or a reply (waits for moderation unless a moderator). */
export function useAddComment(postId: number) {
  const invalidate = useInvalidatePost(postId);
  return useMutation({
    mutationFn: (input: CommentInput) =>
      apiFetch<CommentDto>(`/posts/${postId}/comments`, { method: 'POST', body: input }),
    onSuccess: invalidate,
  });
}

/** PUT / DELETE /api/posts/:postId/vote: marks the post helpful, or takes the vote back. */
export function useHelpfulVote(postId: number) {
  const invalidate = useInvalidatePost(postId);
  return useMutation({
    mutationFn: (on: boolean) =>
      apiFetch<{ helpfulCount: number }>(`/posts/${postId}/vote`, {
        method: on ? 'PUT' : 'DELETE',
      }),
    onSuccess: invalidate,
  });
}

/** PUT /api/posts/:postId/accepted-answer: the asker (or a moderator) accepts an answer. */
export function useAcceptAnswer(postId: number) {
  const invalidate = useInvalidatePost(postId);
  return useMutation({
    mutationFn: (commentId: number | null) =>
      apiFetch(`/posts/${postId}/accepted-answer`, { method: 'PUT', body: { commentId } }),
    onSuccess: invalidate,
  });
}

/** POST /api/reports: a member reports a post or comment to the moderators. */
export function useReport() {
  return useMutation({
    mutationFn: (input: ReportInput) => apiFetch('/reports', { method: 'POST', body: input }),
  });
}
