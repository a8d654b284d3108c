import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { AuditEvent, Membership, MembershipPlan } from '../../models';
import { client, createTestApp, resetDb } from '../../testing/test-app';
import { calendarView } from './calendar.service';
import { buildPayment, buildPlan, buildUser } from '../../testing/builders';

const built = createTestApp();
afterAll(() => built.close());
beforeEach(resetDb);

const plan = (extra: object = {}) => ({
  code: 'crew',
  name: 'Crew',
  kind: 'individual',
  amountMinor: 12000,
  currency: 'EUR',
  proration: 'monthly',
  lateFeeMinor: 1500,
  graceDays: 30,
  ...extra,
});

async function treasurer() {
  const t = await buildUser({ roles: ['member', 'treasurer'] });
  const c = await client(built.app);
  await c.signIn(t.email);
  return c;
}

describe('POST /api/treasury/plans', () => {
  it('answers 401 to a visitor and 403 to a member', async () => {
    const visitor = await client(built.app);
    expect((await visitor.post('/api/treasury/plans', plan())).status).toBe(401);
    const m = await buildUser();
    const member = await client(built.app);
    await member.signIn(m.email);
    expect((await member.post('/api/treasury/plans', plan())).status).toBe(403);
    expect(await MembershipPlan.count()).toBe(0);
  });

  it('names every bad field and saves nothing', async () => {
    const c = await treasurer();
    const res = await c.post('/api/treasury/plans', {
      code: 'Not A Code',
      name: '',
      kind: 'pirate',
      amountMinor: 12.5,
      currency: 'euro',
      proration: 'weekly',
      lateFeeMinor: -100,
      graceDays: 400,
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toMatchObject({
      code: expect.stringMatching(/lower-case/),
      name: 'Name is required',
      kind: 'Choose who the plan is for',
      amountMinor: 'Amount must be a whole number of cents',
      currency: expect.stringMatching(/three-letter/),
      proration: 'Choose a proration rule',
      lateFeeMinor: 'Late fee cannot be negative',
      graceDays: 'Grace period can be at most 180 days',
    });
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts/);
    expect(await MembershipPlan.count()).toBe(0);
  });

  it('creates a plan with its kind and audits it', async () => {
    const c = await treasurer();
    const res = await c.post('/api/treasury/plans', plan({ kind: 'junior', currency: 'gbp' }));
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({ kind: 'junior', currency: 'GBP', active: true });
    const audit = await AuditEvent.findOne({ where: { action: 'plan.create' } });
    expect(audit?.subjectId).toBe(String(res.body.data.id));
  });
});

describe('PATCH /api/treasury/plans/:planId', () => {
  async function withHistory() {
    const c = await treasurer();
    const created = await c.post('/api/treasury/plans', plan());
    const planId = created.body.data.id as number;
    const member = await buildUser();
    await Membership.create({
      userId: member.id,
      planId,
      joinedOn: '2019-04-01',
      paidThrough: '2021-03-31',
    });
    const paid = await buildPayment(
      member,
      { id: planId },
      {
        coversFrom: '2020-04-01',
        coversTo: '2021-03-31',
        reference: 'CHQ 1',
        paidAt: new Date('2020-04-03T10:00:00Z'),
      },
    );
    return { c, planId, member, paid };
  }

  it('changes the price for new quotes while past payments keep their amounts', async () => {
    const { c, planId, member, paid } = await withHistory();
    const res = await c.patch(`/api/treasury/plans/${planId}`, {
      amountMinor: 15000,
      name: 'Crew (adult)',
    });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ amountMinor: 15000, name: 'Crew (adult)' });
    await paid.reload();
    expect([paid.amountMinor, paid.expectedMinor]).toEqual([12000, 12000]);
    const ledger = await c.get(`/api/treasury/payments?userId=${member.id}`);
    expect(ledger.body.data[0].amountMinor).toBe(12000);
    // Years behind: the member rejoins for this full year at the new price, plus the late fee.
    const m = await client(built.app);
    await m.signIn(member.email);
    const mine = await m.get('/api/dues/me');
    expect(mine.body.data.quote.lines[0].amountMinor).toBe(15000);
    const audit = await AuditEvent.findOne({ where: { action: 'plan.update' } });
    expect(audit?.details).toEqual({
      changes: {
        amountMinor: { before: 12000, after: 15000 },
        name: { before: 'Crew', after: 'Crew (adult)' },
      },
    });
  });

  it('keeps the currency once money came in on the plan', async () => {
    const { c, planId } = await withHistory();
    const res = await c.patch(`/api/treasury/plans/${planId}`, { currency: 'GBP' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.currency).toMatch(/1 payment was made in EUR/);
    expect((await MembershipPlan.findByPk(planId))?.currency).toBe('EUR');
    const fresh = await c.post('/api/treasury/plans', plan({ code: 'fresh' }));
    const ok = await c.patch(`/api/treasury/plans/${fresh.body.data.id as number}`, {
      currency: 'GBP',
    });
    expect(ok.body.data.currency).toBe('GBP');
  });

  it('retires a plan: members no longer see it, its member keeps it, the log says retire', async () => {
    const { c, planId, member } = await withHistory();
    const res = await c.patch(`/api/treasury/plans/${planId}`, { active: false });
    expect(res.body.data.active).toBe(false);
    expect(await AuditEvent.count({ where: { action: 'plan.retire' } })).toBe(1);
    const m = await client(built.app);
    await m.signIn(member.email);
    expect((await m.get('/api/dues/plans')).body.data).toEqual([]);
    expect((await m.get('/api/dues/me')).body.data.membership.planId).toBe(planId);
    await c.patch(`/api/treasury/plans/${planId}`, { active: true });
    expect(await AuditEvent.count({ where: { action: 'plan.reactivate' } })).toBe(1);
  });

  it('rejects an empty change, bad values and unknown plans', async () => {
    const { c, planId } = await withHistory();
    expect((await c.patch(`/api/treasury/plans/${planId}`, {})).status).toBe(400);
    const bad = await c.patch(`/api/treasury/plans/${planId}`, { amountMinor: -5 });
    expect(bad.body.error.fields.amountMinor).toBe('Amount cannot be negative');
    expect((await c.patch('/api/treasury/plans/99999', { name: 'Ghost' })).status).toBe(404);
    expect((await MembershipPlan.findByPk(planId))?.amountMinor).toBe(12000);
  });
});

describe('dues calendar', () => {
  it('previews a mid-year joiner under each plan on a fixed day', async () => {
    for (const [code, proration] of [
      ['monthly', 'monthly'],
      ['quarterly', 'quarterly'],
      ['none', 'none'],
    ] as const)
      await buildPlan({ code, name: code, proration });
    // Year from 15 July; 10 January is in the sixth fiscal month, so the second quarter (hand-worked from the
    // rules in calendar.ts: 7 of 12 months, 3 of 4 quarters left).
    const view = await calendarView(
      { fiscalYearStartMonth: 7, fiscalYearStartDay: 15 },
      new Date('2027-01-10T12:00:00Z'),
    );
    expect(view.fiscalYear).toEqual({ start: '2026-07-15', end: '2027-07-14', label: '2026–27' });
    expect(view.nextFiscalYear.start).toBe('2027-07-15');
    const byPlan = Object.fromEntries(view.joinToday.map((p) => [p.planName, p.joinMinor]));
    expect(byPlan).toEqual({ monthly: 7000, quarterly: 9000, none: 12000 });
  });

  it('saves a new start with field messages for bad days, and audits it', async () => {
    const c = await treasurer();
    const initial = await c.get('/api/treasury/calendar');
    expect(initial.body.data.calendar).toEqual({
      fiscalYearStartMonth: 4,
      fiscalYearStartDay: 1,
      renewalWindowDays: 30,
      lapseAfterDays: 90,
    });
    const bad = await c.put('/api/treasury/calendar', {
      fiscalYearStartMonth: 13,
      fiscalYearStartDay: 31,
      renewalWindowDays: -1,
      lapseAfterDays: 90,
    });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual([
      'fiscalYearStartDay',
      'fiscalYearStartMonth',
      'renewalWindowDays',
    ]);
    const preview = await c.get(
      '/api/treasury/calendar/preview?fiscalYearStartMonth=1&fiscalYearStartDay=1',
    );
    expect(preview.body.data.fiscalYear.start).toMatch(/^\d{4}-01-01$/);
    expect((await c.get('/api/treasury/calendar')).body.data.calendar.fiscalYearStartMonth).toBe(4);
    const saved = await c.put('/api/treasury/calendar', {
      fiscalYearStartMonth: 1,
      fiscalYearStartDay: 15,
      renewalWindowDays: 21,
      lapseAfterDays: 60,
    });
    expect(saved.status).toBe(200);
    expect(saved.body.data.fiscalYear.start).toMatch(/^\d{4}-01-15$/);
    const audit = await AuditEvent.findOne({ where: { action: 'calendar.update' } });
    expect(audit?.details).toMatchObject({
      before: { fiscalYearStartMonth: 4 },
      after: { fiscalYearStartDay: 15 },
    });
    expect((await c.get('/api/treasury/calendar')).body.data.calendar.renewalWindowDays).toBe(21);
  });
});
