import type { TopicDto, TopicInput, TopicOrderInput, TopicPatchInput } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { knowledgeKeys } from './keys';

/** Every topic edit changes the list (and post filters): refresh everything knowledge shows. */
function useTopicMutation<T>(mutationFn: (input: T) => Promise<unknown>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: knowledgeKeys.all }),
  });
}

/** POST /api/topics (admins). */
export const useCreateTopic = () =>
  useTopicMutation((input: TopicInput) =>
    apiFetch<TopicDto>('/topics', { method: 'POST', body: input }),
  );

/** PATCH /api/topics/:id: rename, describe, retire or restore (admins). */
export const useUpdateTopic = () =>
  useTopicMutation(({ id, patch }: { id: number; patch: TopicPatchInput }) =>
    apiFetch<TopicDto>(`/topics/${id}`, { method: 'PATCH', body: patch }),
  );

/** PUT /api/topics/order: the whole list in its new order (admins). */
export const useReorderTopics = () =>
  useTopicMutation((input: TopicOrderInput) =>
    apiFetch<TopicDto[]>('/topics/order', { method: 'PUT', body: input }),
  );

/** DELETE /api/topics/:id: only for a topic no post uses (admins). */
export const useDeleteTopic = () =>
  useTopicMutation((id: number) => apiFetch<null>(`/topics/${id}`, { method: 'DELETE' }));
