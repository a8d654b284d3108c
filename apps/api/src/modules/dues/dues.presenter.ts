import type { PaymentDto, PlanDto, RefundDto } from '@app/shared';
import type { MembershipPlan, Payment, Refund } from '../../models';

/** Why a card payment without a payment-intent id cannot be refunded (the refund answer and the ledger say it). */
export const NO_PROVIDER_REFERENCE =
  'This card payment has no reference at the payment provider, so it cannot be refunded by card. Hand the money back another way and note it on the entry.';

/** What a plan shows outside the server. */
export function toPlanDto(p: MembershipPlan): PlanDto {
  return {
    id: p.id,
    code: p.code,
    name: p.name,
    kind: p.kind,
    description: p.description,
    amountMinor: p.amountMinor,
    currency: p.currency,
    proration: p.proration,
    lateFeeMinor: p.lateFeeMinor,
    graceDays: p.graceDays,
    active: p.active,
  };
}

/** A refund entry. */
export function toRefundDto(r: Refund): RefundDto {
  return {
    id: r.id,
    paymentId: r.paymentId,
    amountMinor: r.amountMinor,
    currency: r.currency,
    status: r.status,
    reason: r.reason,
    returnedBy: r.returnedBy ?? null,
    createdAt: r.createdAt.toISOString(),
    completedAt: r.completedAt?.toISOString() ?? null,
  };
}

/** A payment entry with its refunds (load `user`, `plan` and `refunds` first). */
export function toPaymentDto(p: Payment): PaymentDto {
  const refunds = (p.refunds ?? []).slice().sort((a, b) => a.id - b.id);
  return {
    id: p.id,
    userId: p.userId,
    memberName: p.user?.displayName ?? '',
    planName: p.plan?.name ?? null,
    method: p.method,
    status: p.status,
    amountMinor: p.amountMinor,
    currency: p.currency,
    expectedMinor: p.expectedMinor,
    refundedMinor: refunds
      .filter((r) => r.status === 'succeeded')
      .reduce((s, r) => s + r.amountMinor, 0),
    coversFrom: p.coversFrom,
    coversTo: p.coversTo,
    reference: p.reference,
    note: p.note,
    heldReason: p.heldReason,
    cardRefundBlocked:
      p.method === 'card' && !p.providerPaymentIntentId ? NO_PROVIDER_REFERENCE : null,
    paidAt: p.paidAt?.toISOString() ?? null,
    createdAt: p.createdAt.toISOString(),
    refunds: refunds.map(toRefundDto),
  };
}
