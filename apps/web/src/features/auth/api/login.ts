import type { LoginInput, SessionDto } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { replaceSession } from './session-cache';

/** POST /api/auth/login. */
export const login = (input: LoginInput) =>
  apiFetch<SessionDto>('/auth/login', { method: 'POST', body: input });

/** Signs in; on success the session (and its new CSRF token) replaces the visitor's. */
export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: (session) => replaceSession(queryClient, session),
  });
}
