import type { PaymentDto } from '@app/shared';
import { METHOD_LABELS } from '@app/shared/values';
import { formatMoney } from '@app/shared/locale';
import { readableDate } from '@/lib/format-date';

const STATUS_WORDS: Record<PaymentDto['status'], string> = {
  pending: 'Waiting',
  succeeded: 'Received',
  held: 'With the treasurer',
  dismissed: 'With the treasurer',
  failed: 'Not charged',
  expired: 'Not charged (payment page timed out)',
};

/** The member's own recent payments. */
export function PaymentHistory({ payments }: { payments: PaymentDto[] }) {
  if (payments.length === 0) return <p className="text-sm text-ink-700">No payments yet.</p>;
  return (
    <ul className="flex flex-col gap-2">
      {payments.map((p) => (
        <li
          key={p.id}
          className="flex flex-wrap justify-between gap-2 border-t border-sand-300 py-2"
        >
          <span>
            <time dateTime={p.paidAt ?? p.createdAt}>{readableDate(p.paidAt ?? p.createdAt)}</time>{' '}
            · {METHOD_LABELS[p.method]}
            {p.coversTo && (
              <>
                {' '}
                · covers to <time dateTime={p.coversTo}>{readableDate(p.coversTo)}</time>
              </>
            )}
          </span>
          <span className="tabular-nums">
            {formatMoney(p.amountMinor, p.currency)} · {STATUS_WORDS[p.status]}
            {p.refundedMinor > 0 ? ` · ${formatMoney(p.refundedMinor, p.currency)} refunded` : ''}
          </span>
        </li>
      ))}
    </ul>
  );
}
