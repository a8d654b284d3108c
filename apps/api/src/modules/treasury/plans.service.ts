import type { z } from 'zod';
import type { planInputSchema, planPatchSchema } from '@app/shared';
import { AppError, notFound } from '../../errors/app-error';
import { MembershipPlan, type User } from '../../models';
import { recordAudit } from '../audit/audit.service';

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

/** Adds a plan; codes are unique. */
export async function createPlan(actor: User, input: PlanInput) {
  if (await MembershipPlan.findOne({ where: { code: input.code } }))
    throw new AppError('VALIDATION_FAILED', 'Some fields need attention', {
      code: 'Another plan already uses this code',
    });
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

/** Changes a plan. Amounts apply to checkouts opened from now on; past payments keep what they were. */
export async function updatePlan(actor: User, planId: number, patch: PlanPatch) {
  const plan = await MembershipPlan.findByPk(planId);
  if (!plan) throw notFound('Plan');
  const before = plan.toJSON();
  await plan.update(patch);
  await recordAudit({
    actorId: actor.id,
    area: 'treasury',
    action: 'plan.update',
    subjectType: 'membership_plan',
    subjectId: String(plan.id),
    details: { before, after: patch },
  });
  return plan;
}
