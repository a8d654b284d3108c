import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { listRoutes } from '../lib/routes';
import { MembershipPlan, Topic, type User } from '../models';
import { chainListing, exchangeFixture } from '../testing/exchange';
import { buildPayment, buildUser } from '../testing/builders';
import { signedInAs } from '../testing/sign-in';
import { docOf, seedTopics } from '../modules/posts/testing/knowledge-fixtures';
import { resetPostIndex } from '../modules/posts/post-index';
import { createTestApp, resetDb, type Client } from '../testing/test-app';

// Property-based input tests (fast-check): random JSON thrown at every state-changing route.
const built = createTestApp({
  LOGIN_RATE_LIMIT: '100000',
  RESET_RATE_LIMIT: '100000',
  SIGNUP_RATE_LIMIT: '100000',
  PASSWORD_CHANGE_RATE_LIMIT: '100000',
  MESSAGE_RATE_LIMIT: '100000',
});
afterAll(() => built.close());

/**
 * Write routes that take no body (or ignore it), so any JSON is acceptable there. Every other write route must
 * validate its body: a new route lands here only by decision, like a row in the authorization matrix.
 */
const NO_BODY = new Set([
  'POST /api/csp-report', // logs whatever a browser sends
  'POST /api/payments/webhook', // raw body, signature-checked (payments.test.ts)
  'POST /api/auth/logout',
  'DELETE /api/boats/:boatId',
  'DELETE /api/tackle-plans/:planId',
  'DELETE /api/topics/:topicId',
  'POST /api/posts/:postId/submit',
  'DELETE /api/posts/:postId',
  'PUT /api/posts/:postId/vote',
  'DELETE /api/posts/:postId/vote',
  'POST /api/notifications/read',
  'POST /api/notifications/:notificationId/read',
  'POST /api/uploads/images', // multipart; upload-tricks.test.ts
  'POST /api/listings/:listingId/photos', // multipart; upload-tricks.test.ts
  'POST /api/listings/:listingId/publish',
  'POST /api/listings/:listingId/relist',
  'POST /api/listings/:listingId/withdraw',
  'POST /api/listings/:listingId/unhide',
  'DELETE /api/listings/:listingId/photos/:photoId',
  'DELETE /api/saved-searches/:savedSearchId',
  'POST /api/moderation/decisions/:decisionId/undo', // the decision is in the path; undo.test.ts
]);

/** Real keys of routes whose fields are all optional (an empty object is valid there, so it names none). */
const OPTIONAL_KEYS: Record<string, string[]> = {
  'PATCH /api/account': ['displayName', 'unitSystem', 'notificationDigest'],
  'PATCH /api/boats/:boatId': ['name', 'hull', 'loaM'],
  'PUT /api/tackle-plans/:planId': ['name', 'windKn', 'depthM'],
  'POST /api/dues/checkout': ['planId'],
  'PATCH /api/treasury/plans/:planId': ['name', 'amountMinor'],
  'PATCH /api/topics/:topicId': ['name', 'position'],
  'PATCH /api/posts/:postId': ['kind', 'title', 'topicId'],
  'PATCH /api/moderation/posts/:postId/flags': ['pinned', 'locked', 'hidden'],
  'POST /api/listings/:listingId/sold': ['threadId'],
  'POST /api/listings/reports/:reportId/dismiss': ['note'],
};

const RUNS_PER_ROUTE = 40;

/** Values that no field of any schema accepts: beyond every numeric bound, nested arrays, overlong text. */
const surelyInvalid = fc.oneof(
  fc.constant(1e308),
  fc.constant(-1e308),
  fc.constant(Number.MAX_SAFE_INTEGER * 1024),
  fc.constant([[[]]]),
  fc.array(fc.array(fc.anything({ maxDepth: 2 }), { minLength: 1 }), {
    minLength: 1,
    maxLength: 3,
  }),
  fc.constant('x'.repeat(120_000)),
);

/** Any JSON value a client could send, including the awkward ones. */
const edgeValue = fc.oneof(
  fc.constant(-0),
  fc.constant(1e308),
  fc.constant(-1e308),
  fc.constant(Number.MIN_VALUE),
  fc.constant(null),
  fc.constant(''),
  fc.constant('\u0000'),
  fc.constant('\ud83d'),
  fc.constant('__proto__'),
  fc.constant('x'.repeat(50_000)),
  fc.string(),
  fc.integer(),
  fc.double({ noNaN: true }),
  fc.boolean(),
  fc.array(fc.anything({ maxDepth: 2 }), { maxLength: 5 }),
  fc.dictionary(fc.string(), fc.anything({ maxDepth: 2 }), { maxKeys: 5 }),
);

const deeplyNested = fc
  .integer({ min: 50, max: 2000 })
  .map((depth) => JSON.parse('['.repeat(depth) + ']'.repeat(depth)) as unknown);

const prototypeKeys = fc.constantFrom(
  { __proto__: { isAdmin: true } },
  JSON.parse(
    '{"__proto__": {"roles": ["admin"]}, "constructor": {"prototype": {"x": 1}}}',
  ) as object,
);

/** Bodies for a route whose real keys are `keys`: every real key with a value no schema accepts, plus noise. */
const wrongTyped = (keys: string[]) =>
  fc
    .tuple(
      fc.record(Object.fromEntries(keys.map((k) => [k, surelyInvalid]))),
      fc.dictionary(fc.string({ maxLength: 12 }), edgeValue, { maxKeys: 4 }),
    )
    .map(([real, extra]) => ({ ...extra, ...real }));

/** Bodies that are not an object at all. */
const notAnObject = fc.oneof(fc.array(edgeValue, { maxLength: 6 }), deeplyNested, fc.constant([]));

/** Anything at all: random keys, random values, prototype tricks, deep nesting. */
const anything = fc.oneof(
  fc.anything({ maxDepth: 4, maxKeys: 6, withNullPrototype: true, withObjectString: true }),
  fc.dictionary(fc.string(), edgeValue, { maxKeys: 8 }),
  prototypeKeys,
  deeplyNested,
);

/** No stack frames, file paths or error class dumps in what a client sees. */
const STACK =
  /\bat \S+ \(|\.(ts|js|mjs):\d+|node_modules|\n\s+at |SequelizeDatabaseError|TypeError:|ReferenceError:/;

const ids: Record<string, number> = {};
let targetUserId = 0;
let everyRole: User | undefined;

beforeAll(async () => {
  await resetDb();
  resetPostIndex();
  const harborId = (await exchangeFixture()).harbors[0]?.id ?? 0;
  const topicId = (await seedTopics())[0]?.id ?? 0;
  const { user, c } = await signedInAs(built, ['member', 'moderator', 'treasurer', 'admin'], {
    paidUp: true,
  });
  everyRole = user;
  targetUserId = (await buildUser()).id;
  const boat = { name: 'Fuzz Sloop', hull: 'sail', loaM: 9.75, beamM: 3.35, bowHeightM: 1.2 };
  ids.boatId = (await c.post('/api/boats', boat)).body.data.id as number;
  ids.planId = (
    await c.post('/api/tackle-plans', {
      boatId: ids.boatId,
      name: 'Everyday',
      condition: 'everyday',
      windKn: 30,
      depthM: 6,
      tideM: 1,
      components: { chain: { grade: 'G43', tradeSizeIn: 0.3125, lengthM: 60 } },
    })
  ).body.data.plan.id as number;
  ids.postId = (
    await c.post('/api/posts', {
      kind: 'question',
      title: 'Fuzz question',
      topicId,
      body: docOf('Fuzz question', 'Which snubber length?'),
    })
  ).body.data.id as number;
  ids.listingId = (await c.post('/api/listings', { ...chainListing(harborId), publish: true })).body
    .data.id as number;
  const { c: s } = await signedInAs(built, 'member', { paidUp: true });
  const theirs = (await s.post('/api/listings', { ...chainListing(harborId), publish: true })).body
    .data.id as number;
  ids.threadId = (await c.post('/api/threads', { listingId: theirs, body: 'Still for sale?' })).body
    .data.id as number;
  ids.topicId = (await Topic.findOne())?.id ?? 0;
  const plan = await MembershipPlan.findOne();
  ids.paymentId = (
    await buildPayment(user, plan, {
      method: 'cash',
      amountMinor: 5000,
      expectedMinor: 5000,
      recordedById: user.id,
    })
  ).id;
  ids.watchId = (
    await c.post('/api/storm-watches', {
      name: 'Fuzz gale',
      sustainedKn: 40,
      gustKn: 55,
      arrivesAt: '2026-12-10T06:00:00Z',
      endsAt: '2026-12-11T06:00:00Z',
      harborIds: [harborId],
    })
  ).body.data.id as number;
  for (const [k, v] of Object.entries(ids)) expect(v, k).toBeGreaterThan(0);
});

const urlFor = (path: string) =>
  path
    .replace(':userId', String(targetUserId))
    .replace(/:(\w+)/g, (_m, name: string) => String(ids[name] ?? 1));

type Verb = 'post' | 'put' | 'patch' | 'delete';
const writes = listRoutes(built.app).filter((r) => !['GET', 'HEAD'].includes(r.method));
const validating = writes.filter((r) => !NO_BODY.has(`${r.method} ${r.path}`));

async function signedInWithEveryRole(): Promise<Client> {
  if (!everyRole) throw new Error('beforeAll made no member');
  return (await signedInAs(built, everyRole)).c;
}

/** Sends `body` as JSON and returns the status with the raw and parsed body. */
async function send(c: Client, method: string, path: string, body: unknown) {
  const res = await c.agent[method.toLowerCase() as Verb](urlFor(path))
    .set('X-CSRF-Token', c.token)
    .set('Content-Type', 'application/json')
    .send(JSON.stringify(body) ?? 'null');
  return res;
}

function expectClientError(res: Awaited<ReturnType<typeof send>>, what: string) {
  expect(res.status, what).toBeGreaterThanOrEqual(400);
  expect(res.status, what).toBeLessThan(500);
  expect(res.headers['content-type'], what).toMatch(/application\/json/);
  const err = (res.body as { error?: { code?: unknown; message?: unknown } }).error;
  expect(typeof err?.code, what).toBe('string');
  expect(typeof err?.message, what).toBe('string');
  expect(String(err?.message).length, what).toBeGreaterThan(3);
  expect(res.text, what).not.toMatch(STACK);
}

describe('random JSON at every write route', () => {
  it('lists the body-validating routes: every write route not named as body-less', () => {
    expect(validating.length).toBeGreaterThan(40);
    const known = new Set(writes.map((r) => `${r.method} ${r.path}`));
    expect([...NO_BODY].filter((k) => !known.has(k))).toEqual([]);
  });

  it.each(validating)(
    '$method $path: wrong-typed real keys and non-object bodies always get a 4xx with a message',
    async ({ method, path }) => {
      const c = await signedInWithEveryRole();
      // The route's required keys, as its own validation names them for an empty object.
      const empty = await send(c, method, path, {});
      expect(empty.status, `${method} ${path} with {}`).toBeLessThan(500);
      const named = Object.keys(
        (empty.body as { error?: { fields?: Record<string, string> } }).error?.fields ?? {},
      )
        .map((k) => k.split('.')[0] ?? k)
        .filter((k) => k !== '_');
      const keys = [...new Set([...named, ...(OPTIONAL_KEYS[`${method} ${path}`] ?? [])])];
      expect(keys.length, `${method} ${path}: name its keys in OPTIONAL_KEYS`).toBeGreaterThan(0);
      await fc.assert(
        fc.asyncProperty(fc.oneof(wrongTyped(keys), notAnObject), async (body) => {
          const res = await send(c, method, path, body);
          expectClientError(res, `${method} ${path} ← ${JSON.stringify(body).slice(0, 200)}`);
        }),
        { numRuns: RUNS_PER_ROUTE, seed: 20261202 },
      );
    },
  );

  it.each(writes)(
    '$method $path: any JSON at all never gets a 5xx or a stack trace',
    async ({ method, path }) => {
      const c = await signedInWithEveryRole();
      await fc.assert(
        fc.asyncProperty(anything, async (body) => {
          const res = await send(c, method, path, body);
          const what = `${method} ${path} ← ${JSON.stringify(body)?.slice(0, 200)}`;
          expect(res.status, what).toBeLessThan(500);
          expect(res.text, what).not.toMatch(STACK);
          if (res.status >= 400) expectClientError(res, what);
        }),
        { numRuns: RUNS_PER_ROUTE / 2, seed: 20261203 },
      );
    },
  );
});
