import { formatMoney, type PaymentDto } from '@app/shared';
import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { errorMessage } from '../../../lib/form-errors';
import { useRefundPayment } from '../api/refund-payment';
import { useResolveHeld } from '../api/resolve-held';

/** Refund and (for held payments) credit / dismiss, each asking for a reason for the ledger. */
export function PaymentRowActions({ payment }: { payment: PaymentDto }) {
  const refund = useRefundPayment();
  const resolve = useResolveHeld();
  const [message, setMessage] = useState('');
  const left = payment.amountMinor - payment.refundedMinor;
  const canRefund = ['succeeded', 'held', 'dismissed'].includes(payment.status) && left > 0;
  const ask = (q: string) => window.prompt(q)?.trim() ?? '';
  return (
    <div className="flex flex-wrap items-center gap-2">
      {payment.status === 'held' && (
        <>
          <Button
            size="sm"
            onClick={() => {
              const note = ask('Why credit this payment? (kept in the ledger)');
              if (note)
                resolve.mutate(
                  { paymentId: payment.id, decision: 'credit', note },
                  { onError: (e) => setMessage(errorMessage(e)) },
                );
            }}
          >
            Credit
          </Button>
          <Button
            size="sm"
            variant="secondary"
            onClick={() => {
              const note = ask('Why not credit it? (kept in the ledger)');
              if (note)
                resolve.mutate(
                  { paymentId: payment.id, decision: 'dismiss', note },
                  { onError: (e) => setMessage(errorMessage(e)) },
                );
            }}
          >
            Dismiss
          </Button>
        </>
      )}
      {canRefund && (
        <Button
          size="sm"
          variant="ghost"
          onClick={() => {
            const reason = ask(`Refund ${formatMoney(left, payment.currency)}: reason?`);
            if (reason)
              refund.mutate(
                { paymentId: payment.id, amountMinor: left, reason },
                {
                  onError: (e) => setMessage(errorMessage(e)),
                  onSuccess: (r) =>
                    setMessage(
                      r.status === 'pending'
                        ? 'Refund requested; waiting for the provider.'
                        : 'Refunded.',
                    ),
                },
              );
          }}
        >
          Refund
        </Button>
      )}
      {message && (
        <span role="status" className="text-sm">
          {message}
        </span>
      )}
    </div>
  );
}
