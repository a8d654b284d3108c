import type { ResetRequestInput } from '@app/shared';
import { useMutation } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export type ResendVerificationInput = ResetRequestInput;

/** POST /api/auth/resend-verification; answers 202 whether or not the address is known. */
export const resendVerification = (input: ResendVerificationInput) =>
  apiFetch<unknown>('/auth/resend-verification', { method: 'POST', body: input });

export const useResendVerification = () => useMutation({ mutationFn: resendVerification });
