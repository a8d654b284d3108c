import type { ChangePasswordInput } from '@app/shared';
import { useMutation } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

/** POST /api/account/password. */
export const changePassword = (input: ChangePasswordInput) =>
  apiFetch<{ ok: true }>('/account/password', { method: 'POST', body: input });

export const useChangePassword = () => useMutation({ mutationFn: changePassword });
