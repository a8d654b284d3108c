import type { ResetRequestInput } from '@app/shared';
import { useMutation } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

/** POST /api/auth/password-reset; answers 202 whether or not the address is known. */
export const requestPasswordReset = (input: ResetRequestInput) =>
  apiFetch<unknown>('/auth/password-reset', { method: 'POST', body: input });

export const useRequestPasswordReset = () => useMutation({ mutationFn: requestPasswordReset });
