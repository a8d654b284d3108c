import type { PaymentDto } from '@app/shared';
import { METHOD_LABELS, PAYMENT_STATUS_LABELS } from '@app/shared/values';
import { formatMoney } from '@app/shared/locale';
import { readableDate } from '@/lib/format-date';
import { PaymentRowActions } from './payment-row-actions';
import { ScrollRegion } from '@/components/ui/scroll-region';

const RETURNED_WORDS = { transfer: 'by transfer', cash: 'in cash', cheque: 'by cheque' } as const;

function Refunds({ payment: p }: { payment: PaymentDto }) {
  return p.refunds.map((r) => (
    <p key={r.id} className="text-xs">
      −{formatMoney(r.amountMinor, r.currency)}{' '}
      {r.returnedBy ? `returned ${RETURNED_WORDS[r.returnedBy]}` : 'refund'} ({r.status})
    </p>
  ));
}

const dateOf = (p: PaymentDto) => readableDate(p.paidAt ?? p.createdAt);

/**
 * Ledger entries with their refunds and actions: a table from `md` up, and below it one card per entry, so the
 * status and the actions stay on screen at a phone's width without scrolling sideways.
 */
export function PaymentsTable({ payments, caption }: { payments: PaymentDto[]; caption: string }) {
  return (
    <>
      <ul
        aria-label={caption}
        className="flex flex-col gap-2 md:hidden"
        data-testid="payment-cards"
      >
        {payments.map((p) => (
          <li
            key={p.id}
            className="flex flex-col gap-1 rounded-lg border border-sand-300 bg-sand-50 p-3 text-sm"
          >
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <span className="font-bold">{p.memberName}</span>
              <span className="font-bold tabular-nums">
                {formatMoney(p.amountMinor, p.currency)}
              </span>
            </div>
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <span>
                {dateOf(p)} · {METHOD_LABELS[p.method]}
                {p.reference ? ` · ${p.reference}` : ''}
              </span>
              <span data-testid="payment-status" className="font-bold">
                {PAYMENT_STATUS_LABELS[p.status]}
              </span>
            </div>
            {p.heldReason && <p className="text-xs text-flare-700">{p.heldReason}</p>}
            <Refunds payment={p} />
            <PaymentRowActions payment={p} />
          </li>
        ))}
      </ul>
      <ScrollRegion label={caption} className="hidden md:block">
        <table className="w-full text-sm">
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
                <td className="whitespace-nowrap px-2 py-1">{dateOf(p)}</td>
                <td className="px-2 py-1">
                  {p.memberName}
                  {p.heldReason && <p className="text-xs text-flare-700">{p.heldReason}</p>}
                </td>
                <td className="px-2 py-1">
                  {METHOD_LABELS[p.method]}
                  {p.reference ? ` · ${p.reference}` : ''}
                </td>
                <td className="px-2 py-1">{PAYMENT_STATUS_LABELS[p.status]}</td>
                <td className="px-2 py-1 text-right tabular-nums">
                  {formatMoney(p.amountMinor, p.currency)}
                  <Refunds payment={p} />
                </td>
                <td className="px-2 py-1">
                  <PaymentRowActions payment={p} />
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollRegion>
    </>
  );
}
