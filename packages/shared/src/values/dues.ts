// The dues vocabulary: plan kinds, prorations, payment methods and statuses, with the words people read.
/** How a plan's annual amount is cut for a member who joins after the fiscal year began. */
export const PRORATIONS = ['none', 'monthly', 'quarterly', 'daily'] as const;
export type Proration = (typeof PRORATIONS)[number];
export const PRORATION_LABELS: Record<Proration, string> = {
  none: 'Full year, whenever they join',
  monthly: 'By remaining months (the joining month counts)',
  quarterly: 'By remaining quarters (the joining quarter counts)',
  daily: 'By remaining days',
};

/** What sort of member a plan is for; the treasurer names the plan itself. */
export const PLAN_KINDS = [
  'individual',
  'family',
  'junior',
  'senior',
  'associate',
  'other',
] as const;
export type PlanKind = (typeof PLAN_KINDS)[number];
export const PLAN_KIND_LABELS: Record<PlanKind, string> = {
  individual: 'Individual',
  family: 'Family or household',
  junior: 'Junior',
  senior: 'Senior',
  associate: 'Associate (non-sailing)',
  other: 'Other',
};

export const PAYMENT_METHODS = ['card', 'cheque', 'cash', 'transfer'] as const;
export type PaymentMethod = (typeof PAYMENT_METHODS)[number];
export const OFFLINE_METHODS = ['cheque', 'cash', 'transfer'] as const;
export type OfflineMethod = (typeof OFFLINE_METHODS)[number];
export const METHOD_LABELS: Record<PaymentMethod, string> = {
  card: 'Card',
  cheque: 'Cheque',
  cash: 'Cash',
  transfer: 'Bank transfer',
};

/** pending: checkout opened · succeeded: credited · held: money in but not credited until the treasurer decides · dismissed: held and not credited · failed/expired: no money moved. */
export const PAYMENT_STATUSES = [
  'pending',
  'succeeded',
  'held',
  'dismissed',
  'failed',
  'expired',
] as const;
export type PaymentStatus = (typeof PAYMENT_STATUSES)[number];
/** Ledger statuses as the treasurer reads them. */
export const PAYMENT_STATUS_LABELS: Record<PaymentStatus, string> = {
  pending: 'Checkout open',
  succeeded: 'Credited',
  held: 'Held',
  dismissed: 'Not credited',
  failed: 'Failed',
  expired: 'Expired',
};
export const REFUND_STATUSES = ['pending', 'succeeded', 'failed'] as const;
export type RefundStatus = (typeof REFUND_STATUSES)[number];

/** Derived from the paid-through date and the club calendar. */
export const DUES_STATUSES = ['current', 'due', 'overdue', 'lapsed'] as const;
export type DuesStatus = (typeof DUES_STATUSES)[number];
export const DUES_STATUS_LABELS: Record<DuesStatus, string> = {
  current: 'Current',
  due: 'Due',
  overdue: 'Overdue',
  lapsed: 'Lapsed',
};

// Field schemas the plan, calendar and payment schemas share.
