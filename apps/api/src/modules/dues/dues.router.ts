import { Router } from 'express';
import { z } from 'zod';
import { checkoutInputSchema } from '@app/shared';
import type { Env } from '../../config/env';
import { currentUser, requireAuth } from '../../middleware/require-auth';
import { MembershipPlan } from '../../models';
import { toPlanDto } from './dues.presenter';
import { checkoutStatus, startCheckout } from './checkout.service';
import { getMyDues } from './dues.service';

const sessionParam = z.object({
  sessionId: z.string().regex(/^cs_[A-Za-z0-9_]{4,250}$/, 'Unknown checkout'),
});

/** The member's side of dues: plans, what I owe, checkout and its outcome. */
export function duesRouter(env: Env) {
  const r = Router();
  r.use(requireAuth());
  r.get('/plans', async (_req, res) => {
    const plans = await MembershipPlan.findAll({
      where: { active: true },
      order: [['amountMinor', 'DESC']],
    });
    res.json({ data: plans.map(toPlanDto) });
  });
  r.get('/me', async (req, res) => {
    res.json({ data: await getMyDues(currentUser(req)) });
  });
  r.post('/checkout', async (req, res) => {
    const input = checkoutInputSchema.parse(req.body ?? {});
    res.status(201).json({ data: await startCheckout(currentUser(req), input, env) });
  });
  r.get('/checkout/:sessionId', async (req, res) => {
    const { sessionId } = sessionParam.parse(req.params);
    res.json({ data: await checkoutStatus(currentUser(req), sessionId) });
  });
  return r;
}
