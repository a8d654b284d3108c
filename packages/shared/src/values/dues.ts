// The dues vocabulary: plan kinds, prorations, payment methods and statuses, with the words people read.
import { labelKeys } from './label-keys';

/** How a plan's annual amount is cut for a member who joins after the fiscal year began. */
export const PRORATION_LABELS = {
  none: 'Full year, whenever they join',
  monthly: 'By remaining months (the joining month counts)',
  quarterly: 'By remaining quarters (the joining quarter counts)',
  daily: 'By remaining days',
};

/** What sort of member a plan is for; the treasurer names the plan itself. */
export const PLAN_KIND_LABELS = {
  individual: 'Individual',
  family: 'Family or household',
  junior: 'Junior',
  senior: 'Senior',
  associate: 'Associate (non-sailing)',
  other: 'Other',
};

export const METHOD_LABELS = {
  card: 'Card',
  cheque: 'Cheque',
  cash: 'Cash',
  transfer: 'Bank transfer',
};

/**
 * Ledger statuses as the treasurer reads them. pending: checkout opened · succeeded: credited ·
 * held: money in but not credited until the treasurer decides · dismissed: held and not
 * credited · failed/expired: no money moved.
 */
export const PAYMENT_STATUS_LABELS = {
  pending: 'Checkout open',
  succeeded: 'Credited',
  held: 'Held',
  dismissed: 'Not credited',
  failed: 'Failed',
  expired: 'Expired',
};

/** Derived from the paid-through date and the club calendar. */
export const DUES_STATUS_LABELS = {
  current: 'Current',
  due: 'Due',
  overdue: 'Overdue',
  lapsed: 'Lapsed',
};

// The value lists, in the order of their labels above.
export const PRORATIONS = labelKeys(PRORATION_LABELS);
export const PLAN_KINDS = labelKeys(PLAN_KIND_LABELS);
export const PAYMENT_METHODS = labelKeys(METHOD_LABELS);
export const OFFLINE_METHODS = ['cheque', 'cash', 'transfer'] as const;
export const PAYMENT_STATUSES = labelKeys(PAYMENT_STATUS_LABELS);
export const REFUND_STATUSES = ['pending', 'succeeded', 'failed'] as const;
export const DUES_STATUSES = labelKeys(DUES_STATUS_LABELS);

export type Proration = (typeof PRORATIONS)[number];
export type PlanKind = (typeof PLAN_KINDS)[number];
export type PaymentMethod = (typeof PAYMENT_METHODS)[number];
export type OfflineMethod = (typeof OFFLINE_METHODS)[number];
export type PaymentStatus = (typeof PAYMENT_STATUSES)[number];
export type RefundStatus = (typeof REFUND_STATUSES)[number];
export type DuesStatus = (typeof DUES_STATUSES)[number];
