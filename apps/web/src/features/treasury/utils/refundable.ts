import type { PaymentDto } from '@app/shared';

/** What is still refundable: the amount less every refund that has not failed (pending ones included). */
export const refundableMinor = (p: PaymentDto) =>
  p.amountMinor -
  p.refunds.filter((r) => r.status !== 'failed').reduce((sum, r) => sum + r.amountMinor, 0);
