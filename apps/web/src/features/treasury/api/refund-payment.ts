import type { RefundDto, RefundInput } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { treasuryKeys } from './keys';

/** POST /api/treasury/payments/:id/refunds. */
export const refundPayment = ({ paymentId, ...input }: RefundInput & { paymentId: number }) =>
  apiFetch<RefundDto>(`/treasury/payments/${paymentId}/refunds`, { method: 'POST', body: input });

/** Requests a refund; card refunds complete when the provider confirms. */
export function useRefundPayment() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: refundPayment,
    onSuccess: () => qc.invalidateQueries({ queryKey: treasuryKeys.all }),
  });
}
