import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { startFakePayments, type FakePayments } from '@app/fake-payments';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD, seedDemo } from '../../../seeders/demo';
import { AuditEvent, Membership, Payment, Refund, User } from '../../models';
import { buildPayment } from '../../testing/builders';
import { client, createTestApp, resetDb } from '../../testing/test-app';

const KEY = 'sk_test_seeded_refunds_key';
let fake: FakePayments;
let dataDir = '';
let built: ReturnType<typeof createTestApp>;

beforeAll(async () => {
  dataDir = await mkdtemp(join(tmpdir(), 'seeded-refunds-'));
  fake = await startFakePayments({
    port: 0,
    dataDir,
    webhookUrl: 'http://127.0.0.1:9/api/payments/webhook',
    webhookSecret: 'whsec_seeded_refunds',
    apiKey: KEY,
    retryDelaysMs: [60_000],
    log: () => undefined,
  });
  built = createTestApp({
    STRIPE_HOST: '127.0.0.1',
    STRIPE_PORT: String(fake.port),
    STRIPE_PROTOCOL: 'http',
    STRIPE_SECRET_KEY: KEY,
  });
  await resetDb();
  expect(await seedDemo(built.sequelize, 4)).toBe(true);
});

afterAll(async () => {
  built.close();
  await fake.close();
  await rm(dataDir, { recursive: true, force: true });
});

async function treasurer() {
  const c = await client(built.app);
  expect((await c.signIn('treasurer@larkspit.example', DEMO_PASSWORD)).status).toBe(200);
  return c;
}

describe('seeded card payments', () => {
  it('carry unique provider ids in the provider format', async () => {
    const cards = await Payment.findAll({ where: { method: 'card' } });
    expect(cards.length).toBeGreaterThanOrEqual(3);
    for (const p of cards) {
      expect(p.providerSessionId).toMatch(/^cs_test_[A-Za-z0-9]{58}$/);
      expect(p.providerPaymentIntentId).toMatch(/^pi_[A-Za-z0-9]{24}$/);
    }
    expect(new Set(cards.map((p) => p.providerPaymentIntentId)).size).toBe(cards.length);
  });

  it('are refused by the provider with a reason the treasurer can act on, and nothing changes', async () => {
    const c = await treasurer();
    const payment = await Payment.findOne({ where: { method: 'card', status: 'succeeded' } });
    if (!payment) throw new Error('the demo seed has a succeeded card payment');
    const before = await Membership.findOne({ where: { userId: payment.userId } });
    const ledger = await c.get(`/api/treasury/payments?userId=${payment.userId}`);
    const row = (ledger.body.data as { id: number; cardRefundBlocked: string | null }[]).find(
      (p) => p.id === payment.id,
    );
    expect(row?.cardRefundBlocked).toBeNull();

    const res = await c.post(`/api/treasury/payments/${payment.id}/refunds`, {
      amountMinor: 1000,
      reason: 'Testing a seeded refund',
    });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/has no record of this card payment \(pi_/);
    expect(res.body.error.message).toMatch(/Nothing was refunded/);
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts/);
    const refunds = await Refund.findAll({ where: { paymentId: payment.id } });
    expect(refunds.map((r) => r.status)).toEqual(['failed']);
    const after = await Membership.findOne({ where: { userId: payment.userId } });
    expect(after?.paidThrough).toBe(before?.paidThrough);
    const audit = await AuditEvent.findOne({ where: { action: 'refund.provider-error' } });
    expect(audit?.details).toMatchObject({ code: 'resource_missing' });
  });

  it('without any provider id are marked on the ledger and refused before calling the provider', async () => {
    const c = await treasurer();
    const member = await User.findOne({ where: { email: 'maren@larkspit.example' } });
    if (!member) throw new Error('the demo seed has this member');
    const bare = await buildPayment(member, null, {
      method: 'card',
      amountMinor: 500,
      expectedMinor: 500,
    });
    const ledger = await c.get(`/api/treasury/payments?userId=${member.id}`);
    const row = (ledger.body.data as { id: number; cardRefundBlocked: string | null }[]).find(
      (p) => p.id === bare.id,
    );
    expect(row?.cardRefundBlocked).toMatch(/no reference at the payment provider/);
    const res = await c.post(`/api/treasury/payments/${bare.id}/refunds`, {
      amountMinor: 500,
      reason: 'No provider id',
    });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toBe(row?.cardRefundBlocked);
    expect(await Refund.count({ where: { paymentId: bare.id } })).toBe(0);
  });

  it('a held one the provider cannot refund is recorded as returned by transfer, leaves the queue, mails the member', async () => {
    const c = await treasurer();
    const held = (await c.get('/api/treasury/payments?status=held')).body.data as {
      id: number;
      userId: number;
      heldReason: string;
      amountMinor: number;
    }[];
    expect(held).toHaveLength(1);
    const entry = held[0];
    if (!entry) throw new Error('the demo seed holds one payment');
    // The reason reads in money, never in minor units.
    expect(entry.heldReason).toMatch(
      /^Held for the treasurer: €\d+\.\d{2} paid, €\d+\.\d{2} expected$/,
    );
    const refused = await c.post(`/api/treasury/payments/${entry.id}/refunds`, {
      amountMinor: entry.amountMinor,
      reason: 'Paid the wrong amount',
    });
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/Record money returned/);

    const res = await c.post(`/api/treasury/payments/${entry.id}/returned`, {
      method: 'transfer',
      note: 'Sent back by bank transfer, reference RW-RET-1',
    });
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({ amountMinor: entry.amountMinor, returnedBy: 'transfer' });
    const after = await Payment.findByPk(entry.id);
    expect(after?.status).toBe('dismissed');
    expect((await c.get('/api/treasury/payments?status=held')).body.data).toHaveLength(0);
    const member = await Membership.findOne({ where: { userId: entry.userId } });
    expect(member?.paidThrough).toBeNull();
    const summary = (await c.get('/api/treasury/summary')).body.data;
    expect(summary.heldCount).toBe(0);
    expect(summary.breakdown.refundedOfUncreditedMinor).toBe(entry.amountMinor);
  });
});
