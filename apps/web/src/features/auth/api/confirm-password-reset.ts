import type { ResetConfirmInput } from '@app/shared';
import { useMutation } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

/** POST /api/auth/password-reset/confirm; 410 GONE when the link was used or has expired. */
export const confirmPasswordReset = (input: ResetConfirmInput) =>
  apiFetch<{ ok: true }>('/auth/password-reset/confirm', { method: 'POST', body: input });

export const useConfirmPasswordReset = () => useMutation({ mutationFn: confirmPasswordReset });
