import type { SignupInput, SignupResultDto } from '@app/shared';
import { useMutation } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

/** POST /api/auth/signup; the account is created unverified and nobody is signed in. */
export const signup = (input: SignupInput) =>
  apiFetch<SignupResultDto>('/auth/signup', { method: 'POST', body: input });

export const useSignup = () => useMutation({ mutationFn: signup });
