import type { OfflinePaymentInput, PaymentDto } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { treasuryKeys } from './keys';

/** POST /api/treasury/payments: a cheque, cash or transfer payment. */
export const recordPayment = (input: OfflinePaymentInput) =>
  apiFetch<PaymentDto>('/treasury/payments', { method: 'POST', body: input });

/** Records an offline payment and refreshes the desk. */
export function useRecordPayment() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: recordPayment,
    onSuccess: () => qc.invalidateQueries({ queryKey: treasuryKeys.all }),
  });
}
