import type { PaymentDto, ResolveHeldInput } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { treasuryKeys } from './keys';

/** POST /api/treasury/payments/:id/resolve. */
export const resolveHeld = ({ paymentId, ...input }: ResolveHeldInput & { paymentId: number }) =>
  apiFetch<PaymentDto>(`/treasury/payments/${paymentId}/resolve`, { method: 'POST', body: input });

/** Credits or dismisses a held payment. */
export function useResolveHeld() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: resolveHeld,
    onSuccess: () => qc.invalidateQueries({ queryKey: treasuryKeys.all }),
  });
}
