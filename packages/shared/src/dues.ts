import { currencyDigits } from './locale-format';
import { z } from 'zod';

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

/** A calendar date, YYYY-MM-DD, that really exists. */
export const isoDate = z
  .string({ error: 'Give a date' })
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Use the form YYYY-MM-DD')
  .refine((s) => {
    const d = new Date(`${s}T00:00:00Z`);
    return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === s;
  }, 'That date does not exist');

const minor = (label: string) =>
  z
    .number({ error: `${label} must be a number` })
    .int(`${label} must be a whole number of cents`)
    .min(0, `${label} cannot be negative`)
    .max(100_000_000, `${label} is too large`);

export const currencySchema = z
  .string({ error: 'Give a currency' })
  .trim()
  .regex(/^[A-Za-z]{3}$/, 'Use a three-letter currency code such as EUR')
  .transform((s) => s.toUpperCase());

const graceDaysSchema = z
  .number({ error: 'Grace period must be a number' })
  .int('Grace period must be whole days')
  .min(0, 'Grace period cannot be negative')
  .max(180, 'Grace period can be at most 180 days');

// The fields without defaults: a partial change must leave unnamed fields alone, and zod applies a default
// even inside .partial().
const planFields = z.object({
  code: z
    .string({ error: 'Give a short code' })
    .trim()
    .regex(/^[a-z0-9-]{2,40}$/, 'Use 2–40 lower-case letters, digits or dashes'),
  name: z
    .string({ error: 'Name is required' })
    .trim()
    .min(2, 'Name is required')
    .max(80, 'Keep the name under 80 characters'),
  kind: z.enum(PLAN_KINDS, { error: 'Choose who the plan is for' }),
  description: z.string().trim().max(500, 'Keep the description under 500 characters'),
  amountMinor: minor('Amount').min(50, 'Amount must be at least 50 cents'),
  currency: currencySchema,
  proration: z.enum(PRORATIONS, { error: 'Choose a proration rule' }),
  lateFeeMinor: minor('Late fee'),
  graceDays: graceDaysSchema,
  active: z.boolean({ error: 'Say whether the plan is open to members' }),
});

/** A plan as the treasurer defines it. */
export const planInputSchema = planFields.extend({
  kind: planFields.shape.kind.default('individual'),
  description: planFields.shape.description.default(''),
  lateFeeMinor: planFields.shape.lateFeeMinor.default(0),
  graceDays: graceDaysSchema.default(30),
  active: planFields.shape.active.default(true),
});
export type PlanInput = z.input<typeof planInputSchema>;
/** A change to a plan: only the named fields change; the code is fixed. */
export const planPatchSchema = planFields
  .omit({ code: true })
  .partial()
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change' });
export type PlanPatch = z.input<typeof planPatchSchema>;

export interface PlanDto {
  id: number;
  code: string;
  name: string;
  kind: PlanKind;
  description: string;
  amountMinor: number;
  currency: string;
  proration: Proration;
  lateFeeMinor: number;
  graceDays: number;
  active: boolean;
}

/** The club's fiscal year as the dues rules see it. */
export interface FiscalYearDto {
  start: string;
  end: string;
  label: string;
}

/** The club's dues calendar as the treasurer sets it. Grace periods and late fees belong to each plan. */
export const duesCalendarSchema = z.object({
  fiscalYearStartMonth: z
    .number({ error: 'Choose the month the fiscal year starts' })
    .int('Choose a month')
    .min(1, 'Choose a month')
    .max(12, 'Choose a month'),
  fiscalYearStartDay: z
    .number({ error: 'Give the day the fiscal year starts' })
    .int('The day must be a whole number')
    .min(1, 'The day must be between 1 and 28')
    .max(28, 'The day must be between 1 and 28, so every year has it'),
  renewalWindowDays: z
    .number({ error: 'Give the renewal window in days' })
    .int('The renewal window must be whole days')
    .min(0, 'The renewal window cannot be negative')
    .max(120, 'The renewal window can be at most 120 days'),
  lapseAfterDays: z
    .number({ error: 'Give the days until a membership lapses' })
    .int('Lapsing must be whole days')
    .min(1, 'A membership lapses at least one day after it is due')
    .max(730, 'Lapsing can be at most 730 days after the due date'),
});
export type DuesCalendarInput = z.input<typeof duesCalendarSchema>;

/** A proposed fiscal-year start, previewed before it is saved. */
export const calendarPreviewQuerySchema = z.object({
  fiscalYearStartMonth: z.coerce.number().pipe(duesCalendarSchema.shape.fiscalYearStartMonth),
  fiscalYearStartDay: z.coerce.number().pipe(duesCalendarSchema.shape.fiscalYearStartDay),
});

/** What joining today costs on one plan under a calendar. */
export interface JoinPreviewDto {
  planId: number;
  planName: string;
  proration: Proration;
  currency: string;
  fullMinor: number;
  joinMinor: number;
  coversFrom: string;
  coversTo: string;
}

/** A calendar with the fiscal years it gives and what a member joining today would pay on each active plan. */
export interface DuesCalendarDto {
  calendar: z.output<typeof duesCalendarSchema>;
  today: string;
  fiscalYear: FiscalYearDto;
  nextFiscalYear: FiscalYearDto;
  joinToday: JoinPreviewDto[];
}

export interface QuoteLineDto {
  label: string;
  amountMinor: number;
}

/** What a member owes now and why. */
export interface DuesQuoteDto {
  planId: number;
  planName: string;
  currency: string;
  amountMinor: number;
  lines: QuoteLineDto[];
  coversFrom: string;
  coversTo: string;
  reason: string;
}

export interface PaymentDto {
  id: number;
  userId: number;
  memberName: string;
  planName: string | null;
  method: PaymentMethod;
  status: PaymentStatus;
  amountMinor: number;
  currency: string;
  expectedMinor: number | null;
  refundedMinor: number;
  coversFrom: string | null;
  coversTo: string | null;
  reference: string | null;
  note: string | null;
  heldReason: string | null;
  /** Set when a card payment cannot be refunded through the provider, saying why. */
  cardRefundBlocked: string | null;
  paidAt: string | null;
  createdAt: string;
  refunds: RefundDto[];
}

export interface RefundDto {
  id: number;
  paymentId: number;
  amountMinor: number;
  currency: string;
  status: RefundStatus;
  reason: string;
  /** Set when the money went back outside the payment provider. */
  returnedBy: OfflineMethod | null;
  createdAt: string;
  completedAt: string | null;
}

export interface MyDuesDto {
  fiscalYear: FiscalYearDto;
  membership: {
    planId: number;
    planName: string;
    joinedOn: string;
    paidThrough: string | null;
  } | null;
  status: DuesStatus | null;
  paidUp: boolean;
  quote: DuesQuoteDto | null;
  /** For a member who has never paid: what joining on each active plan costs today. */
  offers: DuesQuoteDto[];
  plans: PlanDto[];
  payments: PaymentDto[];
}

export const checkoutInputSchema = z.object({
  planId: z.number({ error: 'Choose a plan' }).int().positive('Choose a plan').optional(),
});
export type CheckoutInput = z.input<typeof checkoutInputSchema>;

export interface CheckoutDto {
  sessionId: string;
  url: string;
}

export interface CheckoutStatusDto {
  status: PaymentStatus;
  amountMinor: number;
  currency: string;
  paidThrough: string | null;
  message: string;
}

export interface RosterRowDto {
  userId: number;
  displayName: string;
  email: string;
  planId: number | null;
  planName: string | null;
  joinedOn: string | null;
  paidThrough: string | null;
  status: DuesStatus | null;
  owedMinor: number;
  currency: string | null;
  lastPaidAt: string | null;
}

export const offlinePaymentSchema = z.object({
  userId: z.number({ error: 'Choose a member' }).int().positive('Choose a member'),
  planId: z.number({ error: 'Choose a plan' }).int().positive('Choose a plan'),
  method: z.enum(OFFLINE_METHODS, { error: 'Choose cheque, cash or bank transfer' }),
  amountMinor: minor('Amount').min(1, 'Amount must be more than zero'),
  currency: currencySchema,
  receivedOn: isoDate,
  reference: z
    .string({ error: 'Give a reference' })
    .trim()
    .min(1, 'Give a reference (cheque number, receipt or transfer id)')
    .max(120, 'Keep the reference under 120 characters'),
  note: z.string().trim().max(500, 'Keep the note under 500 characters').default(''),
});
export type OfflinePaymentInput = z.input<typeof offlinePaymentSchema>;

export const refundInputSchema = z.object({
  amountMinor: minor('Amount').min(1, 'Amount must be more than zero'),
  reason: z
    .string({ error: 'Give a reason' })
    .trim()
    .min(3, 'Give a reason')
    .max(500, 'Keep the reason under 500 characters'),
});
export type RefundInput = z.input<typeof refundInputSchema>;

/** Money the treasurer handed back outside the payment provider: how, and a note for the ledger and the member. */
export const returnedInputSchema = z.object({
  method: z.enum(OFFLINE_METHODS, {
    error: 'Choose how the money went back: bank transfer, cash or cheque',
  }),
  note: z
    .string({ error: 'Say how and when the money went back' })
    .trim()
    .min(3, 'Say how and when the money went back (for the ledger and the member)')
    .max(500, 'Keep the note under 500 characters'),
});
export type ReturnedInput = z.input<typeof returnedInputSchema>;

export const resolveHeldSchema = z.object({
  decision: z.enum(['credit', 'dismiss'], { error: 'Choose credit or dismiss' }),
  note: z
    .string({ error: 'Give a note' })
    .trim()
    .min(3, 'Say why, for the ledger')
    .max(500, 'Keep the note under 500 characters'),
});
export type ResolveHeldInput = z.input<typeof resolveHeldSchema>;

export const reminderInputSchema = z.object({
  userIds: z
    .array(z.number().int().positive(), { error: 'Choose members' })
    .min(1, 'Choose at least one member')
    .max(500, 'At most 500 members at once'),
});
export type ReminderInput = z.input<typeof reminderInputSchema>;

export interface ReminderPreviewDto {
  recipients: {
    userId: number;
    displayName: string;
    email: string;
    status: DuesStatus;
    owedMinor: number;
    currency: string;
  }[];
  skipped: { userId: number; reason: string }[];
  subject: string;
  sampleText: string;
}

export const paymentListQuerySchema = z.object({
  status: z.enum(PAYMENT_STATUSES).optional(),
  userId: z.coerce.number().int().positive().optional(),
});

export const summaryQuerySchema = z.object({
  fiscalYear: z.coerce.number().int().min(2000).max(2100).optional(),
});

export interface SummaryMonthDto {
  month: string;
  collectedMinor: number;
  expectedMinor: number;
}

export interface SummaryDto {
  fiscalYear: FiscalYearDto;
  currency: string;
  months: SummaryMonthDto[];
  collectedMinor: number;
  /** Refunds of credited payments completed in the year, already taken off Collected. */
  refundedMinor: number;
  expectedMinor: number;
  outstandingMinor: number;
  heldCount: number;
  counts: Record<DuesStatus, number>;
  /** What is in each tile, so the tiles can be reconciled (see `summary()` in the treasury module). */
  breakdown: SummaryBreakdownDto;
}

export interface SummaryBreakdownDto {
  /** Memberships whose dues are in Expected. */
  memberCount: number;
  /** Of them, members who joined during the year and owe a prorated share. */
  proratedCount: number;
  /** Full-year price of those memberships minus Expected: what proration took off. */
  prorationMinor: number;
  /** Collected, net of refunds of credited payments, for cover that starts in this fiscal year. */
  collectedThisYearMinor: number;
  /** In Collected but for another year: renewals paid ahead, arrears, net of their refunds. */
  collectedOtherYearsMinor: number;
  /** Refunds (or money returned) of payments never credited (held, dismissed): not in Collected or refunds. */
  refundedOfUncreditedMinor: number;
  /** Late fees inside Outstanding. */
  outstandingLateFeesMinor: number;
  /** Held payments in the summary currency: received but not in Collected. */
  heldMinor: number;
  /** Expected − collected this year − outstanding dues: late fees paid, amounts above or below the quote, waived dues. */
  differenceMinor: number;
}

/** Integer minor units as a plain decimal string: 12050 EUR → "120.50", −3000 → "-30.00". */
export function minorToDecimal(amountMinor: number, currency: string): string {
  const digits = currencyDigits(currency);
  return (amountMinor / 10 ** digits).toFixed(digits);
}
