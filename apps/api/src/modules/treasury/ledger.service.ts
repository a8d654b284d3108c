import { Op, type Sequelize } from 'sequelize';
import Stripe from 'stripe';
import type { z } from 'zod';
import type {
  offlinePaymentSchema,
  paymentListQuerySchema,
  refundInputSchema,
  resolveHeldSchema,
  returnedInputSchema,
} from '@app/shared';
import { METHOD_LABELS, minorToDecimal } from '@app/shared';
import { formatDate, formatMoney } from '@app/shared/locale';
import type { Env } from '../../config/env';
import { AppError, invalid, notFound } from '../../errors/app-error';
import { Membership, MembershipPlan, Payment, Refund, User } from '../../models';
import { recordAudit } from '../audit/audit.service';
import {
  addDays,
  daysBetween,
  fiscalYearOf,
  fiscalYearStarting,
  quoteFor,
  toIsoDate,
} from '../dues/calendar';
import { owedOn } from '../dues/owed';
import { NO_PROVIDER_REFERENCE } from '../dues/dues.presenter';
import { duesCalendar } from '../dues/dues.service';
import {
  creditMembership,
  queueReceipt,
  reverseCoverIfFullyRefunded,
} from '../dues/ledger-effects';
import { enqueueEmail } from '../mail/outbox.service';
import { actionEmail } from '../mail/templates';
import { stripeClient } from '../../lib/stripe-client';

type OfflineInput = z.output<typeof offlinePaymentSchema>;
type RefundInput = z.output<typeof refundInputSchema>;
type ResolveInput = z.output<typeof resolveHeldSchema>;
type ReturnedInput = z.output<typeof returnedInputSchema>;
type ListQuery = z.output<typeof paymentListQuerySchema>;

const includes = [
  { model: User, as: 'user' },
  { model: MembershipPlan, as: 'plan' },
  { model: Refund, as: 'refunds' },
];

/** Ledger entries, newest first (checkouts still open are left out unless asked for by status). */
export const listPayments = (q: ListQuery) =>
  Payment.findAll({
    where: {
      ...(q.status ? { status: q.status } : { status: { [Op.ne]: 'pending' } }),
      ...(q.userId ? { userId: q.userId } : {}),
    },
    include: includes,
    order: [
      ['paidAt', 'DESC'],
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: 1000,
  });

/** One entry with its member, plan and refunds. */
export async function getPayment(id: number) {
  const p = await Payment.findByPk(id, { include: includes });
  if (!p) throw notFound('Payment');
  return p;
}

/**
 * Records a cheque, cash or bank-transfer payment and credits the member. The date must lie in the current or
 * the previous fiscal year and not in the future; the cover is what the member owed on that date (or the next year
 * when nothing was owed).
 */
export async function recordOfflinePayment(
  actor: User,
  input: OfflineInput,
  deps: { sequelize: Sequelize; env: Env },
  now = new Date(),
) {
  const cal = await duesCalendar();
  const today = toIsoDate(now);
  const thisYear = fiscalYearOf(today, cal);
  const earliest = fiscalYearStarting(Number(thisYear.start.slice(0, 4)) - 1, cal).start;
  const [user, plan] = await Promise.all([
    User.findByPk(input.userId),
    MembershipPlan.findByPk(input.planId),
  ]);
  const fields: Record<string, string> = {};
  if (!user) fields.userId = 'No member with that id';
  if (!plan) fields.planId = 'No plan with that id';
  if (daysBetween(today, input.receivedOn) > 0) fields.receivedOn = 'The date is in the future';
  else if (daysBetween(earliest, input.receivedOn) < 0)
    fields.receivedOn = `The date must fall in the ${thisYear.label} fiscal year or the one before (from ${earliest})`;
  if (plan && input.currency !== plan.currency)
    fields.currency = `The ${plan.name} plan is paid in ${plan.currency}`;
  if (Object.keys(fields).length || !user || !plan) throw invalid(fields);

  return deps.sequelize.transaction(async (t) => {
    const m = await Membership.findOne({
      where: { userId: user.id },
      lock: t.LOCK.UPDATE,
      transaction: t,
    });
    const q = owedOn(
      m ?? { paidThrough: null, joinedOn: input.receivedOn },
      plan,
      input.receivedOn,
      cal,
    );
    let coversFrom: string;
    let coversTo: string;
    if (q) ({ coversFrom, coversTo } = q);
    else {
      const next = fiscalYearOf(addDays(m?.paidThrough ?? input.receivedOn, 1), cal);
      coversFrom = next.start;
      coversTo = next.end;
    }
    const expected = q ? q.totalMinor : plan.amountMinor;
    const payment = await Payment.create(
      {
        userId: user.id,
        planId: plan.id,
        method: input.method,
        status: 'succeeded',
        amountMinor: input.amountMinor,
        currency: plan.currency,
        expectedMinor: expected,
        coversFrom,
        coversTo,
        providerSessionId: null,
        providerPaymentIntentId: null,
        reference: input.reference,
        note: input.note || null,
        heldReason: null,
        recordedById: actor.id,
        paidAt: new Date(`${input.receivedOn}T12:00:00Z`),
      },
      { transaction: t },
    );
    const membership = await creditMembership(payment, t);
    await queueReceipt(payment, deps.env.PUBLIC_URL, t);
    await recordAudit(
      {
        actorId: actor.id,
        area: 'treasury',
        action: 'payment.record-offline',
        subjectType: 'payment',
        subjectId: String(payment.id),
        details: {
          userId: user.id,
          method: input.method,
          amountMinor: input.amountMinor,
          expectedMinor: expected,
          reference: input.reference,
          paidThrough: membership.paidThrough,
        },
      },
      t,
    );
    return payment;
  });
}

export const refundIdempotencyKey = (refundId: number) => `rodewise-refund-${refundId}`;

/**
 * True when the provider's answer never arrived (a timeout, a dropped connection, a 5xx from its side): the
 * request may or may not have been carried out, so nothing may be concluded from it.
 */
function unanswered(err: unknown): boolean {
  if (err instanceof Stripe.errors.StripeConnectionError) {
    // A refused connection never reached the provider: that refund was certainly not made.
    const code = (err.detail as { code?: unknown } | undefined)?.code;
    return code !== 'ECONNREFUSED';
  }
  if (err instanceof Stripe.errors.StripeAPIError) return true;
  const status = (err as { statusCode?: unknown } | null)?.statusCode;
  return typeof status === 'number' && status >= 500;
}

/**
 * Refunds part or all of a payment. Card refunds go through the provider and complete when its webhook says so;
 * offline refunds (money handed back by the treasurer) complete at once. Never more than what is left to refund.
 */
export async function refundPayment(
  actor: User,
  paymentId: number,
  input: RefundInput,
  deps: { sequelize: Sequelize; env: Env },
) {
  const refund = await deps.sequelize.transaction(async (t) => {
    const payment = await Payment.findByPk(paymentId, { lock: t.LOCK.UPDATE, transaction: t });
    if (!payment) throw notFound('Payment');
    if (!['succeeded', 'held', 'dismissed'].includes(payment.status))
      throw new AppError('CONFLICT', 'Only money that was received can be refunded');
    if (payment.method === 'card' && !payment.providerPaymentIntentId)
      throw new AppError('CONFLICT', NO_PROVIDER_REFERENCE);
    const taken = await Refund.sum('amountMinor', {
      where: { paymentId, status: { [Op.ne]: 'failed' } },
      transaction: t,
    });
    const left = payment.amountMinor - (taken ?? 0);
    if (input.amountMinor > left)
      throw invalid({
        amountMinor: `At most ${formatMoney(left, payment.currency)} is left to refund`,
      });
    const offline = payment.method !== 'card';
    const row = await Refund.create(
      {
        paymentId,
        amountMinor: input.amountMinor,
        currency: payment.currency,
        status: offline ? 'succeeded' : 'pending',
        providerRefundId: null,
        reason: input.reason,
        requestedById: actor.id,
        completedAt: offline ? new Date() : null,
      },
      { transaction: t },
    );
    const paidThrough = offline ? await reverseCoverIfFullyRefunded(payment, t) : undefined;
    await recordAudit(
      {
        actorId: actor.id,
        area: 'treasury',
        action: 'refund.request',
        subjectType: 'payment',
        subjectId: String(paymentId),
        reason: input.reason,
        details: { refundId: row.id, amountMinor: input.amountMinor, offline, paidThrough },
      },
      t,
    );
    return { row, intent: payment.providerPaymentIntentId, offline };
  });
  if (refund.offline || !refund.intent) return refund.row;
  try {
    const r = await stripeClient(deps.env).refunds.create(
      {
        payment_intent: refund.intent,
        amount: input.amountMinor,
        metadata: { refundId: String(refund.row.id), paymentId: String(paymentId) },
      },
      // One key per refund row: a retry (the SDK's or ours) can never refund the money twice.
      { idempotencyKey: refundIdempotencyKey(refund.row.id) },
    );
    // The webhook may already have matched the refund by its metadata; only fill the id when still empty.
    await Refund.update(
      { providerRefundId: r.id },
      { where: { id: refund.row.id, providerRefundId: null } },
    );
  } catch (err) {
    if (unanswered(err)) {
      // The provider may have made the refund and only its answer was lost. The refund stays pending (and keeps
      // its amount out of "left to refund"); the provider's refund event settles it either way.
      await recordAudit({
        actorId: actor.id,
        area: 'treasury',
        action: 'refund.provider-unanswered',
        subjectType: 'refund',
        subjectId: String(refund.row.id),
        details: { message: err instanceof Error ? err.message : 'unknown error' },
      });
      return (await Refund.findByPk(refund.row.id)) ?? refund.row;
    }
    await refund.row.update({ status: 'failed', completedAt: new Date() });
    const refused = err instanceof Stripe.errors.StripeInvalidRequestError;
    await recordAudit({
      actorId: actor.id,
      area: 'treasury',
      action: 'refund.provider-error',
      subjectType: 'refund',
      subjectId: String(refund.row.id),
      details: {
        message: err instanceof Error ? err.message : 'unknown error',
        code: refused ? (err.code ?? null) : null,
      },
    });
    // The provider answered and said no: retrying will not help, so say why instead of "try later".
    if (refused && err.code === 'resource_missing')
      throw new AppError(
        'CONFLICT',
        `The payment provider has no record of this card payment (${refund.intent}), so it cannot be refunded by card. Nothing was refunded. ${RETURN_ADVICE}`,
      );
    if (refused)
      throw new AppError(
        'CONFLICT',
        `The payment provider refused the refund: ${err.message} Nothing was refunded. ${RETURN_ADVICE}`,
      );
    throw new AppError(
      'UPSTREAM_UNAVAILABLE',
      'The payment provider refused the refund; nothing was refunded. Try again later.',
    );
  }
  return (await Refund.findByPk(refund.row.id)) ?? refund.row;
}

/** What a treasurer can do when the provider cannot refund a payment (the refund dialog offers it). */
export const RETURN_ADVICE =
  'If you give the money back by bank transfer, cash or cheque, record it with “Record money returned” so the ledger and the member’s dues show it.';

const RETURN_WORDS: Record<ReturnedInput['method'], string> = {
  transfer: 'by bank transfer',
  cash: 'in cash',
  cheque: 'by cheque',
};

/**
 * Records money the treasurer handed back outside the payment provider (a card payment the provider cannot refund,
 * most often): a completed refund row for all that is left, marked with how it went back. A credited payment that
 * is now returned in full gives up its cover (paid-through goes back); a held one is dismissed, so it leaves the
 * queue uncredited. The member is mailed what happened. Sending the same method and note again changes nothing and
 * answers the first record (`replayed`); anything else once nothing is left answers 409.
 */
export async function recordReturned(
  actor: User,
  paymentId: number,
  input: ReturnedInput,
  deps: { sequelize: Sequelize; env: Env },
) {
  return deps.sequelize.transaction(async (t) => {
    const payment = await Payment.findByPk(paymentId, { lock: t.LOCK.UPDATE, transaction: t });
    if (!payment) throw notFound('Payment');
    if (!['succeeded', 'held', 'dismissed'].includes(payment.status))
      throw new AppError('CONFLICT', 'Only money that was received can be returned');
    const refunds = await Refund.findAll({
      where: { paymentId, status: { [Op.ne]: 'failed' } },
      order: [['id', 'ASC']],
      transaction: t,
    });
    const money = (minor: number) => formatMoney(minor, payment.currency);
    const same = refunds.find(
      (r) => r.returnedBy === input.method && r.reason === input.note && r.status === 'succeeded',
    );
    if (same) return { refund: same, replayed: true };
    const left = payment.amountMinor - refunds.reduce((sum, r) => sum + r.amountMinor, 0);
    if (left <= 0) {
      const returned = refunds.find((r) => r.returnedBy);
      const pending = refunds.find((r) => r.status === 'pending');
      throw new AppError(
        'CONFLICT',
        returned
          ? `Already returned: ${money(returned.amountMinor)} went back ${RETURN_WORDS[(returned.returnedBy as ReturnedInput['method'] | null) ?? 'transfer']} on ${formatDate(returned.completedAt ?? returned.createdAt)}. Nothing is left to return.`
          : pending
            ? `A card refund of ${money(pending.amountMinor)} is waiting for the payment provider’s answer, so nothing is left to return. Wait for it to settle; if it fails, record the money returned then.`
            : `Already refunded in full (${money(payment.amountMinor)}). Nothing is left to return.`,
      );
    }
    const row = await Refund.create(
      {
        paymentId,
        amountMinor: left,
        currency: payment.currency,
        status: 'succeeded',
        providerRefundId: null,
        reason: input.note,
        returnedBy: input.method,
        requestedById: actor.id,
        completedAt: new Date(),
      },
      { transaction: t },
    );
    const wasCredited = payment.status === 'succeeded';
    const paidThrough = wasCredited ? await reverseCoverIfFullyRefunded(payment, t) : undefined;
    if (payment.status === 'held')
      await payment.update(
        {
          status: 'dismissed',
          note: `Returned ${RETURN_WORDS[input.method]}: ${input.note}`.slice(0, 500),
          recordedById: actor.id,
        },
        { transaction: t },
      );
    await recordAudit(
      {
        actorId: actor.id,
        area: 'treasury',
        action: 'payment.returned-outside-provider',
        subjectType: 'payment',
        subjectId: String(paymentId),
        reason: input.note,
        details: {
          refundId: row.id,
          amountMinor: left,
          method: input.method,
          wasCredited,
          paidThrough: paidThrough ?? null,
        },
      },
      t,
    );
    const user = await User.findByPk(payment.userId, { transaction: t });
    const m = await Membership.findOne({ where: { userId: payment.userId }, transaction: t });
    if (user) {
      const paidOn = payment.paidAt ? ` on ${formatDate(payment.paidAt)}` : '';
      const dues = m?.paidThrough
        ? `Your dues are now paid through ${formatDate(m.paidThrough)}.`
        : 'Your dues now show as not paid.';
      await enqueueEmail(
        actionEmail({
          to: user.email,
          kind: 'dues-returned',
          subject: `${money(left)} returned to you by the club treasurer`,
          greeting: `Hello ${user.displayName},`,
          lines: [
            `The treasurer returned ${money(left)} to you ${RETURN_WORDS[input.method]}, for your ${METHOD_LABELS[payment.method].toLowerCase()} payment of ${money(payment.amountMinor)}${paidOn}.`,
            ...(payment.method === 'card'
              ? [
                  'It did not go back to your card: the card payment service could not refund it, so it was returned directly.',
                ]
              : []),
            `The treasurer’s note: ${input.note}`,
            wasCredited
              ? paidThrough !== undefined
                ? `This payment no longer counts toward your dues. ${dues}`
                : `Part of this payment was refunded before; what counts toward your dues is unchanged. ${dues}`
              : `This payment was never credited to your dues, so they are as they were. ${dues}`,
          ],
          actionLabel: 'See your dues',
          actionUrl: `${deps.env.PUBLIC_URL}/dues`,
          footer: 'Questions about this go to the club treasurer.',
        }),
        t,
      );
    }
    return { refund: row, replayed: false };
  });
}

/** Settles a held payment: credit it to the member's dues, or dismiss it (kept on the ledger, usually refunded). */
export async function resolveHeld(
  actor: User,
  paymentId: number,
  input: ResolveInput,
  deps: { sequelize: Sequelize; env: Env },
) {
  const cal = await duesCalendar();
  return deps.sequelize.transaction(async (t) => {
    const payment = await Payment.findByPk(paymentId, { lock: t.LOCK.UPDATE, transaction: t });
    if (!payment) throw notFound('Payment');
    if (payment.status !== 'held')
      throw new AppError('CONFLICT', 'Only a held payment can be resolved');
    let paidThrough: string | null = null;
    if (input.decision === 'credit') {
      if (!payment.planId || !payment.coversFrom || !payment.coversTo) {
        const m = await Membership.findOne({ where: { userId: payment.userId }, transaction: t });
        const plan = await MembershipPlan.findByPk(payment.planId ?? m?.planId ?? 0, {
          transaction: t,
        });
        if (!plan)
          throw new AppError(
            'CONFLICT',
            'This member has no plan yet; record the membership with an offline payment instead',
          );
        const on = toIsoDate(payment.paidAt ?? new Date());
        const q = quoteFor(m ?? { paidThrough: null, joinedOn: on }, plan, on, cal);
        const fy = fiscalYearOf(on, cal);
        await payment.update(
          {
            planId: plan.id,
            coversFrom: q?.coversFrom ?? fy.start,
            coversTo: q?.coversTo ?? fy.end,
          },
          { transaction: t },
        );
      }
      await payment.update(
        { status: 'succeeded', note: input.note, recordedById: actor.id },
        { transaction: t },
      );
      paidThrough = (await creditMembership(payment, t)).paidThrough;
      await queueReceipt(payment, deps.env.PUBLIC_URL, t);
    } else {
      await payment.update(
        { status: 'dismissed', note: input.note, recordedById: actor.id },
        { transaction: t },
      );
    }
    await recordAudit(
      {
        actorId: actor.id,
        area: 'treasury',
        action: `payment.resolve-${input.decision}`,
        subjectType: 'payment',
        subjectId: String(paymentId),
        reason: input.note,
        details: { heldReason: payment.heldReason, paidThrough },
      },
      t,
    );
    return payment;
  });
}

/** RFC 4180 field quoting; a leading = + - @ is defused so spreadsheets do not run it as a formula (OWASP CSV injection). */
export function csvField(v: string | number | null): string {
  if (v === null) return '';
  let s = String(v);
  if (typeof v === 'string' && /^[=+\-@\t\r]/.test(s) && !/^-?\d+(\.\d+)?$/.test(s)) s = `'${s}`;
  return /[",\r\n]/.test(s) ? `"${s.replaceAll('"', '""')}"` : s;
}

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
    include: includes,
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
