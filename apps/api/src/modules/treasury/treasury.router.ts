import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import {
  calendarPreviewQuerySchema,
  duesCalendarSchema,
  idParam,
  offlinePaymentSchema,
  paymentListQuerySchema,
  planInputSchema,
  planPatchSchema,
  refundInputSchema,
  reminderInputSchema,
  resolveHeldSchema,
  returnedInputSchema,
  summaryQuerySchema,
} from '@app/shared';
import type { Env } from '../../config/env';
import { currentUser, requireRole } from '../../middleware/require-auth';
import { recordAudit } from '../audit/audit.service';
import { toPaymentDto, toPlanDto, toRefundDto } from '../dues/dues.presenter';
import { calendarView, updateCalendar } from './calendar.service';
import * as ledger from './ledger.service';
import { ledgerCsv } from './ledger-csv';
import * as refunds from './refunds.service';
import * as plans from './plans.service';
import { previewReminders, sendReminders } from './reminders.service';
import { roster, summary } from './roster.service';
import { ROLES_TREASURER } from '../../policies/roles';

const planParam = idParam('planId');
const paymentParam = idParam('paymentId');

/** The treasurer's desk: plans, roster, ledger entries, refunds, reminders, CSV export and the summary. */
export function treasuryRouter(deps: { env: Env; sequelize: Sequelize }) {
  const r = Router();
  r.use(requireRole(...ROLES_TREASURER));
  r.get('/plans', async (_req, res) => {
    res.json({ data: (await plans.listPlans()).map(toPlanDto) });
  });
  r.post('/plans', async (req, res) => {
    const plan = await plans.createPlan(currentUser(req), planInputSchema.parse(req.body));
    res.status(201).json({ data: toPlanDto(plan) });
  });
  r.patch('/plans/:planId', async (req, res) => {
    const { planId } = planParam.parse(req.params);
    const plan = await plans.updatePlan(
      currentUser(req),
      Number(planId),
      planPatchSchema.parse(req.body),
    );
    res.json({ data: toPlanDto(plan) });
  });
  r.get('/calendar', async (_req, res) => {
    res.json({ data: await calendarView() });
  });
  r.get('/calendar/preview', async (req, res) => {
    res.json({ data: await calendarView(calendarPreviewQuerySchema.parse(req.query)) });
  });
  r.put('/calendar', async (req, res) => {
    const input = duesCalendarSchema.parse(req.body);
    res.json({ data: await updateCalendar(currentUser(req), input) });
  });
  r.get('/roster', async (_req, res) => {
    res.json({ data: await roster() });
  });
  r.get('/payments', async (req, res) => {
    const q = paymentListQuerySchema.parse(req.query);
    res.json({ data: (await ledger.listPayments(q)).map(toPaymentDto) });
  });
  r.post('/payments', async (req, res) => {
    const p = await ledger.recordOfflinePayment(
      currentUser(req),
      offlinePaymentSchema.parse(req.body),
      deps,
    );
    res.status(201).json({ data: toPaymentDto(await ledger.getPayment(p.id)) });
  });
  r.post('/payments/:paymentId/refunds', async (req, res) => {
    const { paymentId } = paymentParam.parse(req.params);
    const refund = await refunds.refundPayment(
      currentUser(req),
      Number(paymentId),
      refundInputSchema.parse(req.body),
      deps,
    );
    res.status(201).json({ data: toRefundDto(refund) });
  });
  r.post('/payments/:paymentId/returned', async (req, res) => {
    const { paymentId } = paymentParam.parse(req.params);
    const { refund, replayed } = await refunds.recordReturned(
      currentUser(req),
      Number(paymentId),
      returnedInputSchema.parse(req.body),
      deps,
    );
    res.status(replayed ? 200 : 201).json({ data: toRefundDto(refund) });
  });
  r.post('/payments/:paymentId/resolve', async (req, res) => {
    const { paymentId } = paymentParam.parse(req.params);
    const p = await ledger.resolveHeld(
      currentUser(req),
      Number(paymentId),
      resolveHeldSchema.parse(req.body),
      deps,
    );
    res.json({ data: toPaymentDto(await ledger.getPayment(p.id)) });
  });
  r.post('/reminders/preview', async (req, res) => {
    const { userIds } = reminderInputSchema.parse(req.body);
    res.json({ data: await previewReminders(userIds, deps.env) });
  });
  r.post('/reminders', async (req, res) => {
    const { userIds } = reminderInputSchema.parse(req.body);
    res.status(201).json({ data: await sendReminders(currentUser(req), userIds, deps) });
  });
  r.get('/ledger.csv', async (req, res) => {
    const csv = await ledgerCsv();
    await recordAudit({
      actorId: currentUser(req).id,
      area: 'treasury',
      action: 'ledger.export',
      subjectType: 'ledger',
    });
    res
      .type('text/csv; charset=utf-8')
      .attachment(`ledger-${new Date().toISOString().slice(0, 10)}.csv`)
      // A byte-order mark first, so spreadsheet programs read the file as UTF-8 (names, €).
      .send(`\uFEFF${csv}`);
  });
  r.get('/summary', async (req, res) => {
    const { fiscalYear } = summaryQuerySchema.parse(req.query);
    res.json({ data: await summary(fiscalYear) });
  });
  return r;
}
