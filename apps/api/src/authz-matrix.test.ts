import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '@app/shared';
import { listRoutes } from './lib/routes';
import { buildUser, client, createTestApp, resetDb } from './testing/test-app';

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
const ADMIN: Row = { visitor: 401, member: 403, moderator: 403, treasurer: 403, admin: 'ok' };

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
  'GET /api/admin/users': ADMIN,
  'PUT /api/admin/users/:userId/roles': ADMIN,
  'GET /api/club': PUBLIC,
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
  'POST /api/uploads/images': SIGNED_IN,
};

const built = createTestApp({ LOGIN_RATE_LIMIT: '10000' });
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
