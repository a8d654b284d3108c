import type { CreatePostInput, PostDetailDto, PostPatchInput } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch, apiUrl, getCsrfToken } from '@/lib/api-client';
import { knowledgeKeys } from './keys';

/** POST /api/posts: a new draft (or, with submit, a post sent to moderation). */
export const createPost = (input: CreatePostInput) =>
  apiFetch<PostDetailDto>('/posts', { method: 'POST', body: input });

/** PATCH /api/posts/:postId: saves an edit (autosave uses this). */
export const updatePost = (postId: number, input: PostPatchInput) =>
  apiFetch<PostDetailDto>(`/posts/${postId}`, { method: 'PATCH', body: input });

/** POST /api/posts/:postId/submit: sends a draft or returned post to moderation. */
export const submitPost = (postId: number) =>
  apiFetch<PostDetailDto>(`/posts/${postId}/submit`, { method: 'POST' });

/** Saves and optionally submits; refreshes the post and lists afterwards. */
export function useSavePost() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (v: { postId: number | null; input: CreatePostInput; submit: boolean }) => {
      const { submit: _submit, ...patch } = v.input;
      const saved =
        v.postId === null ? await createPost(v.input) : await updatePost(v.postId, patch);
      return v.submit && v.postId !== null ? submitPost(saved.id) : saved;
    },
    onSuccess: (saved) => {
      queryClient.setQueryData(knowledgeKeys.detail(saved.id), saved);
      return queryClient.invalidateQueries({ queryKey: knowledgeKeys.all });
    },
  });
}

/** POST /api/uploads/images: an image for a post; answers its URL. */
export async function uploadImage(
  file: File,
): Promise<{ url: string; width: number; height: number }> {
  const form = new FormData();
  form.append('image', file);
  const res = await fetch(apiUrl('/uploads/images'), {
    method: 'POST',
    body: form,
    credentials: 'include',
    headers: { 'X-CSRF-Token': getCsrfToken() ?? '' },
  });
  const payload = (await res.json().catch(() => null)) as {
    data?: { url: string; width: number; height: number };
    error?: { message: string };
  } | null;
  if (!res.ok || !payload?.data)
    throw new Error(payload?.error?.message ?? 'The image could not be uploaded');
  return payload.data;
}
