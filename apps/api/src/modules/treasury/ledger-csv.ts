import { Op } from 'sequelize';
import { minorToDecimal } from '@app/shared';
import { Payment } from '../../models';
import { csvField } from '../../lib/csv';
import { PAYMENT_INCLUDE } from './ledger.service';

export const LEDGER_COLUMNS = [
  'entry',
  'entry_id',
  'payment_id',
  'date',
  'member_id',
  'member_name',
  'member_email',
  'plan',
  'method',
  'status',
  'amount_minor',
  'currency',
  'amount',
  'covers_from',
  'covers_to',
  'reference',
  'note',
] as const;

/**
 * The ledger as CSV: one row per payment that brought money in (succeeded, held, dismissed) and one per refund
 * (negative amounts). Amounts in minor units and as a decimal in the currency's own digits.
 */
export async function ledgerCsv(): Promise<string> {
  const payments = await Payment.findAll({
    where: { status: { [Op.in]: ['succeeded', 'held', 'dismissed'] } },
    include: PAYMENT_INCLUDE,
    order: [
      ['paidAt', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  type Row = { at: number; recordedAt: number; cells: (string | number | null)[] };
  const rows: Row[] = [];
  for (const p of payments) {
    const member = [p.userId, p.user?.displayName ?? '', p.user?.email ?? '', p.plan?.name ?? ''];
    rows.push({
      at: (p.paidAt ?? p.createdAt).getTime(),
      recordedAt: p.createdAt.getTime(),
      cells: [
        'payment',
        p.id,
        p.id,
        (p.paidAt ?? p.createdAt).toISOString(),
        ...member,
        p.method,
        p.status,
        p.amountMinor,
        p.currency,
        minorToDecimal(p.amountMinor, p.currency),
        p.coversFrom,
        p.coversTo,
        p.reference,
        p.heldReason ?? p.note,
      ],
    });
    const paymentAt = (p.paidAt ?? p.createdAt).getTime();
    for (const r of p.refunds ?? []) {
      const at = r.completedAt ?? r.createdAt;
      rows.push({
        // A payment's date is the day the treasurer entered; a refund never sorts before its payment.
        at: Math.max(at.getTime(), paymentAt),
        recordedAt: r.createdAt.getTime(),
        cells: [
          'refund',
          r.id,
          p.id,
          at.toISOString(),
          ...member,
          p.method,
          r.status,
          -r.amountMinor,
          r.currency,
          minorToDecimal(-r.amountMinor, r.currency),
          null,
          null,
          p.reference,
          r.reason,
        ],
      });
    }
  }
  // By calendar day (UTC), then in the order the entries were recorded: an offline payment carries only the day it
  // was received, so times within one day say nothing about order.
  const day = (ms: number) => Math.floor(ms / 86_400_000);
  // Timestamps have one-second precision; within a second a payment precedes a refund.
  const kind = (r: Row) => (r.cells[0] === 'refund' ? 1 : 0);
  rows.sort((a, b) => day(a.at) - day(b.at) || a.recordedAt - b.recordedAt || kind(a) - kind(b));
  return (
    [LEDGER_COLUMNS.join(','), ...rows.map((r) => r.cells.map(csvField).join(','))].join('\r\n') +
    '\r\n'
  );
}
