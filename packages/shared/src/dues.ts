import { z } from 'zod';
import {
  currencySchema,
  minorAmountSchema,
  PLAN_KINDS,
  PRORATIONS,
  type PlanKind,
  type Proration,
} from './dues-terms';

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
  amountMinor: minorAmountSchema('Amount').min(50, 'Amount must be at least 50 cents'),
  currency: currencySchema,
  proration: z.enum(PRORATIONS, { error: 'Choose a proration rule' }),
  lateFeeMinor: minorAmountSchema('Late fee'),
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
