import { formatMoney } from '@app/shared/locale';
import { quoteFor, type DuesCalendar, type QuotePlan, type QuoteResult } from './calendar';

/** A quote with its total: the dues for the cover (prorated by the plan's rule) plus any late fee. */
export interface Owed extends QuoteResult {
  totalMinor: number;
}

/**
 * What a member owes on `today`, or null when nothing is owed yet. This is the one figure the member's dues page
 * shows, the checkout charges (and stores as the payment's expected amount), the provider's webhook checks a card
 * payment against, the treasurer's roster and reminders quote and the record-payment form proposes.
 */
export function owedOn(
  m: { paidThrough: string | null; joinedOn: string },
  plan: QuotePlan,
  today: string,
  cal: DuesCalendar,
): Owed | null {
  const q = quoteFor(m, plan, today, cal);
  return q ? { ...q, totalMinor: q.duesMinor + q.lateFeeMinor } : null;
}

/** How a payment of the wrong amount is described to the treasurer, in the club's money format. */
export function amountMismatchReason(
  paidMinor: number,
  expectedMinor: number,
  currency: string,
): string {
  return `${formatMoney(paidMinor, currency)} paid, ${formatMoney(expectedMinor, currency)} expected`;
}
