import { Router } from 'express';
import { z } from 'zod';
import { idParam, tacklePlanInputSchema, tacklePlanPatchSchema } from '@app/shared';
import { currentUser, requireAuth } from '../../middleware/require-auth';
import type { Boat, TacklePlan } from '../../models';
import { toBoatDto, toTacklePlanDto } from '../boats/boats.presenter';
import * as plans from './tackle-plans.service';

const params = idParam('planId');
const listQuery = z.object({ boatId: z.coerce.number().int().positive().optional() });

/** A plan, its boat and the figures @app/calc computes for it. */
const withResult = ({ plan, boat }: { plan: TacklePlan; boat: Boat }) => ({
  plan: toTacklePlanDto(plan),
  boat: toBoatDto(boat),
  result: plans.validatePlan(boat, { ...plan.get(), bottom: plan.bottom ?? undefined }),
});

export function tacklePlansRouter() {
  const r = Router();
  r.use(requireAuth());
  r.get('/', async (req, res) => {
    const { boatId } = listQuery.parse(req.query);
    res.json({ data: (await plans.listPlans(currentUser(req), boatId)).map(toTacklePlanDto) });
  });
  r.post('/', async (req, res) => {
    res.status(201).json({
      data: withResult(
        await plans.createPlan(currentUser(req), tacklePlanInputSchema.parse(req.body)),
      ),
    });
  });
  r.get('/:planId', async (req, res) => {
    const { planId } = params.parse(req.params);
    res.json({ data: withResult(await plans.getOwnPlan(currentUser(req), Number(planId))) });
  });
  r.put('/:planId', async (req, res) => {
    const { planId } = params.parse(req.params);
    res.json({
      data: withResult(
        await plans.updatePlan(
          currentUser(req),
          Number(planId),
          tacklePlanPatchSchema.parse(req.body),
        ),
      ),
    });
  });
  r.delete('/:planId', async (req, res) => {
    const { planId } = params.parse(req.params);
    await plans.deletePlan(currentUser(req), Number(planId));
    res.status(204).end();
  });
  return r;
}
