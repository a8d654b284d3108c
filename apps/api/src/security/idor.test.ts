import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Notification, Payment } from '../models';
import { chainListing, exchangeFixture, postPhotos, testJpeg } from '../testing/exchange';
import { docOf, seedTopics } from '../modules/posts/testing/knowledge-fixtures';
import { resetPostIndex } from '../modules/posts/post-index';
import { createTestApp, resetDb, type Client } from '../testing/test-app';
import { signedInAs } from '../testing/sign-in';

// Insecure direct object references: a signed-in, paid-up member guesses the ids of another member's rows.
// Every attempt must answer 404 (ids leak nothing, see DEVELOPERS.md) and change nothing in the database.
const uploadDir = mkdtempSync(join(tmpdir(), 'rw-idor-'));
const built = createTestApp({ UPLOAD_DIR: uploadDir });
afterAll(() => {
  built.close();
  rmSync(uploadDir, { recursive: true, force: true });
});

const boat = { name: 'Owner Sloop', hull: 'sail', loaM: 9.75, beamM: 3.35, bowHeightM: 1.2 };
const planBody = (boatId: number) => ({
  boatId,
  name: 'Everyday',
  condition: 'everyday',
  windKn: 30,
  depthM: 6,
  tideM: 1,
  components: {
    anchor: { type: 'plow', massKg: 16 },
    chain: { grade: 'G43', tradeSizeIn: 0.3125, lengthM: 60 },
    snubber: { material: 'nylon', diameterMm: 14, lengthM: 6 },
    connectors: [{ label: 'anchor shackle', kind: 'shackle', nominalIn: 0.375 }],
  },
});

/** Tables whose contents an intruder's attempts could touch. */
const TABLES = [
  'boats',
  'tackle_plans',
  'posts',
  'comments',
  'votes',
  'reports',
  'listings',
  'listing_photos',
  'listing_threads',
  'listing_messages',
  'listing_reports',
  'saved_searches',
  'payments',
  'memberships',
  'outbox_emails',
  'notifications',
];

async function checksums(): Promise<Record<string, string>> {
  const rows = await built.sequelize.query<{ Table: string; Checksum: string | number }>(
    `CHECKSUM TABLE ${TABLES.map((t) => `\`${t}\``).join(', ')}`,
    { type: QueryTypes.SELECT },
  );
  return Object.fromEntries(rows.map((r) => [r.Table.split('.').pop(), String(r.Checksum)]));
}
const storedFiles = () => readdirSync(uploadDir, { recursive: true }).map(String).sort();

interface Ids {
  boatId: number;
  planId: number;
  draftPostId: number;
  listingId: number;
  draftListingId: number;
  photoId: number;
  threadId: number;
  savedSearchId: number;
  notificationId: number;
  sessionId: string;
  paymentId: number;
}
let ids: Ids;
let harborId = 0;
let intruder: Client;
let ownerClient: Client;
let intruderBoatId = 0;

beforeAll(async () => {
  await resetDb();
  resetPostIndex();
  harborId = (await exchangeFixture()).harbors[0]?.id ?? 0;
  const topicId = (await seedTopics())[0]?.id ?? 0;
  const owner = await signedInAs(built, 'member', { paidUp: true });
  const buyer = await signedInAs(built, 'member', { paidUp: true }); // the club's policy: only paid-up members message sellers
  const o = owner.c;
  ownerClient = o;

  const boatId = (await o.post('/api/boats', boat)).body.data.id as number;
  const planId = (await o.post('/api/tackle-plans', planBody(boatId))).body.data.plan.id as number;
  const draftPostId = (
    await o.post('/api/posts', {
      kind: 'article',
      title: 'Draft about snubbers',
      topicId,
      body: docOf('Draft about snubbers', 'Not ready for anyone else yet.'),
    })
  ).body.data.id as number;
  const listing = await o.post('/api/listings', { ...chainListing(harborId), publish: true });
  expect(listing.status).toBe(201);
  const listingId = listing.body.data.id as number;
  const draftListingId = (await o.post('/api/listings', chainListing(harborId))).body.data
    .id as number;
  const photos = await postPhotos(o, listingId, [[await testJpeg(), 'a.jpg']]);
  expect(photos.status).toBe(201);
  const photoId = (await o.get(`/api/listings/${listingId}`)).body.data.photos[0].id as number;
  const thread = await buyer.c.post('/api/threads', {
    listingId,
    body: 'Is the chain still for sale?',
  });
  expect(thread.status).toBe(201);
  const savedSearchId = (
    await o.post('/api/saved-searches', { name: 'Chain', criteria: { category: 'chain' } })
  ).body.data.id as number;
  const notificationId = (
    await Notification.create({
      userId: owner.user.id,
      kind: 'reply',
      message: 'New comment on “Draft about snubbers”',
      link: '/knowledge/1',
      readAt: null,
    })
  ).id;
  const sessionId = 'cs_test_idor_owner_0001';
  const payment = await Payment.create({
    userId: owner.user.id,
    planId: null,
    method: 'card',
    status: 'succeeded',
    amountMinor: 5000,
    currency: 'EUR',
    expectedMinor: 5000,
    coversFrom: null,
    coversTo: null,
    providerSessionId: sessionId,
    providerPaymentIntentId: null,
    reference: null,
    note: 'Owner note',
    heldReason: null,
    recordedById: null,
    paidAt: new Date(),
  });
  ids = {
    boatId,
    planId,
    draftPostId,
    listingId,
    draftListingId,
    photoId,
    threadId: thread.body.data.id as number,
    savedSearchId,
    notificationId,
    sessionId,
    paymentId: payment.id,
  };
  for (const [k, v] of Object.entries(ids)) expect(v, k).toBeTruthy();

  const i = await signedInAs(built, 'member', { paidUp: true });
  intruder = i.c;
  intruderBoatId = (await intruder.post('/api/boats', { ...boat, name: 'Intruder Sloop' })).body
    .data.id as number;
});

type Attack = [label: string, run: () => Promise<{ status: number; body: unknown }>];

const attacks = (): Attack[] => {
  const c = intruder;
  const b = `/api/boats/${ids.boatId}`;
  const p = `/api/tackle-plans/${ids.planId}`;
  const post = `/api/posts/${ids.draftPostId}`;
  const l = `/api/listings/${ids.listingId}`;
  return [
    ['read boat', () => c.get(b)],
    ['change boat', () => c.patch(b, { name: 'Mine now' })],
    ['delete boat', () => c.delete(b)],
    ['read tackle plan', () => c.get(p)],
    [
      'replace tackle plan',
      () => c.put(p, { ...planBody(intruderBoatId), boatId: undefined, name: 'Taken over' }),
    ],
    ['delete tackle plan', () => c.delete(p)],
    ['read draft post', () => c.get(post)],
    ['edit draft post', () => c.patch(post, { title: 'Taken over' })],
    ['submit draft post', () => c.post(`${post}/submit`)],
    ['delete draft post', () => c.delete(post)],
    ['comment on draft post', () => c.post(`${post}/comments`, { body: 'Sneaky comment here' })],
    ['vote on draft post', () => c.put(`${post}/vote`)],
    ['read thread and its messages', () => c.get(`/api/threads/${ids.threadId}`)],
    [
      'write into thread',
      () => c.post(`/api/threads/${ids.threadId}/messages`, { body: 'Hello from outside' }),
    ],
    ['read checkout / receipt', () => c.get(`/api/dues/checkout/${ids.sessionId}`)],
    ['delete saved search', () => c.delete(`/api/saved-searches/${ids.savedSearchId}`)],
    ['mark notice read', () => c.post(`/api/notifications/${ids.notificationId}/read`)],
    ['edit listing', () => c.put(l, chainListing(harborId, { title: 'Now very cheap chain' }))],
    ['withdraw listing', () => c.post(`${l}/withdraw`)],
    ['mark listing sold', () => c.post(`${l}/sold`, {})],
    ['mark listing sold to a thread', () => c.post(`${l}/sold`, { threadId: ids.threadId })],
    ['relist listing', () => c.post(`${l}/relist`)],
    ['read listing threads', () => c.get(`${l}/threads`)],
    ['publish draft listing', () => c.post(`/api/listings/${ids.draftListingId}/publish`)],
    ['read draft listing', () => c.get(`/api/listings/${ids.draftListingId}`)],
    [
      'add listing photo',
      async () => postPhotos(c, ids.listingId, [[await testJpeg('#aa3300'), 'b.jpg']]),
    ],
    ['reorder listing photos', () => c.put(`${l}/photos/order`, { photoIds: [ids.photoId] })],
    ['delete listing photo', () => c.delete(`${l}/photos/${ids.photoId}`)],
  ];
};

describe('IDOR: another member’s rows by id', () => {
  it('answers 404 to every read and write, and nothing changes in the database or the upload folder', async () => {
    const before = await checksums();
    expect(Object.keys(before).sort()).toEqual([...TABLES].sort());
    expect(before.boats).toMatch(/^[1-9]\d*$/);
    const filesBefore = storedFiles();
    expect(filesBefore.length).toBeGreaterThan(0);
    const outcomes: Record<string, number> = {};
    for (const [label, run] of attacks()) {
      const res = await run();
      outcomes[label] = res.status;
      expect(res.body, label).toMatchObject({ error: { code: 'NOT_FOUND' } });
    }
    expect(outcomes).toEqual(Object.fromEntries(attacks().map(([label]) => [label, 404])));
    expect(await checksums()).toEqual(before);
    expect(storedFiles()).toEqual(filesBefore);
  });

  it('the intruder’s own lists never include the owner’s rows', async () => {
    const idsIn = async (url: string) =>
      ((await intruder.get(url)).body.data as Array<{ id: number }>).map((r) => r.id);
    expect(await idsIn('/api/boats')).toEqual([intruderBoatId]);
    expect(await idsIn('/api/tackle-plans')).not.toContain(ids.planId);
    expect(await idsIn('/api/posts/mine')).toEqual([]);
    expect(await idsIn('/api/threads')).toEqual([]);
    expect(await idsIn('/api/saved-searches')).toEqual([]);
    expect(await idsIn('/api/listings/mine')).toEqual([]);
    const dues = (await intruder.get('/api/dues/me')).body.data as {
      payments: Array<{ id: number }>;
    };
    expect(dues.payments.map((x) => x.id)).not.toContain(ids.paymentId);
  });

  it('the owner reaches the same ids, so the 404s above come from ownership checks', async () => {
    const o = ownerClient;
    for (const url of [
      `/api/boats/${ids.boatId}`,
      `/api/tackle-plans/${ids.planId}`,
      `/api/posts/${ids.draftPostId}`,
      `/api/threads/${ids.threadId}`,
      `/api/dues/checkout/${ids.sessionId}`,
      `/api/listings/${ids.draftListingId}`,
      `/api/listings/${ids.listingId}/threads`,
    ])
      expect((await o.get(url)).status, url).toBe(200);
    expect((await Payment.findByPk(ids.paymentId))?.note).toBe('Owner note');
  });
});
