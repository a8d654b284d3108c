import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { AuditEvent, ListingReport } from '../../models';
import { createTestApp, resetDb } from '../../testing/test-app';
import { chainListing, exchangeFixture } from '../../testing/exchange';
import { signedInAs } from '../../testing/sign-in';

const built = createTestApp();
afterAll(() => built.close());
let harborId = 0;
beforeEach(async () => {
  await resetDb();
  harborId = (await exchangeFixture()).harbors[0]?.id ?? 0;
});

/** A published chain listing, reported once by another member. */
async function reportedListing() {
  const seller = await signedInAs(built, 'member', { paidUp: true });
  const listingId = (
    await seller.c.post('/api/listings', { ...chainListing(harborId), publish: true })
  ).body.data.id as number;
  const reporter = await signedInAs(built, 'member', { paidUp: true });
  await reporter.c.post(`/api/listings/${listingId}/reports`, {
    reason: 'The photos show a different chain',
  });
  const mod = await signedInAs(built, ['member', 'moderator'], { paidUp: true });
  const reports = (await mod.c.get('/api/listings/reports')).body.data as Array<{
    id: number;
    reason: string;
    reporterName: string;
    listingId: number;
  }>;
  return { seller, reporter, mod, listingId, reports };
}

describe('listing reports in the moderators’ queue', () => {
  it('count in the moderation badge until dismissed with a note, which the log shows', async () => {
    const { reporter, mod, listingId, reports } = await reportedListing();
    expect(reports).toEqual([
      expect.objectContaining({
        listingId,
        reason: 'The photos show a different chain',
        reporterName: reporter.user.displayName,
      }),
    ]);
    const before = (await mod.c.get('/api/moderation/count')).body.data;
    expect(before).toMatchObject({ openListingReports: 1, total: 1 });

    const id = reports[0]?.id ?? 0;
    const res = await mod.c.post(`/api/listings/reports/${id}/dismiss`, {
      note: 'Same chain, photographed on deck',
    });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ id, status: 'resolved' });
    expect(res.body.data.decisionId).toBeGreaterThan(0);
    expect((await mod.c.get('/api/listings/reports')).body.data).toEqual([]);
    expect((await mod.c.get('/api/moderation/count')).body.data.total).toBe(0);
    // The listing stays in the exchange.
    expect((await reporter.c.get(`/api/listings/${listingId}`)).status).toBe(200);

    const row = await AuditEvent.findOne({ where: { action: 'listing-report.dismiss' } });
    expect(row).toMatchObject({ actorId: mod.user.id, reason: 'Same chain, photographed on deck' });
    const log = (await mod.c.get('/api/moderation/log')).body.data as Array<{
      action: string;
      reason: string | null;
    }>;
    expect(log[0]).toMatchObject({
      action: 'listing-report.dismiss',
      reason: 'Same chain, photographed on deck',
    });

    const again = await mod.c.post(`/api/listings/reports/${id}/dismiss`, { note: '' });
    expect(again.status).toBe(409);
  });

  it('refuses an over-long note and an unknown report, and leaves the report open', async () => {
    const { mod, reports } = await reportedListing();
    const id = reports[0]?.id ?? 0;
    const long = await mod.c.post(`/api/listings/reports/${id}/dismiss`, {
      note: 'x'.repeat(1001),
    });
    expect(long.status).toBe(400);
    expect(long.body.error.fields.note).toMatch(/under 1000/);
    expect((await mod.c.post('/api/listings/reports/99999/dismiss', {})).status).toBe(404);
    expect(await ListingReport.count({ where: { status: 'open' } })).toBe(1);
  });

  it('hiding the listing resolves its reports, and the hide appears in the moderators’ log', async () => {
    const { mod, listingId } = await reportedListing();
    const short = await mod.c.post(`/api/listings/${listingId}/hide`, { reason: 'no' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields.reason).toBeTruthy();
    expect((await mod.c.get('/api/listings/reports')).body.data).toHaveLength(1);

    await mod.c.post(`/api/listings/${listingId}/hide`, {
      reason: 'Photos of someone else’s gear',
    });
    expect((await mod.c.get('/api/listings/reports')).body.data).toEqual([]);
    const log = (await mod.c.get('/api/moderation/log')).body.data as Array<{
      action: string;
      details: { title?: string };
    }>;
    expect(log[0]).toMatchObject({
      action: 'listing.hide',
      details: { title: chainListing(harborId).title },
    });
  });
});
