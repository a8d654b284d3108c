import { Op } from 'sequelize';
import type { z } from 'zod';
import type {
  CheckoutDto,
  CheckoutStatusDto,
  checkoutInputSchema,
  DuesQuoteDto,
} from '@app/shared';
import { formatDate, formatMoney } from '@app/shared/locale';
import type { Env } from '../../config/env';
import { AppError, invalid, notFound } from '../../errors/app-error';
import { withNamedLock } from '../../lib/serialize';
import { Membership, MembershipPlan, Payment, type User } from '../../models';
import { cachedClub } from '../club/club-cache';
import { createPayment } from '../payments/new-payment';
import { stripeClient } from '../../lib/stripe-client';
import { toIsoDate } from './calendar';
import { describeQuote, duesCalendar } from './dues.service';
import { ALREADY_PAID } from './ledger-effects';
import { owedOn } from './owed';
import { ownsPayment } from '../../policies/treasury';

type CheckoutInput = z.output<typeof checkoutInputSchema>;

/**
 * Opens a checkout session for what the member owes. The payment row is written first (pending, with the amount
 * expected from the plan); the membership is credited only when the verified webhook says the session was paid.
 * When the provider cannot be reached the row is removed again and UPSTREAM_UNAVAILABLE (503) is thrown.
 */
export async function startCheckout(
  actor: User,
  input: CheckoutInput,
  env: Env,
  now = new Date(),
): Promise<CheckoutDto> {
  const cal = await duesCalendar();
  const today = toIsoDate(now);
  const membership = await Membership.findOne({ where: { userId: actor.id } });
  let planId = membership?.planId;
  if (input.planId && (!membership || !membership.paidThrough)) planId = input.planId;
  if (!planId) throw invalid({ planId: 'Choose a plan to join' });
  const plan = await MembershipPlan.findByPk(planId);
  if (!plan || (!plan.active && planId !== membership?.planId))
    throw invalid({ planId: 'Choose one of the club’s current plans' });
  const q = owedOn(membership ?? { paidThrough: null, joinedOn: today }, plan, today, cal);
  const quote = describeQuote(q, plan);
  if (!quote || !q)
    throw new AppError(
      'CONFLICT',
      membership?.paidThrough
        ? `Your dues are paid through ${formatDate(membership.paidThrough)}; there is nothing to pay yet`
        : 'There is nothing to pay yet',
    );

  // One checkout per member at a time: a named lock per member is held while an open checkout for the same plan
  // and period is looked up (and reused) or a new one is opened, so a double click or a second tab cannot open two.
  const sequelize = Payment.sequelize;
  if (!sequelize) throw new Error('Models are not initialised');
  return withNamedLock(
    sequelize,
    `rodewise:checkout:${actor.id}`,
    async () =>
      (await reusableCheckout(actor, plan, quote, env)) ??
      openCheckout(actor, plan, quote, env, now),
    () =>
      new AppError('CONFLICT', 'Another checkout of yours is being opened; try again in a moment'),
  );
}

/**
 * The member's checkout still open at the provider for the same plan, period and amount, if any. A checkout the
 * provider reports paid, but whose confirmation has not arrived yet, is a CONFLICT: paying again would pay twice.
 * One that expired at the provider is marked expired here and a new one is opened.
 */
async function reusableCheckout(
  actor: User,
  plan: MembershipPlan,
  quote: DuesQuoteDto,
  env: Env,
): Promise<CheckoutDto | null> {
  const pending = await Payment.findAll({
    where: {
      userId: actor.id,
      planId: plan.id,
      method: 'card',
      status: 'pending',
      coversFrom: quote.coversFrom,
      coversTo: quote.coversTo,
      providerSessionId: { [Op.ne]: null },
    },
    order: [['id', 'DESC']],
  });
  const stripe = stripeClient(env);
  for (const p of pending) {
    if (!p.providerSessionId) continue;
    let session: Awaited<ReturnType<typeof stripe.checkout.sessions.retrieve>>;
    try {
      session = await stripe.checkout.sessions.retrieve(p.providerSessionId);
    } catch {
      throw new AppError(
        'UPSTREAM_UNAVAILABLE',
        'The card payment service did not answer. Nothing was charged; please try again in a few minutes.',
      );
    }
    if (session.status === 'complete' || session.payment_status === 'paid')
      throw new AppError(
        'CONFLICT',
        'Your payment for this period is being confirmed by the card service. Wait a minute before paying again.',
      );
    if (session.status === 'expired') {
      await Payment.update({ status: 'expired' }, { where: { id: p.id, status: 'pending' } });
      continue;
    }
    if (p.expectedMinor === quote.amountMinor && session.url)
      return { sessionId: session.id, url: session.url };
    // The amount owed changed (a late fee began, say): the old checkout is closed before a new one opens.
    await stripe.checkout.sessions.expire(session.id).catch(() => undefined);
    await Payment.update({ status: 'expired' }, { where: { id: p.id, status: 'pending' } });
  }
  return null;
}

async function openCheckout(
  actor: User,
  plan: MembershipPlan,
  quote: DuesQuoteDto,
  env: Env,
  now: Date,
): Promise<CheckoutDto> {
  const payment = await createPayment({
    userId: actor.id,
    planId: plan.id,
    method: 'card',
    status: 'pending',
    amountMinor: quote.amountMinor,
    currency: plan.currency,
    expectedMinor: quote.amountMinor,
    coversFrom: quote.coversFrom,
    coversTo: quote.coversTo,
  });
  const stripe = stripeClient(env);
  const metadata = {
    paymentId: String(payment.id),
    userId: String(actor.id),
    planId: String(plan.id),
  };
  // The local payment stand-in heads its page with the club's name and writes money in the club's region.
  const club = await cachedClub();
  try {
    const session = await stripe.checkout.sessions.create({
      mode: 'payment',
      customer_email: actor.email,
      client_reference_id: String(payment.id),
      metadata: {
        ...metadata,
        club_name: club.name.slice(0, 500),
        club_region: club.locale.region,
      },
      payment_intent_data: { metadata, description: `Club dues: ${plan.name}` },
      expires_at: Math.floor(now.getTime() / 1000) + 60 * 60,
      line_items: quote.lines.map((l) => ({
        quantity: 1,
        price_data: {
          currency: plan.currency.toLowerCase(),
          unit_amount: l.amountMinor,
          product_data: { name: l.label },
        },
      })),
      success_url: `${env.PUBLIC_URL}/dues/paid?session_id={CHECKOUT_SESSION_ID}`,
      cancel_url: `${env.PUBLIC_URL}/dues?checkout=cancelled`,
    });
    await payment.update({ providerSessionId: session.id });
    if (!session.url) throw new Error('The provider returned no checkout page');
    return { sessionId: session.id, url: session.url };
  } catch {
    // The provider never opened a checkout, so nothing is recorded: the pending row goes. Should the provider have
    // opened one after all and it gets paid, the webhook finds no row and holds the money for the treasurer.
    await payment.destroy();
    throw new AppError(
      'UPSTREAM_UNAVAILABLE',
      'The card payment service did not answer. Nothing was charged; please try again in a few minutes.',
    );
  }
}

const STATUS_MESSAGES: Record<Payment['status'], string> = {
  pending: 'We are waiting for the payment provider to confirm your payment.',
  succeeded: 'Thank you: your payment is confirmed.',
  held: 'Your payment arrived but did not match your plan. The treasurer will sort it out and contact you.',
  dismissed: 'The treasurer is looking into this payment.',
  failed: 'This checkout did not go through. Nothing was charged.',
  expired: 'This payment page timed out before it was paid. Nothing was charged.',
};

/** The member's own checkout, for the confirmation page; someone else's is not found. */
export async function checkoutStatus(actor: User, sessionId: string): Promise<CheckoutStatusDto> {
  const payment = await Payment.findOne({ where: { providerSessionId: sessionId } });
  if (!payment || !ownsPayment(actor, payment)) throw notFound('Checkout');
  const membership = await Membership.findOne({ where: { userId: actor.id } });
  const message =
    payment.status === 'pending' && payment.note
      ? `${payment.note}. You can go back and try another card.`
      : payment.status === 'held' && payment.heldReason?.startsWith(ALREADY_PAID)
        ? 'Your dues for this period were already paid, so this payment was not credited again. The treasurer will refund it or apply it and contact you.'
        : STATUS_MESSAGES[payment.status];
  return {
    status: payment.status,
    amountMinor: payment.amountMinor,
    currency: payment.currency,
    paidThrough: membership?.paidThrough ?? null,
    message:
      payment.status === 'succeeded' && membership?.paidThrough
        ? `${message} ${formatMoney(payment.amountMinor, payment.currency)} received; your dues now run to ${formatDate(membership.paidThrough)}.`
        : message,
  };
}
