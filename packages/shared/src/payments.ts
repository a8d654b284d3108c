// Payments and refunds, the member's dues page and checkout, the roster, reminders and the treasurer's summary.
import { z } from 'zod';
import type { DuesQuoteDto, FiscalYearDto, PlanDto } from './dues';
import {
  currencySchema,
  isoDate,
  minorAmountSchema,
  OFFLINE_METHODS,
  PAYMENT_STATUSES,
  type DuesStatus,
  type OfflineMethod,
  type PaymentMethod,
  type PaymentStatus,
  type RefundStatus,
} from './dues-terms';
export { minorToDecimal } from './locale-format';

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
  amountMinor: minorAmountSchema('Amount').min(1, 'Amount must be more than zero'),
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
  amountMinor: minorAmountSchema('Amount').min(1, 'Amount must be more than zero'),
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
