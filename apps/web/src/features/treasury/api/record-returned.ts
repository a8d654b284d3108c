import type { RefundDto, ReturnedInput } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { treasuryKeys } from './keys';

/** POST /api/treasury/payments/:id/returned. */
export const recordReturned = ({ paymentId, ...input }: ReturnedInput & { paymentId: number }) =>
  apiFetch<RefundDto>(`/treasury/payments/${paymentId}/returned`, { method: 'POST', body: input });

/** Records money handed back outside the payment provider (transfer, cash or cheque). */
export function useRecordReturned() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: recordReturned,
    onSuccess: () => qc.invalidateQueries({ queryKey: treasuryKeys.all }),
  });
}
