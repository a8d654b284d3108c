import { formatMoney, METHOD_LABELS, type PaymentDto } from '@app/shared';
import { PaymentRowActions } from './payment-row-actions';
import { ScrollRegion } from '../../../components/ui/scroll-region';
import { readableDate } from '../../../lib/format-date';

/** Ledger entries with their refunds and actions. */
export function PaymentsTable({ payments, caption }: { payments: PaymentDto[]; caption: string }) {
  return (
    <ScrollRegion label={caption}>
      <table className="w-full min-w-[40rem] text-sm">
        <caption className="text-left font-bold">{caption}</caption>
        <thead>
          <tr className="border-b-2 border-ink-700 text-left">
            <th scope="col" className="px-2">
              Date
            </th>
            <th scope="col" className="px-2">
              Member
            </th>
            <th scope="col" className="px-2">
              Method
            </th>
            <th scope="col" className="px-2">
              Status
            </th>
            <th scope="col" className="px-2 text-right">
              Amount
            </th>
            <th scope="col" className="px-2">
              Actions
            </th>
          </tr>
        </thead>
        <tbody>
          {payments.map((p) => (
            <tr key={p.id} className="border-b border-sand-300 align-top">
              <td className="px-2 py-1">
                <time dateTime={p.paidAt ?? p.createdAt}>
                  {readableDate(p.paidAt ?? p.createdAt)}
                </time>
              </td>
              <td className="px-2 py-1">
                {p.memberName}
                {p.heldReason && <p className="text-xs text-flare-700">{p.heldReason}</p>}
              </td>
              <td className="px-2 py-1">
                {METHOD_LABELS[p.method]}
                {p.reference ? ` · ${p.reference}` : ''}
              </td>
              <td className="px-2 py-1">{p.status}</td>
              <td className="px-2 py-1 text-right tabular-nums">
                {formatMoney(p.amountMinor, p.currency)}
                {p.refunds.map((r) => (
                  <p key={r.id} className="text-xs">
                    −{formatMoney(r.amountMinor, r.currency)} refund ({r.status})
                  </p>
                ))}
              </td>
              <td className="px-2 py-1">
                <PaymentRowActions payment={p} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
