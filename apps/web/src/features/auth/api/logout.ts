import type { SessionDto } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { replaceSession } from './session-cache';

/** POST /api/auth/logout. */
export const logout = () => apiFetch<SessionDto>('/auth/logout', { method: 'POST' });

/** Signs out and forgets everything cached for the person. */
export function useLogout() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: logout,
    onSuccess: (session) => replaceSession(queryClient, session),
  });
}
