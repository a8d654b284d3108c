import type { z } from 'zod';
import { CalcInputError } from '@app/calc';
import type { tacklePlanInputSchema, tacklePlanPatchSchema } from '@app/shared';
import { AppError, notFound } from '../../errors/app-error';
import { withParentLocked } from '../../lib/serialize';
import { Boat, TacklePlan, type User } from '../../models';
import { getOwnBoat } from '../boats/boats.service';
import { computePlan } from './plan-compute';
import { ownsTacklePlan } from '../../policies/tackle-plans';

type PlanInput = z.output<typeof tacklePlanInputSchema>;
type PlanPatch = z.output<typeof tacklePlanPatchSchema>;

export const MAX_PLANS_PER_BOAT = 30;

/** Runs the plan through @app/calc; an input the engineering rejects (RangeError) becomes a 400 naming the field. */
export function validatePlan(
  boat: Boat,
  plan: Pick<PlanInput, 'windKn' | 'depthM' | 'tideM' | 'bottom' | 'components'>,
) {
  try {
    return computePlan(boat, plan);
  } catch (err) {
    if (err instanceof CalcInputError) {
      throw new AppError('VALIDATION_FAILED', 'The plan cannot be computed', {
        [err.field || 'components']: err.message,
      });
    }
    throw err;
  }
}

export async function listPlans(actor: User, boatId?: number) {
  if (boatId) await getOwnBoat(actor, boatId);
  return TacklePlan.findAll({
    where: boatId ? { ownerId: actor.id, boatId } : { ownerId: actor.id },
    order: [['updatedAt', 'DESC']],
  });
}

/** One of the actor's plans with its boat; another member's plan reads as not found. */
export async function getOwnPlan(actor: User, planId: number) {
  const plan = await TacklePlan.findByPk(planId);
  if (!plan || !ownsTacklePlan(actor, plan)) throw notFound('Tackle plan');
  const boat = await getOwnBoat(actor, plan.boatId);
  return { plan, boat };
}

export async function createPlan(actor: User, input: PlanInput) {
  const boat = await getOwnBoat(actor, input.boatId);
  validatePlan(boat, input);
  const plan = await withParentLocked(Boat, boat.id, async (transaction) => {
    if ((await TacklePlan.count({ where: { boatId: boat.id }, transaction })) >= MAX_PLANS_PER_BOAT)
      throw new AppError('CONFLICT', `A boat can keep at most ${MAX_PLANS_PER_BOAT} plans`);
    return TacklePlan.create(
      { ...input, bottom: input.bottom ?? null, ownerId: actor.id },
      { transaction },
    );
  });
  return { plan, boat };
}

export async function updatePlan(actor: User, planId: number, input: PlanPatch) {
  const { plan, boat } = await getOwnPlan(actor, planId);
  const merged = {
    windKn: plan.windKn,
    depthM: plan.depthM,
    tideM: plan.tideM,
    bottom: plan.bottom ?? undefined,
    components: plan.components,
    ...input,
  };
  validatePlan(boat, merged);
  await plan.update(input);
  return { plan, boat };
}

export async function deletePlan(actor: User, planId: number) {
  const { plan } = await getOwnPlan(actor, planId);
  await plan.destroy();
}
