import type { z } from 'zod';
import type { planInputSchema, planPatchSchema } from '@app/shared';
import { invalid, notFound } from '../../errors/app-error';
import { MembershipPlan, Payment, type User } from '../../models';
import { recordAudit } from '../audit/audit.service';
import { countOf } from '@app/shared';

type PlanInput = z.output<typeof planInputSchema>;
type PlanPatch = z.output<typeof planPatchSchema>;

/** Every plan, active first. */
export const listPlans = () =>
  MembershipPlan.findAll({
    order: [
      ['active', 'DESC'],
      ['amountMinor', 'DESC'],
    ],
  });

/** Adds a plan. Throws VALIDATION_FAILED (field `code`) when another plan already uses the code. */
export async function createPlan(actor: User, input: PlanInput) {
  if (await MembershipPlan.findOne({ where: { code: input.code } }))
    throw invalid({ code: 'Another plan already uses this code' });
  const plan = await MembershipPlan.create(input);
  await recordAudit({
    actorId: actor.id,
    area: 'treasury',
    action: 'plan.create',
    subjectType: 'membership_plan',
    subjectId: String(plan.id),
    details: input,
  });
  return plan;
}

/** plan.retire / plan.reactivate when only the active flag changes, plan.update otherwise. */
function actionFor(changes: Record<string, { before: unknown; after: unknown }>) {
  const keys = Object.keys(changes);
  if (keys.length === 1 && keys[0] === 'active')
    return changes.active?.after ? 'plan.reactivate' : 'plan.retire';
  return 'plan.update';
}

/**
 * Changes a plan. Amounts, fees and rules apply to checkouts opened from now on: payments already made (and
 * checkouts already open) keep the amounts they were made for. The currency is fixed once money has come in
 * on the plan (VALIDATION_FAILED on `currency`); retire the plan and create another instead.
 * Audited with the fields that changed, before and after. Throws NOT_FOUND for an unknown plan.
 */
export async function updatePlan(actor: User, planId: number, patch: PlanPatch) {
  const plan = await MembershipPlan.findByPk(planId);
  if (!plan) throw notFound('Plan');
  if (patch.currency && patch.currency !== plan.currency) {
    const payments = await Payment.count({ where: { planId } });
    if (payments > 0)
      throw invalid({
        currency: `${countOf(payments, 'payment was', 'payments were')} made in ${plan.currency} on this plan; retire it and create a new plan for another currency`,
      });
  }
  const changes: Record<string, { before: unknown; after: unknown }> = {};
  for (const [key, after] of Object.entries(patch) as [keyof PlanPatch, unknown][]) {
    const before: unknown = plan.get(key);
    if (after !== undefined && after !== before) changes[key] = { before, after };
  }
  if (Object.keys(changes).length === 0) return plan;
  await plan.update(patch);
  await recordAudit({
    actorId: actor.id,
    area: 'treasury',
    action: actionFor(changes),
    subjectType: 'membership_plan',
    subjectId: String(plan.id),
    details: { changes },
  });
  return plan;
}
