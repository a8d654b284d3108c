import type { PaymentDto } from '@app/shared';
import { formatMoney, refundInputSchema, z } from '../../../lib/schemas';
import { moneyMessage, parseMoney } from '../utils/money';

/** The refund form's check: a decimal amount up to what is left to refund, and a reason. */
export function schemaFor(payment: PaymentDto, left: number) {
  return z
    .object({ amount: z.string(), reason: refundInputSchema.shape.reason })
    .superRefine((v, ctx) => {
      const minor = parseMoney(v.amount, payment.currency);
      let message: string | null = null;
      if (minor === null) message = moneyMessage('Amount', payment.currency);
      else if (minor <= 0) message = 'The amount must be more than zero';
      else if (minor > left)
        message = `At most ${formatMoney(left, payment.currency)} is left to refund`;
      if (message) ctx.addIssue({ code: 'custom', path: ['amount'], message });
    });
}
