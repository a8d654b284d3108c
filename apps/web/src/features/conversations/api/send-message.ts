import type { ThreadDto } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { conversationKeys } from './keys';

/** POST /api/threads (first message about a listing) or /api/threads/:id/messages (a reply). */
export const sendMessage = (v: { threadId?: number; listingId?: number; body: string }) =>
  v.threadId
    ? apiFetch<ThreadDto>(`/threads/${v.threadId}/messages`, {
        method: 'POST',
        body: { body: v.body },
      })
    : apiFetch<ThreadDto>('/threads', {
        method: 'POST',
        body: { listingId: v.listingId, body: v.body },
      });

/** Sends a message and refreshes the inbox and the thread. */
export function useSendMessage() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: sendMessage,
    onSuccess: (thread) => {
      queryClient.setQueryData(conversationKeys.detail(thread.id), thread);
      return queryClient.invalidateQueries({ queryKey: conversationKeys.list() });
    },
  });
}
