import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { AuditEvent, Membership, MembershipPlan, OutboxEmail, Payment } from '../../models';
import { LEDGER_COLUMNS } from './ledger-csv';
import { client, createTestApp, flushOutbox, inbox, resetDb } from '../../testing/test-app';
import { buildPayment, buildUser } from '../../testing/builders';

const built = createTestApp();
afterAll(() => built.close());
beforeEach(resetDb);

// Today is read from the clock; the fiscal year (from 1 April, the default calendar) is derived from it.
const today = new Date().toISOString().slice(0, 10);

async function setup() {
  const plan = await MembershipPlan.create({
    code: 'family',
    name: 'Family',
    amountMinor: 18000,
    currency: 'EUR',
    proration: 'none',
    lateFeeMinor: 0,
    graceDays: 30,
  });
  const member = await buildUser({ displayName: 'Invented Member' });
  await Membership.create({
    userId: member.id,
    planId: plan.id,
    joinedOn: '2019-04-01',
    paidThrough: '2020-03-31',
  });
  const t = await buildUser({ roles: ['member', 'treasurer'] });
  const c = await client(built.app);
  await c.signIn(t.email);
  return { plan, member, t, c };
}

const offline = (userId: number, planId: number, extra: object = {}) => ({
  userId,
  planId,
  method: 'cheque',
  amountMinor: 18000,
  currency: 'EUR',
  receivedOn: today,
  reference: 'CHQ 000123',
  ...extra,
});

describe('treasurer desk', () => {
  it('records an offline payment, credits the member and mails a receipt', async () => {
    const { plan, member, c } = await setup();
    const before = (await c.get('/api/treasury/roster')).body.data;
    expect(before.find((r: { userId: number }) => r.userId === member.id)).toMatchObject({
      status: 'lapsed',
      owedMinor: 18000,
    });
    const res = await c.post('/api/treasury/payments', offline(member.id, plan.id));
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({
      method: 'cheque',
      status: 'succeeded',
      amountMinor: 18000,
      reference: 'CHQ 000123',
    });
    const m = await Membership.findOne({ where: { userId: member.id } });
    expect(m?.paidThrough).toBe(res.body.data.coversTo);
    const after = (await c.get('/api/treasury/roster')).body.data;
    expect(after.find((r: { userId: number }) => r.userId === member.id).owedMinor).toBe(0);
    expect(
      await AuditEvent.count({ where: { area: 'treasury', action: 'payment.record-offline' } }),
    ).toBe(1);
    await flushOutbox();
    expect(await inbox(member.email, 'Receipt for your club dues')).toHaveLength(1);
  });

  it('rejects negative amounts, unknown members and dates outside the fiscal calendar', async () => {
    const { plan, member, c } = await setup();
    const neg = await c.post(
      '/api/treasury/payments',
      offline(member.id, plan.id, { amountMinor: -500 }),
    );
    expect(neg.status).toBe(400);
    expect(neg.body.error.fields.amountMinor).toMatch(/negative/);
    const who = await c.post('/api/treasury/payments', offline(999999, plan.id));
    expect(who.status).toBe(400);
    expect(who.body.error.fields.userId).toMatch(/No member/);
    const old = await c.post(
      '/api/treasury/payments',
      offline(member.id, plan.id, { receivedOn: '2001-05-05' }),
    );
    expect(old.status).toBe(400);
    expect(old.body.error.fields.receivedOn).toMatch(/fiscal year/);
    const future = await c.post(
      '/api/treasury/payments',
      offline(member.id, plan.id, { receivedOn: '2999-01-01' }),
    );
    expect(future.body.error.fields.receivedOn).toMatch(/future/);
    const nodate = await c.post(
      '/api/treasury/payments',
      offline(member.id, plan.id, { receivedOn: '2026-02-30' }),
    );
    expect(nodate.body.error.fields.receivedOn).toMatch(/does not exist/);
    expect(await Payment.count()).toBe(0);
  });

  it('exports the ledger as CSV: one row per payment and refund, totals match the summary', async () => {
    const { plan, member, c } = await setup();
    const other = await buildUser({ displayName: 'Second, "Quoted" Member' });
    await Membership.create({
      userId: other.id,
      planId: plan.id,
      joinedOn: '2019-04-01',
      paidThrough: '2020-03-31',
    });
    const p1 = (await c.post('/api/treasury/payments', offline(member.id, plan.id))).body.data;
    await c.post(
      '/api/treasury/payments',
      offline(other.id, plan.id, { method: 'cash', amountMinor: 18050, reference: '=cash box' }),
    );
    const refund = await c.post(`/api/treasury/payments/${p1.id as number}/refunds`, {
      amountMinor: 2500,
      reason: 'Overcharged',
    });
    expect(refund.status).toBe(201);
    expect(refund.body.data.status).toBe('succeeded');

    const res = await c.get('/api/treasury/ledger.csv');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    // A byte-order mark first, so spreadsheet programs read UTF-8.
    expect(res.text.charCodeAt(0)).toBe(0xfeff);
    const lines = res.text.slice(1).trim().split('\r\n');
    expect(lines[0]).toBe(LEDGER_COLUMNS.join(','));
    expect(lines).toHaveLength(4);
    const parse = (line: string) =>
      line.match(/("([^"]|"")*"|[^,]*)(,|$)/g)?.map((f) => f.replace(/,$/, '')) ?? [];
    const rows = lines.slice(1).map(parse);
    const col = (name: (typeof LEDGER_COLUMNS)[number]) => LEDGER_COLUMNS.indexOf(name);
    expect(rows.map((r) => r[col('entry')])).toEqual(['payment', 'payment', 'refund']);
    const total = rows.reduce((s, r) => s + Number(r[col('amount_minor')]), 0);
    expect(total).toBe(18000 + 18050 - 2500);
    expect(rows.map((r) => r[col('amount')])).toEqual(['180.00', '180.50', '-25.00']);
    expect(lines[2]).toContain('"Second, ""Quoted"" Member"');
    expect(lines[2]).toContain("'=cash box");

    const summary = (await c.get('/api/treasury/summary')).body.data;
    expect(summary.collectedMinor).toBe(total);
    expect(summary.refundedMinor).toBe(2500);
    expect(summary.months).toHaveLength(12);
    expect(
      summary.months.reduce((s: number, m: { collectedMinor: number }) => s + m.collectedMinor, 0),
    ).toBe(total);
    expect(summary.expectedMinor).toBe(2 * 18000);
    expect(await AuditEvent.count({ where: { action: 'ledger.export' } })).toBe(1);
  });

  it('previews and sends reminders only to due and overdue members', async () => {
    const { plan, member, c } = await setup();
    const current = await buildUser();
    await Membership.create({
      userId: current.id,
      planId: plan.id,
      joinedOn: '2019-04-01',
      paidThrough: '2099-03-31',
    });
    const due = await buildUser();
    await Membership.create({
      userId: due.id,
      planId: plan.id,
      joinedOn: today,
      paidThrough: null,
    });
    const preview = await c.post('/api/treasury/reminders/preview', {
      userIds: [member.id, current.id, due.id],
    });
    expect(preview.status).toBe(200);
    expect(preview.body.data.recipients.map((r: { userId: number }) => r.userId)).toEqual([due.id]);
    expect(preview.body.data.skipped.map((s: { userId: number }) => s.userId).sort()).toEqual(
      [member.id, current.id].sort(),
    );
    expect(preview.body.data.sampleText).toContain('/dues');
    const sent = await c.post('/api/treasury/reminders', {
      userIds: [member.id, current.id, due.id],
    });
    expect(sent.body.data.sent).toBe(1);
    expect(await OutboxEmail.count({ where: { kind: 'dues-reminder' } })).toBe(1);
    expect((await c.post('/api/treasury/reminders', { userIds: [] })).status).toBe(400);
  });

  it('creates and changes plans, rejecting bad amounts', async () => {
    const { c } = await setup();
    const bad = await c.post('/api/treasury/plans', {
      code: 'junior',
      name: 'Junior',
      amountMinor: -1,
      currency: 'eur',
      proration: 'monthly',
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.amountMinor).toBeDefined();
    const ok = await c.post('/api/treasury/plans', {
      code: 'junior',
      name: 'Junior',
      amountMinor: 4000,
      currency: 'eur',
      proration: 'quarterly',
    });
    expect(ok.status).toBe(201);
    expect(ok.body.data).toMatchObject({ currency: 'EUR', graceDays: 30, active: true });
    const dup = await c.post('/api/treasury/plans', {
      code: 'junior',
      name: 'Junior 2',
      amountMinor: 4000,
      currency: 'EUR',
      proration: 'none',
    });
    expect(dup.body.error.fields.code).toMatch(/already/);
    const patched = await c.patch(`/api/treasury/plans/${ok.body.data.id as number}`, {
      amountMinor: 4500,
    });
    expect(patched.body.data.amountMinor).toBe(4500);
    expect(await AuditEvent.count({ where: { area: 'treasury', action: 'plan.update' } })).toBe(1);
  });

  it('summary tiles reconcile: what is in each, and the difference is explained', async () => {
    const plan = await MembershipPlan.create({
      code: 'individual',
      name: 'Individual',
      amountMinor: 12000,
      currency: 'EUR',
      proration: 'monthly',
      lateFeeMinor: 1500,
      graceDays: 30,
    });
    // The fiscal year holding today under the default calendar (from 1 April).
    const y = Number(today.slice(0, 4));
    const m = Number(today.slice(5, 7));
    const start = m >= 4 ? y : y - 1;
    const fyStart = `${start}-04-01`;
    const fyEnd = `${start + 1}-03-31`;
    // Monthly proration: months left including the joining month, over 12 (the plan's rule).
    const prorated = Math.round((12000 * (12 - ((y - start) * 12 + m - 4))) / 12);
    const pay = (userId: number, extra: object) =>
      buildPayment({ id: userId }, plan, {
        coversFrom: fyStart,
        coversTo: fyEnd,
        reference: 'CHQ 1',
        ...extra,
      });
    const paid = await buildUser();
    await Membership.create({
      userId: paid.id,
      planId: plan.id,
      joinedOn: '2019-04-01',
      paidThrough: fyEnd,
    });
    await pay(paid.id, {});
    // A renewal paid ahead for next year: collected now, but not for this year.
    await pay(paid.id, { coversFrom: `${start + 1}-04-01`, coversTo: `${start + 2}-03-31` });
    const joiner = await buildUser();
    await Membership.create({
      userId: joiner.id,
      planId: plan.id,
      joinedOn: today,
      paidThrough: null,
    });
    await pay(joiner.id, { method: 'card', status: 'held', amountMinor: 5000, heldReason: 'Held' });
    // More than a year behind: owes this full year plus the late fee.
    const behind = await buildUser();
    await Membership.create({
      userId: behind.id,
      planId: plan.id,
      joinedOn: '2019-04-01',
      paidThrough: `${start - 2}-03-31`,
    });
    const t = await buildUser({ roles: ['member', 'treasurer'] });
    const c = await client(built.app);
    await c.signIn(t.email);

    const s = (await c.get('/api/treasury/summary')).body.data;
    expect(s.expectedMinor).toBe(12000 + prorated + 12000);
    expect(s.collectedMinor).toBe(24000);
    expect(s.outstandingMinor).toBe(prorated + 12000 + 1500);
    expect(s.heldCount).toBe(1);
    expect(s.breakdown).toEqual({
      memberCount: 3,
      proratedCount: prorated < 12000 ? 1 : 0,
      prorationMinor: 12000 - prorated,
      collectedThisYearMinor: 12000,
      collectedOtherYearsMinor: 12000,
      refundedOfUncreditedMinor: 0,
      outstandingLateFeesMinor: 1500,
      heldMinor: 5000,
      differenceMinor: 0,
    });
    // The identities the tiles' explanations rest on.
    const b = s.breakdown;
    expect(b.collectedThisYearMinor + b.collectedOtherYearsMinor).toBe(s.collectedMinor);
    expect(
      b.collectedThisYearMinor +
        s.outstandingMinor -
        b.outstandingLateFeesMinor +
        b.differenceMinor,
    ).toBe(s.expectedMinor);

    // A part payment for this year shows up as the difference, never silently.
    await pay(behind.id, { amountMinor: 4000, coversFrom: fyStart, coversTo: fyEnd });
    const after = (await c.get('/api/treasury/summary')).body.data;
    expect(after.breakdown.collectedThisYearMinor).toBe(16000);
    expect(after.breakdown.differenceMinor).toBe(-4000);
  });
});
