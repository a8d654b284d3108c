import type { PaymentDto } from '@app/shared';
import { formatMoney } from '@app/shared/locale';
import { Suspense, useState } from 'react';
import { Button } from '@/components/ui/button';
import { usePromptDialog } from '@/components/ui/prompt-dialog';
import { errorMessage } from '@/lib/form-errors';
import { useRecordReturned } from '../api/record-returned';
import { useRefundPayment } from '../api/refund-payment';
import { useResolveHeld } from '../api/resolve-held';
import { refundableMinor } from '../utils/refundable';
import { lazyNamed } from '@/lib/lazy-named';

// Opened from a row's button, so it loads then, not with the ledger.
const RefundDialog = lazyNamed(() => import('./refund-dialog'), 'RefundDialog');

const REFUNDABLE = ['succeeded', 'held', 'dismissed'];

/** Refund (in full or in part) and, for held payments, credit / dismiss, each asking for a reason for the ledger. */
export function PaymentRowActions({ payment }: { payment: PaymentDto }) {
  const refund = useRefundPayment();
  const returned = useRecordReturned();
  const [startReturned, setStartReturned] = useState(false);
  const resolve = useResolveHeld();
  const { ask, dialog } = usePromptDialog();
  const [isRefunding, setIsRefunding] = useState(false);
  const [message, setMessage] = useState('');
  const left = refundableMinor(payment);
  const canRefund = REFUNDABLE.includes(payment.status) && left > 0;

  const decide = async (decision: 'credit' | 'dismiss') => {
    const note = await ask(
      decision === 'credit'
        ? {
            title: `Credit ${formatMoney(payment.amountMinor, payment.currency)} to ${payment.memberName}?`,
            label: 'Why credit this payment',
            hint: 'Kept in the ledger and the audit log.',
            confirmLabel: 'Credit',
            maxLength: 500,
          }
        : {
            title: `Dismiss ${formatMoney(payment.amountMinor, payment.currency)} from ${payment.memberName}?`,
            label: 'Why not credit it',
            hint: 'The entry stays in the ledger; refund it if the money should go back.',
            confirmLabel: 'Dismiss',
            maxLength: 500,
            isDestructive: true,
          },
    );
    if (!note) return;
    resolve.mutate(
      { paymentId: payment.id, decision, note },
      {
        onError: (e) => setMessage(errorMessage(e)),
        onSuccess: () => setMessage(decision === 'credit' ? 'Credited.' : 'Dismissed.'),
      },
    );
  };

  return (
    <div className="flex flex-wrap items-center gap-2">
      {payment.status === 'held' && (
        <>
          <Button size="sm" onClick={() => void decide('credit')}>
            Credit
          </Button>
          <Button size="sm" variant="secondary" onClick={() => void decide('dismiss')}>
            Dismiss
          </Button>
        </>
      )}
      {canRefund && payment.cardRefundBlocked && (
        <>
          <p className="max-w-xs text-xs text-ink-700">{payment.cardRefundBlocked}</p>
          <Button
            size="sm"
            variant="ghost"
            aria-label={`Record money returned to ${payment.memberName}, ${formatMoney(left, payment.currency)}`}
            onClick={() => {
              setMessage('');
              setStartReturned(true);
              setIsRefunding(true);
            }}
          >
            Record money returned
          </Button>
        </>
      )}
      {canRefund && !payment.cardRefundBlocked && (
        <Button
          size="sm"
          variant="ghost"
          aria-label={`Refund ${payment.memberName}, ${formatMoney(payment.amountMinor, payment.currency)}`}
          onClick={() => {
            setMessage('');
            setStartReturned(false);
            setIsRefunding(true);
          }}
        >
          Refund
        </Button>
      )}
      {isRefunding && (
        <Suspense fallback={null}>
          <RefundDialog
            payment={payment}
            startReturned={startReturned}
            onClose={() => setIsRefunding(false)}
            onReturned={async (input) => {
              const r = await returned.mutateAsync({ paymentId: payment.id, ...input });
              setMessage(
                `Recorded ${formatMoney(r.amountMinor, r.currency)} returned; the member is told by e-mail.`,
              );
            }}
            onSubmit={async (input) => {
              const r = await refund.mutateAsync({ paymentId: payment.id, ...input });
              setMessage(
                r.status === 'pending'
                  ? `Refund of ${formatMoney(r.amountMinor, r.currency)} requested; waiting for the provider.`
                  : `Refunded ${formatMoney(r.amountMinor, r.currency)}.`,
              );
            }}
          />
        </Suspense>
      )}
      {dialog}
      {message && (
        <span role="status" className="text-sm">
          {message}
        </span>
      )}
    </div>
  );
}
