import { recommendTackle, tacklePlan } from '@app/calc';
import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { AuditEvent, Harbor, Notification, OutboxEmail, Post, StormReadiness } from '../../models';
import { seedTopics } from '../posts/testing/knowledge-fixtures';
import {
  client,
  createTestApp,
  flushOutbox,
  inbox,
  resetDb,
  type Client,
} from '../../testing/test-app';
import { signedInAs } from '../../testing/sign-in';

const built = createTestApp();
afterAll(() => built.close());
beforeEach(resetDb);

// Two invented boats: a 9.1 m sloop and a 7.3 m sloop (SI units).
const SLOOP = { name: 'Test Marram', hull: 'sail', loaM: 9.1, beamM: 3.2, bowHeightM: 1.1 };
const SMALL = { name: 'Test Greywake', hull: 'sail', loaM: 7.3, beamM: 2.6, bowHeightM: 0.9 };
// Gear chosen far from any line: a 3/16 in shackle (1/3 short ton WLL, RR-C-271 from memory) is loaded several
// times past its WLL at a 70 kn gust on a 9 m boat; 5/8 in G70 chain with a 1 in shackle stays well within.
const SMALL_SHACKLE = {
  chain: { grade: 'G43', tradeSizeIn: 0.375, lengthM: 60 },
  snubber: { material: 'nylon', diameterMm: 16, lengthM: 8 },
  connectors: [{ label: 'anchor shackle', kind: 'shackle', nominalIn: 0.1875 }],
};
const GENEROUS = {
  chain: { grade: 'G70', tradeSizeIn: 0.625, lengthM: 70 },
  snubber: { material: 'nylon', diameterMm: 18, lengthM: 10 },
  connectors: [{ label: 'anchor shackle', kind: 'shackle', nominalIn: 1 }],
};

const watchBody = (harborIds: number[]) => ({
  name: 'Gale Test-Ada',
  sustainedKn: 55,
  gustKn: 70,
  surgeM: 0.8,
  arrivesAt: '2026-12-10T06:00:00Z',
  endsAt: '2026-12-11T18:00:00Z',
  harborIds,
  note: 'Double your snubbers.',
});

async function boatWithPlan(c: Client, boat: object, components: object, harborId: number) {
  const boatId = (await c.post('/api/boats', { ...boat, homeHarborId: harborId })).body.data
    .id as number;
  const plan = await c.post('/api/tackle-plans', {
    boatId,
    name: 'Storm plan',
    condition: 'storm',
    windKn: 50,
    depthM: 5,
    tideM: 1.2,
    components,
  });
  expect(plan.status).toBe(201);
  return { boatId, planId: plan.body.data.plan.id as number };
}

async function scene() {
  const harbor = await Harbor.create({ name: 'Test Cove', slug: 'test-cove' });
  const other = await Harbor.create({ name: 'Far Pool', slug: 'far-pool' });
  const mod = await signedInAs(built, ['member', 'moderator']);
  const a = await signedInAs(built);
  const b = await signedInAs(built);
  const aBoat = await boatWithPlan(a.c, SLOOP, SMALL_SHACKLE, harbor.id);
  const bBoat = await boatWithPlan(b.c, SMALL, GENEROUS, harbor.id);
  const opened = await mod.c.post('/api/storm-watches', watchBody([harbor.id]));
  expect(opened.status).toBe(201);
  return { harbor, other, mod, a, b, aBoat, bBoat, watchId: opened.body.data.id as number };
}

const allTicks = (checklist: Array<{ id: string }>) => checklist.map((i) => i.id);

describe('storm watch: opening', () => {
  it('lets moderators and admins open a watch, and gives every member a notice and a mail', async () => {
    const s = await scene();
    const admin = await signedInAs(built, ['member', 'admin']);
    const again = await admin.c.post('/api/storm-watches', watchBody([s.harbor.id]));
    expect(again.status).toBe(201);
    expect(again.body.data.checklist.length).toBeGreaterThan(3);
    expect(
      await Notification.count({ where: { userId: s.a.user.id, kind: 'storm-watch' } }),
    ).toBeGreaterThan(0);
    expect(await flushOutbox()).toBeGreaterThan(0);
    const mails = await inbox(s.a.user.email, 'Storm watch: Gale Test-Ada');
    expect(mails).toHaveLength(2);
    const mail = mails.find((m) => m.text.includes(`/storm/${s.watchId}`));
    expect(mail?.text).toContain('gusting 70 kn');
    expect(mail?.text).toMatch(/harbour master/);
    expect(await AuditEvent.count({ where: { area: 'storm', action: 'watch.open' } })).toBe(2);
  });

  it('refuses members and treasurers (403) and visitors (401)', async () => {
    const harbor = await Harbor.create({ name: 'Test Cove', slug: 'test-cove' });
    const member = await signedInAs(built);
    const treasurer = await signedInAs(built, ['member', 'treasurer']);
    const visitor = await client(built.app);
    expect((await member.c.post('/api/storm-watches', watchBody([harbor.id]))).status).toBe(403);
    expect((await treasurer.c.post('/api/storm-watches', watchBody([harbor.id]))).status).toBe(403);
    expect((await visitor.post('/api/storm-watches', watchBody([harbor.id]))).status).toBe(401);
    expect(await OutboxEmail.count()).toBe(0);
  });

  it.each([
    ['gusts below the sustained wind', { sustainedKn: 60, gustKn: 50 }, 'gustKn'],
    ['a wind past 100 kn', { gustKn: 140 }, 'gustKn'],
    ['a negative wind', { sustainedKn: -5 }, 'sustainedKn'],
    ['a wind given as text', { sustainedKn: 'strong' }, 'sustainedKn'],
    ['an end before the arrival', { endsAt: '2026-12-09T06:00:00Z' }, 'endsAt'],
    ['a date that is not one', { arrivesAt: '31/12/2026' }, 'arrivesAt'],
    ['no harbour', { harborIds: [] }, 'harborIds'],
    ['a negative surge', { surgeM: -1 }, 'surgeM'],
  ])('rejects %s with a field message and stores nothing', async (_label, patch, field) => {
    const harbor = await Harbor.create({ name: 'Test Cove', slug: 'test-cove' });
    const mod = await signedInAs(built, ['member', 'moderator']);
    const res = await mod.c.post('/api/storm-watches', { ...watchBody([harbor.id]), ...patch });
    expect(res.status).toBe(400);
    expect(res.body.error.fields[field]).toEqual(expect.any(String));
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts/);
    expect((await mod.c.get('/api/storm-watches')).body.data).toEqual([]);
  });

  it('rejects a harbour the club does not have', async () => {
    const mod = await signedInAs(built, ['member', 'moderator']);
    const res = await mod.c.post('/api/storm-watches', watchBody([9999]));
    expect(res.status).toBe(400);
    expect(res.body.error.fields.harborIds).toMatch(/harbours/);
  });
});

describe('storm watch: readiness and the check against the forecast', () => {
  it('checks each plan at the forecast gust with @app/calc: the small shackle is below its WLL, the generous gear passes', async () => {
    const s = await scene();
    const watch = (await s.a.c.get(`/api/storm-watches/${s.watchId}`)).body.data.watch;
    const saved = await s.a.c.put(`/api/storm-watches/${s.watchId}/boats/${s.aBoat.boatId}`, {
      location: 'own-anchor',
      planId: s.aBoat.planId,
      depthM: 6,
      ticked: allTicks(watch.checklist),
    });
    expect(saved.status).toBe(200);
    const check = saved.body.data.details.check;

    // The expected figures come from the calc package itself: gust as the wind, surge on top of the plan's tide.
    const boat = { loaM: 9.1, beamM: 3.2, hull: 'sail' as const, bowHeightM: 1.1 };
    const input = {
      boat,
      windKn: 70,
      depthM: 6,
      tideM: 1.2 + 0.8,
      extrapolate: true,
      components: SMALL_SHACKLE as never,
    };
    const direct = tacklePlan(input);
    const expectedWeakest = direct.weakestLink?.weakest;
    expect(expectedWeakest?.label).toBe('anchor shackle');
    expect(check.windKn).toBe(70);
    expect(check.loadN).toBeCloseTo(direct.loadN, 6);
    expect(check.weakestLink.label).toBe(expectedWeakest?.label);
    expect(check.weakestLink.wllMargin).toBeCloseTo(expectedWeakest?.margin ?? NaN, 9);
    expect(check.weakestLink.breakFactor).toBeCloseTo(expectedWeakest?.factor ?? NaN, 9);
    expect(check.weakestLink.wllMargin).toBeLessThan(1);
    expect(check.band).toBe('below-wll');
    // Every item ticked, but a plan loaded past a WLL keeps the boat from "ready".
    expect(saved.body.data.status).toBe('in-progress');
    expect(check.scopeRatio).toBeCloseTo(direct.scopeRatio ?? NaN, 9);
    expect(check.tideM).toBeCloseTo(2, 9);
    const atSustained = tacklePlan({ ...input, windKn: 55 });
    const sustainedShackle = atSustained.weakestLink?.byWll.find(
      (m) => m.label === 'anchor shackle',
    );
    expect(check.sustainedMargin).toBeCloseTo(sustainedShackle?.margin ?? NaN, 9);
    expect(check.sustainedMargin).toBeGreaterThan(check.weakestLink.wllMargin);
    expect(check.warnings).toEqual(expect.arrayContaining(direct.warnings));
    expect(check.warnings.join(' ')).toMatch(/[Cc]hafe/);
    expect(check.cautions.join(' ')).toMatch(/harbour master/);
    expect(check.basis).toMatch(/gust of 70 kn/);
    // Beside the plan, the recommendation for the same boat, gust and water.
    const rec = recommendTackle({
      loaM: 9.1,
      beamM: 3.2,
      hull: 'sail',
      bowHeightM: 1.1,
      windKn: 70,
      anchorType: 'plow',
      depthM: 6,
      tideM: 2,
      chainGrade: 'G43',
      extrapolate: true,
    });
    expect(check.recommended.shackleIn).toBe(rec.shackle?.nominalIn ?? null);
    expect(check.recommended.chain?.tradeSizeIn).toBe(rec.chain?.tradeSizeIn);
    expect(check.recommended.shackleIn).toBeGreaterThan(0.1875);

    const other = await s.b.c.put(`/api/storm-watches/${s.watchId}/boats/${s.bBoat.boatId}`, {
      location: 'own-anchor',
      planId: s.bBoat.planId,
      ticked: allTicks(watch.checklist),
    });
    const passing = other.body.data.details.check;
    const directB = tacklePlan({
      boat: { loaM: 7.3, beamM: 2.6, hull: 'sail', bowHeightM: 0.9 },
      windKn: 70,
      depthM: 5,
      tideM: 2,
      extrapolate: true,
      components: GENEROUS as never,
    });
    expect(passing.weakestLink.wllMargin).toBeCloseTo(
      directB.weakestLink?.weakest.margin ?? NaN,
      9,
    );
    expect(passing.weakestLink.wllMargin).toBeGreaterThanOrEqual(1.5);
    expect(passing.band).toBe('passes');
    expect(other.body.data.status).toBe('ready');
  });

  it('derives the status: in progress, help wanted, away, ready', async () => {
    const s = await scene();
    const url = `/api/storm-watches/${s.watchId}/boats/${s.aBoat.boatId}`;
    const checklist = (await s.a.c.get(`/api/storm-watches/${s.watchId}`)).body.data.watch
      .checklist as Array<{ id: string }>;
    expect((await s.a.c.put(url, { location: 'own-anchor' })).body.data.status).toBe('in-progress');
    expect(
      (await s.a.c.put(url, { location: 'own-anchor', helpWanted: true, helpNote: 'Need hands' }))
        .body.data.status,
    ).toBe('help-wanted');
    expect((await s.a.c.put(url, { location: 'leaving' })).body.data.status).toBe('away');
    // On its own anchor a boat is ready only with a plan and every item ticked.
    expect(
      (await s.a.c.put(url, { location: 'own-anchor', ticked: allTicks(checklist) })).body.data
        .status,
    ).toBe('in-progress');
    expect(
      (await s.a.c.put(url, { location: 'hauled-out', ticked: allTicks(checklist) })).body.data
        .status,
    ).toBe('ready');
  });

  it('answers 404 for another member’s boat and for a plan of another boat, and changes nothing', async () => {
    const s = await scene();
    const theirs = `/api/storm-watches/${s.watchId}/boats/${s.bBoat.boatId}`;
    expect((await s.a.c.put(theirs, { location: 'leaving' })).status).toBe(404);
    expect((await s.a.c.get(theirs)).status).toBe(404);
    expect((await s.a.c.get(`/api/storm-watches/${s.watchId}/boats/999999`)).status).toBe(404);
    const mine = `/api/storm-watches/${s.watchId}/boats/${s.aBoat.boatId}`;
    const wrongPlan = await s.a.c.put(mine, { location: 'own-anchor', planId: s.bBoat.planId });
    expect(wrongPlan.status).toBe(400);
    expect(wrongPlan.body.error.fields.planId).toMatch(/plans/);
    const badTick = await s.a.c.put(mine, { location: 'own-anchor', ticked: ['not-an-item'] });
    expect(badTick.status).toBe(400);
    const badDepth = await s.a.c.put(mine, { location: 'own-anchor', depthM: -3 });
    expect(badDepth.status).toBe(400);
    expect(badDepth.body.error.fields.depthM).toEqual(expect.any(String));
    expect(await StormReadiness.count()).toBe(0);
    expect((await s.a.c.put(mine, { location: 'nowhere' })).status).toBe(400);
  });
});

describe('storm watch: the board, buddies, CSV and closing', () => {
  it('shows members only name and status of other boats; moderators see margins; a buddy sees the boat', async () => {
    const s = await scene();
    await s.a.c.put(`/api/storm-watches/${s.watchId}/boats/${s.aBoat.boatId}`, {
      location: 'own-anchor',
      planId: s.aBoat.planId,
      helpWanted: true,
      helpNote: 'Call me on channel 9',
    });
    const asB = await s.b.c.get(`/api/storm-watches/${s.watchId}/board`);
    expect(asB.status).toBe(200);
    const aRow = asB.body.data.rows.find((r: { boatId: number }) => r.boatId === s.aBoat.boatId);
    expect(aRow.status).toBe('help-wanted');
    expect(aRow.details).toBeNull();
    expect(JSON.stringify(aRow)).not.toContain('channel 9');
    const bRow = asB.body.data.rows.find((r: { boatId: number }) => r.boatId === s.bBoat.boatId);
    expect(bRow.mine).toBe(true);
    expect(bRow.details).not.toBeNull();

    const asMod = await s.mod.c.get(`/api/storm-watches/${s.watchId}/board`);
    const modRow = asMod.body.data.rows.find(
      (r: { boatId: number }) => r.boatId === s.aBoat.boatId,
    );
    expect(modRow.details.check.band).toBe('below-wll');
    expect(modRow.details.check.weakestLink.label).toBe('anchor shackle');

    // A member cannot name buddies; a moderator can, and the buddy then sees the boat.
    const buddyUrl = `/api/storm-watches/${s.watchId}/boats/${s.aBoat.boatId}/buddy`;
    expect((await s.b.c.put(buddyUrl, { buddyUserId: s.b.user.id })).status).toBe(403);
    const self = await s.mod.c.put(buddyUrl, { buddyUserId: s.a.user.id });
    expect(self.status).toBe(400);
    const set = await s.mod.c.put(buddyUrl, { buddyUserId: s.b.user.id });
    expect(set.status).toBe(200);
    expect(set.body.data.details.buddy.id).toBe(s.b.user.id);
    const seen = await s.b.c.get(`/api/storm-watches/${s.watchId}/boats/${s.aBoat.boatId}`);
    expect(seen.status).toBe(200);
    expect(seen.body.data.readiness.details.helpNote).toBe('Call me on channel 9');
    const detail = await s.b.c.get(`/api/storm-watches/${s.watchId}`);
    expect(detail.body.data.buddyOf.map((r: { boatId: number }) => r.boatId)).toEqual([
      s.aBoat.boatId,
    ]);
    expect(await Notification.count({ where: { userId: s.b.user.id, kind: 'storm-buddy' } })).toBe(
      1,
    );
    // The buddy still cannot change the boat's readiness.
    expect(
      (
        await s.b.c.put(`/api/storm-watches/${s.watchId}/boats/${s.aBoat.boatId}`, {
          location: 'leaving',
        })
      ).status,
    ).toBe(404);
  });

  it('filters the board by harbour', async () => {
    const s = await scene();
    const far = await s.b.c.post('/api/boats', {
      ...SMALL,
      name: 'Far Boat',
      homeHarborId: s.other.id,
    });
    await s.b.c.put(`/api/storm-watches/${s.watchId}/boats/${far.body.data.id as number}`, {
      location: 'marina-berth',
    });
    const all = await s.mod.c.get(`/api/storm-watches/${s.watchId}/board`);
    expect(all.body.data.rows).toHaveLength(3);
    const cove = await s.mod.c.get(`/api/storm-watches/${s.watchId}/board?harborId=${s.harbor.id}`);
    expect(cove.body.data.rows.map((r: { boatName: string }) => r.boatName).sort()).toEqual([
      'Test Greywake',
      'Test Marram',
    ]);
    expect((await s.mod.c.get(`/api/storm-watches/${s.watchId}/board?harborId=x`)).status).toBe(
      400,
    );
  });

  it('exports the board as CSV for moderators, with the same margins, and logs it', async () => {
    const s = await scene();
    await s.a.c.put(`/api/storm-watches/${s.watchId}/boats/${s.aBoat.boatId}`, {
      location: 'own-anchor',
      planId: s.aBoat.planId,
      helpNote: '=HYPERLINK("x")',
    });
    expect((await s.a.c.get(`/api/storm-watches/${s.watchId}/board.csv`)).status).toBe(403);
    const res = await s.mod.c.get(`/api/storm-watches/${s.watchId}/board.csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    const lines = res.text.trim().split('\r\n');
    expect(lines[0]).toMatch(/^boat,owner,harbour,status/);
    const row = lines.find((l) => l.startsWith('Test Marram'));
    const board = await s.mod.c.get(`/api/storm-watches/${s.watchId}/board`);
    const margin = board.body.data.rows.find((r: { boatId: number }) => r.boatId === s.aBoat.boatId)
      .details.check.weakestLink.wllMargin as number;
    expect(row).toContain(`anchor shackle,${margin.toFixed(2)}`);
    expect(row).toContain('Below WLL');
    expect(row).toContain(`"'=HYPERLINK(""x"")"`);
    expect(await AuditEvent.count({ where: { action: 'board.export' } })).toBe(1);
  });

  it('closes with a lessons note that becomes a draft post, then takes no more changes', async () => {
    const s = await scene();
    await seedTopics();
    expect(
      (await s.a.c.post(`/api/storm-watches/${s.watchId}/close`, { lessons: 'Too late' })).status,
    ).toBe(403);
    expect((await s.mod.c.post(`/api/storm-watches/${s.watchId}/close`, {})).status).toBe(400);
    const closed = await s.mod.c.post(`/api/storm-watches/${s.watchId}/close`, {
      lessons: 'Chafe gear at the fairleads held.\n\nTwo snubbers parted on one boat.',
      makePost: true,
    });
    expect(closed.status).toBe(200);
    expect(closed.body.data.status).toBe('closed');
    const post = await Post.findByPk(closed.body.data.lessonsPostId as number);
    expect(post?.status).toBe('draft');
    expect(post?.authorId).toBe(s.mod.user.id);
    expect(post?.bodyText).toContain('Two snubbers parted');
    const again = await s.mod.c.post(`/api/storm-watches/${s.watchId}/close`, { lessons: 'Again' });
    expect(again.status).toBe(409);
    const late = await s.a.c.put(`/api/storm-watches/${s.watchId}/boats/${s.aBoat.boatId}`, {
      location: 'leaving',
    });
    expect(late.status).toBe(409);
  });

  it('lets moderators edit the checklist template, which new watches copy', async () => {
    const s = await scene();
    const items = [
      { id: 'chafe-gear', label: 'Chafe gear everywhere' },
      { id: 'lines-doubled', label: 'Dock lines doubled' },
    ];
    expect((await s.a.c.put('/api/storm-watches/checklist', { items })).status).toBe(403);
    const dup = await s.mod.c.put('/api/storm-watches/checklist', {
      items: [items[0], items[0]],
    });
    expect(dup.status).toBe(400);
    expect((await s.mod.c.put('/api/storm-watches/checklist', { items })).status).toBe(200);
    expect((await s.a.c.get('/api/storm-watches/checklist')).body.data.items).toEqual(items);
    const first = (await s.a.c.get(`/api/storm-watches/${s.watchId}`)).body.data.watch;
    expect(first.checklist.map((i: { id: string }) => i.id)).not.toContain('lines-doubled');
    const second = await s.mod.c.post('/api/storm-watches', watchBody([s.harbor.id]));
    expect(second.body.data.checklist).toEqual(items);
  });
});
