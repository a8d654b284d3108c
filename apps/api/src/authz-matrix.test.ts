import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '@app/shared';
import { listRoutes } from './lib/routes';
import {
  hasModeratorRole,
  isAdmin,
  isModeratorOrAdmin,
  isTreasurer,
  type Actor,
} from './policies/roles';
import { buildUser } from './testing/builders';
import { client, createTestApp, resetDb } from './testing/test-app';

type Who = 'visitor' | Role;
/** 'ok' = the role gets past authorization (any status but 401/403); otherwise the exact status expected. */
type Expect = 'ok' | 401 | 403;
type Row = Record<Who, Expect>;

const PUBLIC: Row = { visitor: 'ok', member: 'ok', moderator: 'ok', treasurer: 'ok', admin: 'ok' };
const SIGNED_IN: Row = {
  visitor: 401,
  member: 'ok',
  moderator: 'ok',
  treasurer: 'ok',
  admin: 'ok',
};
/**
 * The row for a route behind a role rule: a visitor is asked to sign in, a person holding one role gets through
 * when the policy (`policies/roles.ts`) lets that role through, and is refused otherwise.
 */
function rowFor(rule: (user: Actor) => boolean): Row {
  const holding = (role: Role): Actor => ({ id: 1, hasRole: (r) => r === role });
  const of = (role: Role): Expect => (rule(holding(role)) ? 'ok' : 403);
  return {
    visitor: 401,
    member: of('member'),
    moderator: of('moderator'),
    treasurer: of('treasurer'),
    admin: of('admin'),
  };
}
const ADMIN = rowFor(isAdmin);
const MODERATOR = rowFor(hasModeratorRole);
const MODERATOR_OR_ADMIN = rowFor(isModeratorOrAdmin);
const TREASURER = rowFor(isTreasurer);

/**
 * Every route the app registers, with who may reach it. A route missing from this table fails the test, so a new
 * route cannot ship without a decision about who may call it.
 */
const MATRIX: Record<string, Row> = {
  'POST /api/csp-report': PUBLIC,
  'GET /api/health': PUBLIC,
  'GET /api/health/ping': PUBLIC,
  'GET /api/auth/me': PUBLIC,
  'POST /api/auth/signup': PUBLIC,
  'POST /api/auth/verify-email': PUBLIC,
  'POST /api/auth/resend-verification': PUBLIC,
  'POST /api/auth/login': PUBLIC,
  'POST /api/auth/logout': PUBLIC,
  'POST /api/auth/password-reset': PUBLIC,
  'POST /api/auth/password-reset/confirm': PUBLIC,
  'PATCH /api/account': SIGNED_IN,
  'POST /api/account/password': SIGNED_IN,
  // The stop link in a digest e-mail: its signed token names the member, so no sign-in is needed.
  'POST /api/account/digest/stop': PUBLIC,
  'GET /api/admin/users': ADMIN,
  'PUT /api/admin/users/:userId/roles': ADMIN,
  'GET /api/club': PUBLIC,
  'PUT /api/club/locale': ADMIN,
  'GET /api/boats': SIGNED_IN,
  'POST /api/boats': SIGNED_IN,
  'GET /api/boats/:boatId': SIGNED_IN,
  'PATCH /api/boats/:boatId': SIGNED_IN,
  'DELETE /api/boats/:boatId': SIGNED_IN,
  'GET /api/tackle-plans': SIGNED_IN,
  'POST /api/tackle-plans': SIGNED_IN,
  'GET /api/tackle-plans/:planId': SIGNED_IN,
  'PUT /api/tackle-plans/:planId': SIGNED_IN,
  'DELETE /api/tackle-plans/:planId': SIGNED_IN,
  'GET /api/topics': PUBLIC,
  'POST /api/topics': ADMIN,
  'PUT /api/topics/order': ADMIN,
  'PATCH /api/topics/:topicId': ADMIN,
  'DELETE /api/topics/:topicId': ADMIN,
  'GET /api/posts': PUBLIC,
  'GET /api/posts/mine': SIGNED_IN,
  'POST /api/posts': SIGNED_IN,
  'GET /api/posts/:postId': PUBLIC,
  'PATCH /api/posts/:postId': SIGNED_IN,
  'POST /api/posts/:postId/submit': SIGNED_IN,
  'DELETE /api/posts/:postId': SIGNED_IN,
  'POST /api/posts/:postId/comments': SIGNED_IN,
  'PUT /api/posts/:postId/accepted-answer': SIGNED_IN,
  'PUT /api/posts/:postId/vote': SIGNED_IN,
  'DELETE /api/posts/:postId/vote': SIGNED_IN,
  'GET /api/search/posts': PUBLIC,
  'POST /api/reports': SIGNED_IN,
  'GET /api/moderation/queue': MODERATOR,
  'GET /api/moderation/count': MODERATOR,
  'POST /api/moderation/posts/:postId/decision': MODERATOR,
  'PATCH /api/moderation/posts/:postId/flags': MODERATOR,
  'POST /api/moderation/comments/:commentId/decision': MODERATOR,
  'POST /api/moderation/reports/:reportId/resolve': MODERATOR,
  'GET /api/moderation/log': MODERATOR,
  'POST /api/moderation/decisions/:decisionId/undo': MODERATOR_OR_ADMIN,
  'GET /api/notifications': SIGNED_IN,
  'GET /api/notifications/unread': SIGNED_IN,
  'POST /api/notifications/read': SIGNED_IN,
  'POST /api/notifications/:notificationId/read': SIGNED_IN,
  'POST /api/uploads/images': SIGNED_IN,
  'GET /api/uploads/usage': SIGNED_IN,
  'GET /api/listings': PUBLIC,
  'GET /api/listings/mine': SIGNED_IN,
  'GET /api/listings/reports': MODERATOR,
  'POST /api/listings/reports/:reportId/dismiss': MODERATOR,
  'POST /api/listings': SIGNED_IN,
  'GET /api/listings/:listingId': PUBLIC,
  'PUT /api/listings/:listingId': SIGNED_IN,
  'POST /api/listings/:listingId/publish': SIGNED_IN,
  'POST /api/listings/:listingId/relist': SIGNED_IN,
  'POST /api/listings/:listingId/withdraw': SIGNED_IN,
  'POST /api/listings/:listingId/sold': SIGNED_IN,
  'GET /api/listings/:listingId/threads': SIGNED_IN,
  'POST /api/listings/:listingId/photos': SIGNED_IN,
  'PUT /api/listings/:listingId/photos/order': SIGNED_IN,
  'DELETE /api/listings/:listingId/photos/:photoId': SIGNED_IN,
  'POST /api/listings/:listingId/reports': SIGNED_IN,
  'POST /api/listings/:listingId/hide': MODERATOR,
  'POST /api/listings/:listingId/unhide': MODERATOR,
  'GET /api/threads': SIGNED_IN,
  'GET /api/threads/unread': SIGNED_IN,
  'POST /api/threads': SIGNED_IN,
  'GET /api/threads/:threadId': SIGNED_IN,
  'POST /api/threads/:threadId/messages': SIGNED_IN,
  'GET /api/saved-searches': SIGNED_IN,
  'POST /api/saved-searches': SIGNED_IN,
  'DELETE /api/saved-searches/:savedSearchId': SIGNED_IN,
  'POST /api/payments/webhook': PUBLIC,
  'GET /api/dues/plans': SIGNED_IN,
  'GET /api/dues/me': SIGNED_IN,
  'POST /api/dues/checkout': SIGNED_IN,
  'GET /api/dues/checkout/:sessionId': SIGNED_IN,
  'GET /api/treasury/plans': TREASURER,
  'POST /api/treasury/plans': TREASURER,
  'PATCH /api/treasury/plans/:planId': TREASURER,
  'GET /api/treasury/calendar': TREASURER,
  'GET /api/treasury/calendar/preview': TREASURER,
  'PUT /api/treasury/calendar': TREASURER,
  'GET /api/treasury/roster': TREASURER,
  'GET /api/treasury/payments': TREASURER,
  'POST /api/treasury/payments': TREASURER,
  'POST /api/treasury/payments/:paymentId/refunds': TREASURER,
  'POST /api/treasury/payments/:paymentId/resolve': TREASURER,
  'POST /api/treasury/payments/:paymentId/returned': TREASURER,
  'POST /api/treasury/reminders/preview': TREASURER,
  'POST /api/treasury/reminders': TREASURER,
  'GET /api/treasury/ledger.csv': TREASURER,
  'GET /api/treasury/summary': TREASURER,
  'GET /api/storm-watches/checklist': SIGNED_IN,
  'PUT /api/storm-watches/checklist': MODERATOR_OR_ADMIN,
  'GET /api/storm-watches': SIGNED_IN,
  'POST /api/storm-watches': MODERATOR_OR_ADMIN,
  'GET /api/storm-watches/:watchId': SIGNED_IN,
  'POST /api/storm-watches/:watchId/close': MODERATOR_OR_ADMIN,
  'GET /api/storm-watches/:watchId/board': SIGNED_IN,
  'GET /api/storm-watches/:watchId/board.csv': MODERATOR_OR_ADMIN,
  'GET /api/storm-watches/:watchId/buddies': MODERATOR_OR_ADMIN,
  'GET /api/storm-watches/:watchId/boats/:boatId': SIGNED_IN,
  'PUT /api/storm-watches/:watchId/boats/:boatId': SIGNED_IN,
  'PUT /api/storm-watches/:watchId/boats/:boatId/buddy': MODERATOR_OR_ADMIN,
};

/** State-changing routes that take no CSRF token, and why. */
const CSRF_EXEMPT: Record<string, string> = {
  'POST /api/csp-report': 'browsers send violation reports without our headers; it only logs',
  'POST /api/payments/webhook': 'called by the payment provider, authenticated by its signature',
};

const built = createTestApp({
  LOGIN_RATE_LIMIT: '10000',
  SIGNUP_RATE_LIMIT: '100000',
  PASSWORD_CHANGE_RATE_LIMIT: '100000',
  MESSAGE_RATE_LIMIT: '100000',
});
afterAll(() => built.close());

const ROLE_SETS: Record<Exclude<Who, 'visitor'>, Role[]> = {
  member: ['member'],
  moderator: ['member', 'moderator'],
  treasurer: ['member', 'treasurer'],
  admin: ['member', 'admin'],
};
const emails: Partial<Record<Who, string>> = {};
let targetId = 0;

beforeAll(async () => {
  await resetDb();
  for (const [who, roles] of Object.entries(ROLE_SETS))
    emails[who as Who] = (await buildUser({ roles })).email;
  targetId = (await buildUser()).id;
});

const routes = listRoutes(built.app);

describe('authorization matrix', () => {
  it('has a row for every registered route and no stale rows', () => {
    const registered = routes.map((r) => `${r.method} ${r.path}`).sort();
    expect(registered.filter((k) => !(k in MATRIX))).toEqual([]);
    expect(Object.keys(MATRIX).filter((k) => !registered.includes(k))).toEqual([]);
  });

  const cases = routes.flatMap((r) =>
    (['visitor', 'member', 'moderator', 'treasurer', 'admin'] as Who[]).map((who) => ({
      ...r,
      who,
    })),
  );
  it.each(cases)('$method $path as $who', async ({ method, path, who }) => {
    const row = MATRIX[`${method} ${path}`];
    expect(row, `no matrix row for ${method} ${path}`).toBeDefined();
    if (!row) return;
    const c = await client(built.app);
    const email = emails[who];
    if (email) expect((await c.signIn(email)).status).toBe(200);
    const url = path.replace(':userId', String(targetId)).replace(/:(\w+)/g, '1');
    const verb = method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
    const res = verb === 'get' ? await c.get(url) : await c[verb](url, {});
    const expected = row[who];
    if (expected === 'ok')
      expect([401, 403], `${who} ${method} ${url} → ${res.status}`).not.toContain(res.status);
    else expect(res.status).toBe(expected);
    expect(res.status).toBeLessThan(500);
  });
});

describe('CSRF protection', () => {
  const writes = routes.filter((r) => r.method !== 'GET' && r.method !== 'HEAD');
  it.each(writes)(
    '$method $path rejects a signed-in request without the token',
    async ({ method, path }) => {
      const key = `${method} ${path}`;
      const c = await client(built.app);
      expect((await c.signIn(emails.admin ?? '')).status).toBe(200);
      const url = path.replace(':userId', String(targetId)).replace(/:(\w+)/g, '1');
      const verb = method.toLowerCase() as 'post' | 'put' | 'patch' | 'delete';
      const res = await c.agent[verb](url).send({});
      if (key in CSRF_EXEMPT) expect(res.status).not.toBe(403);
      else {
        expect(res.status).toBe(403);
        expect(res.body.error.code).toBe('CSRF_INVALID');
      }
    },
  );
});
