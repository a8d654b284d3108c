import type {
  CommentDecisionInput,
  DecisionInput,
  DismissListingReportInput,
  HideListingInput,
  PostFlagsInput,
  ResolveReportInput,
  UndoResultDto,
} from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export type ModerationAction =
  | { kind: 'post'; id: number; body: DecisionInput }
  | { kind: 'comment'; id: number; body: CommentDecisionInput }
  | { kind: 'report'; id: number; body: ResolveReportInput }
  | { kind: 'flags'; id: number; body: PostFlagsInput }
  | { kind: 'listing-hide'; id: number; body: HideListingInput }
  | { kind: 'listing-report-dismiss'; id: number; body: DismissListingReportInput };

const URL_OF: Record<ModerationAction['kind'], (id: number) => string> = {
  post: (id) => `/moderation/posts/${id}/decision`,
  comment: (id) => `/moderation/comments/${id}/decision`,
  report: (id) => `/moderation/reports/${id}/resolve`,
  flags: (id) => `/moderation/posts/${id}/flags`,
  'listing-hide': (id) => `/listings/${id}/hide`,
  'listing-report-dismiss': (id) => `/listings/reports/${id}/dismiss`,
};

/**
 * One moderator action (decision, report resolution, flags, listing hide or dismiss); refreshes the queue,
 * count and log. Decisions answer `decisionId`, for Undo. The refresh is not awaited, so a caller can keep
 * the decided item in place before the new queue arrives.
 */
export function useModerate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (a: ModerationAction) =>
      apiFetch<{ decisionId?: number } | undefined>(URL_OF[a.kind](a.id), {
        method: a.kind === 'flags' ? 'PATCH' : 'POST',
        body: a.body,
      }),
    onSuccess: () => {
      void queryClient.invalidateQueries();
    },
  });
}

/** POST /api/moderation/decisions/:id/undo: the item goes back to how it was before the decision. */
export function useUndoDecision() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (decisionId: number) =>
      apiFetch<UndoResultDto>(`/moderation/decisions/${decisionId}/undo`, { method: 'POST' }),
    onSuccess: () => {
      void queryClient.invalidateQueries();
    },
  });
}
