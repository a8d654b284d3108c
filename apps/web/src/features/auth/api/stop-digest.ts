import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { authKeys } from './keys';

/** POST /api/account/digest/stop with the signed token from a digest e-mail (works signed out). */
export const stopDigest = (token: string) =>
  apiFetch<{ stopped: true }>('/account/digest/stop', { method: 'POST', body: { token } });

/** Turns the daily digest off from the e-mail's link; a signed-in session shows the change. */
export function useStopDigest() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: stopDigest,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: authKeys.all }),
  });
}
