import request from 'supertest';
import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { Session, User } from '../../models';
import { buildUser } from '../../testing/builders';
import {
  client,
  createTestApp,
  flushOutbox,
  inbox,
  linkIn,
  resetDb,
  TEST_PASSWORD,
} from '../../testing/test-app';

const built = createTestApp({ LOGIN_RATE_LIMIT: '4', RESET_RATE_LIMIT: '50' });
const { app } = built;
afterAll(() => built.close());
beforeEach(resetDb);

const sidOf = (res: request.Response) =>
  ([] as string[])
    .concat(res.headers['set-cookie'] ?? [])
    .find((c) => c.startsWith('rw.sid='))
    ?.split(';')[0];

describe('sign-up → verify → sign in → sign out', () => {
  it('walks the whole path with the verification mail from the fake inbox', async () => {
    const email = `new-${Date.now()}@test.example`;
    const c = await client(app);
    const signup = await c.post('/api/auth/signup', {
      email,
      password: 'long-enough-pw',
      displayName: 'Nell Keelson',
    });
    expect(signup.status).toBe(201);

    const early = await c.signIn(email, 'long-enough-pw');
    expect(early.status).toBe(403);
    expect(early.body.error.code).toBe('EMAIL_NOT_VERIFIED');

    expect(await flushOutbox()).toBeGreaterThanOrEqual(1);
    const [mail] = await inbox(email, 'Confirm your e-mail');
    expect(mail).toBeDefined();
    if (!mail) return;
    const link = linkIn(mail, 'http://rodewise.test/verify-email?token=');
    const token = new URL(link).searchParams.get('token') ?? '';
    const verified = await c.post('/api/auth/verify-email', { token });
    expect(verified.status).toBe(200);
    expect(verified.body.data.user).toMatchObject({
      email,
      emailVerified: true,
      roles: ['member'],
    });

    const again = await c.post('/api/auth/verify-email', { token });
    expect(again.status).toBe(410);

    const login = await c.signIn(email, 'long-enough-pw');
    expect(login.status).toBe(200);
    expect(login.body.data.user.displayName).toBe('Nell Keelson');
    expect((await c.get('/api/auth/me')).body.data.user.email).toBe(email);

    const out = await c.post('/api/auth/logout');
    expect(out.status).toBe(200);
    expect(out.body.data.user).toBeNull();
    expect((await c.get('/api/auth/me')).body.data.user).toBeNull();
  });

  it('rejects bad sign-up input with field messages and creates nothing', async () => {
    const c = await client(app);
    const res = await c.post('/api/auth/signup', {
      email: 'not-an-email',
      password: 'short',
      displayName: '',
    });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(Object.keys(res.body.error.fields)).toEqual(
      expect.arrayContaining(['email', 'password', 'displayName']),
    );
    expect(await User.count()).toBe(0);
  });

  it('does not reveal an existing address: same 201, and the owner gets a note instead', async () => {
    const user = await buildUser();
    const c = await client(app);
    const res = await c.post('/api/auth/signup', {
      email: user.email,
      password: 'another-long-pw',
      displayName: 'Someone',
    });
    expect(res.status).toBe(201);
    await flushOutbox();
    expect(await inbox(user.email, 'You already have')).toHaveLength(1);
    expect(await User.count()).toBe(1);
  });
});

describe('POST /api/auth/login', () => {
  it('answers the same 401 for a wrong password and an unknown e-mail', async () => {
    const user = await buildUser();
    const c = await client(app);
    const wrong = await c.signIn(user.email, 'not-the-password');
    const unknown = await c.signIn('nobody@test.example', 'whatever-pw');
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.error.message).toBe(unknown.body.error.message);
  });

  it('regenerates the session id at sign-in and the old id is dead after sign-out', async () => {
    const user = await buildUser();
    const c = await client(app);
    const before =
      sidOf(await c.post('/api/auth/signup', { email: 'x', password: 'y', displayName: 'z' })) ??
      sidOf(await c.refresh());
    const login = await c.signIn(user.email);
    const after = sidOf(login);
    expect(after).toBeDefined();
    expect(after).not.toBe(before);
    const cookie =
      ([] as string[])
        .concat(login.headers['set-cookie'] ?? [])
        .find((h) => h.startsWith('rw.sid=')) ?? '';
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(await Session.count({ where: { userId: user.id } })).toBe(1);

    await c.post('/api/auth/logout');
    expect(await Session.count({ where: { userId: user.id } })).toBe(0);
    const replay = await request(app)
      .get('/api/auth/me')
      .set('Cookie', after ?? '');
    expect(replay.body.data.user).toBeNull();
  });

  it('rate-limits repeated attempts for one address', async () => {
    const user = await buildUser();
    const c = await client(app);
    const codes: number[] = [];
    for (let i = 0; i < 5; i += 1)
      codes.push((await c.signIn(user.email, 'wrong-password')).status);
    expect(codes.slice(0, 4)).toEqual([401, 401, 401, 401]);
    expect(codes[4]).toBe(429);
    const limited = await c.signIn(user.email);
    expect(limited.status).toBe(429);
    expect(limited.body.error.code).toBe('RATE_LIMITED');
  });

  it('rejects a state-changing request without the CSRF token', async () => {
    const user = await buildUser();
    const res = await request(app)
      .post('/api/auth/login')
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('CSRF_INVALID');
    const c = await client(app);
    const forged = await c.agent
      .post('/api/auth/login')
      .set('X-CSRF-Token', 'f'.repeat(64))
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(forged.status).toBe(403);
  });
});

describe('password reset by e-mailed link', () => {
  it('resets once; the same link used twice is rejected; old sessions end', async () => {
    const user = await buildUser();
    const other = await client(app);
    expect((await other.signIn(user.email)).status).toBe(200);

    const c = await client(app);
    expect((await c.post('/api/auth/password-reset', { email: user.email })).status).toBe(202);
    expect((await c.post('/api/auth/password-reset', { email: 'ghost@test.example' })).status).toBe(
      202,
    );
    await flushOutbox();
    const [mail] = await inbox(user.email, 'Reset your Rodewise password');
    expect(mail).toBeDefined();
    if (!mail) return;
    const token =
      new URL(linkIn(mail, 'http://rodewise.test/reset-password?token=')).searchParams.get(
        'token',
      ) ?? '';

    const first = await c.post('/api/auth/password-reset/confirm', {
      token,
      password: 'a-brand-new-secret',
    });
    expect(first.status).toBe(200);
    const second = await c.post('/api/auth/password-reset/confirm', {
      token,
      password: 'yet-another-secret',
    });
    expect(second.status).toBe(410);
    expect(second.body.error.code).toBe('GONE');

    expect((await c.signIn(user.email, TEST_PASSWORD)).status).toBe(401);
    expect((await c.signIn(user.email, 'a-brand-new-secret')).status).toBe(200);
    expect((await other.get('/api/auth/me')).body.data.user).toBeNull();
    await flushOutbox();
    expect(await inbox(user.email, 'password was changed')).toHaveLength(1);
  });
});
