import type { TokenInput, UserDto } from '@app/shared';
import { useMutation } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

/** POST /api/auth/verify-email with the token from the e-mailed link. */
export const verifyEmail = (input: TokenInput) =>
  apiFetch<{ user: UserDto }>('/auth/verify-email', { method: 'POST', body: input });

export const useVerifyEmail = () => useMutation({ mutationFn: verifyEmail });
