import bcrypt from 'bcryptjs';
import request from 'supertest';
import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { loadEnv } from '../config/env';
import { Session, User } from '../models';
import { buildUser } from '../testing/builders';
import { client, createTestApp, resetDb, TEST_PASSWORD } from '../testing/test-app';

const built = createTestApp({ LOGIN_RATE_LIMIT: '3', RESET_RATE_LIMIT: '3' });
// The production configuration behind an https address, as a club would deploy it.
// Production refuses the built-in secrets, and sees https only through a proxy it is told to trust.
const SECRETS = {
  SESSION_SECRET: 'a-random-production-session-secret-of-40-chars',
  STRIPE_WEBHOOK_SECRET: 'whsec_a-random-production-webhook-secret-0123',
};
const prod = createTestApp({
  NODE_ENV: 'production',
  PUBLIC_URL: 'https://club.example',
  TRUST_PROXY: 'loopback',
  ...SECRETS,
});
afterAll(() => {
  built.close();
  prod.close();
});
beforeEach(resetDb);

const setCookies = (res: request.Response) =>
  ([] as string[]).concat(res.headers['set-cookie'] ?? []);
const sessionCookie = (res: request.Response) =>
  setCookies(res).find((c) => c.startsWith('rw.sid='));
/** Every cookie an answer set, as a Cookie header value (the session and the visitor's CSRF nonce). */
const cookieHeader = (res: request.Response) =>
  setCookies(res)
    .map((c) => c.split(';')[0])
    .join('; ');
/** `rw.sid=…` as a Cookie header value. */
const cookiePair = (res: request.Response) => sessionCookie(res)?.split(';')[0] ?? '';
/** The session id inside a signed `rw.sid=s:<id>.<signature>` cookie. */
const sidIn = (pair: string) =>
  /^s:([^.]+)\./.exec(decodeURIComponent(pair.slice('rw.sid='.length)))?.[1];

async function csrfFor(app: typeof built.app, cookie: string) {
  const me = await request(app).get('/api/auth/me').set('Cookie', cookie);
  return (me.body as { data: { csrfToken: string; user: unknown } }).data;
}

describe('session fixation', () => {
  it('a session id planted before sign-in is replaced at sign-in and stays anonymous', async () => {
    const user = await buildUser();
    const attacker = await buildUser();
    // The attacker gets a stored session id (their own sign-in) and plants it in the victim's browser.
    const attackerClient = await client(built.app);
    const planted = await attackerClient.signIn(attacker.email);
    const plantedPair = cookiePair(planted);
    const plantedSid = sidIn(plantedPair);
    expect(plantedSid).toBeTruthy();
    expect(await Session.findByPk(plantedSid)).not.toBeNull();

    const login = await request(built.app)
      .post('/api/auth/login')
      .set('Cookie', plantedPair)
      .set('X-CSRF-Token', attackerClient.token)
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(login.status).toBe(200);
    const newSid = sidIn(cookiePair(login));
    expect(newSid).toBeTruthy();
    expect(newSid).not.toBe(plantedSid);
    // The planted id is gone on the server, and the attacker's cookie is still a visitor's.
    expect(await Session.findByPk(plantedSid)).toBeNull();
    expect((await csrfFor(built.app, plantedPair)).user).toBeNull();
    expect((await Session.findByPk(newSid))?.userId).toBe(user.id);
  });
});

describe('sign-out', () => {
  it('destroys the server-side session row; the old cookie and its CSRF token no longer work', async () => {
    const user = await buildUser();
    const c = await client(built.app);
    const login = await c.signIn(user.email);
    const pair = cookiePair(login);
    const sid = sidIn(pair);
    const token = c.token;
    expect((await Session.findByPk(sid))?.userId).toBe(user.id);

    expect((await c.post('/api/auth/logout')).status).toBe(200);
    expect(await Session.findByPk(sid)).toBeNull();
    expect(await Session.count({ where: { userId: user.id } })).toBe(0);

    // Replaying the old cookie (e.g. copied before sign-out) reaches nothing.
    expect((await csrfFor(built.app, pair)).user).toBeNull();
    const write = await request(built.app)
      .patch('/api/account')
      .set('Cookie', pair)
      .set('X-CSRF-Token', token)
      .send({ displayName: 'Replayed' });
    expect([401, 403]).toContain(write.status);
    expect((await User.findByPk(user.id))?.displayName).not.toBe('Replayed');
  });
});

describe('cookie flags', () => {
  it('HttpOnly, SameSite=Lax, Path=/ and no Secure on a local http run', async () => {
    const user = await buildUser();
    const c = await client(built.app);
    const cookie = sessionCookie(await c.signIn(user.email)) ?? '';
    expect(cookie).toMatch(/;\s*HttpOnly/i);
    expect(cookie).toMatch(/;\s*SameSite=Lax/i);
    expect(cookie).toMatch(/;\s*Path=\//i);
    expect(cookie).not.toMatch(/;\s*Secure/i);
  });

  it('adds Secure in the production configuration behind https', async () => {
    expect(prod.env.COOKIE_SECURE).toBe(true);
    expect(
      loadEnv({ ...SECRETS, NODE_ENV: 'production', PUBLIC_URL: 'https://club.example' })
        .COOKIE_SECURE,
    ).toBe(true);
    expect(
      loadEnv({ ...SECRETS, NODE_ENV: 'production', PUBLIC_URL: 'http://127.0.0.1:4310' })
        .COOKIE_SECURE,
    ).toBe(false);
    // The reverse proxy in front terminates TLS and says so; the app trusts only the proxy TRUST_PROXY names.
    const user = await buildUser();
    const me = await request(prod.app).get('/api/auth/me').set('X-Forwarded-Proto', 'https');
    const visitorCookie = setCookies(me).find((c) => c.startsWith('rw.vcsrf=')) ?? '';
    expect(visitorCookie).toMatch(/;\s*Secure/i);
    expect(visitorCookie).toMatch(/;\s*HttpOnly/i);
    const res = await request(prod.app)
      .post('/api/auth/login')
      .set('X-Forwarded-Proto', 'https')
      .set('Cookie', cookieHeader(me))
      .set('X-CSRF-Token', (me.body as { data: { csrfToken: string } }).data.csrfToken)
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    const cookie = sessionCookie(res) ?? '';
    expect(cookie).toMatch(/;\s*Secure/i);
    expect(cookie).toMatch(/;\s*HttpOnly/i);
    expect(cookie).toMatch(/;\s*SameSite=Lax/i);
  });
});

describe('rate limits', () => {
  it('sign-in: the attempt past the limit answers 429 with a message, even with the right password', async () => {
    const user = await buildUser();
    const c = await client(built.app);
    const codes: number[] = [];
    for (let i = 0; i < 3; i += 1)
      codes.push((await c.signIn(user.email, 'wrong-password')).status);
    expect(codes).toEqual([401, 401, 401]);
    const limited = await c.signIn(user.email);
    expect(limited.status).toBe(429);
    expect(limited.body.error).toMatchObject({
      code: 'RATE_LIMITED',
      message: expect.stringMatching(/too many sign-in attempts/i),
    });
    expect(limited.headers['ratelimit-policy'] ?? limited.headers.ratelimit).toBeDefined();
  });

  it('password reset: requests and confirmations past the limit answer 429 with a message', async () => {
    const user = await buildUser();
    const c = await client(built.app);
    const codes: number[] = [];
    for (let i = 0; i < 4; i += 1)
      codes.push((await c.post('/api/auth/password-reset', { email: user.email })).status);
    expect(codes).toEqual([202, 202, 202, 429]);
    const limited = await c.post('/api/auth/password-reset', { email: user.email });
    expect(limited.body.error).toMatchObject({
      code: 'RATE_LIMITED',
      message: expect.stringMatching(/too many password reset attempts/i),
    });

    // Confirmations are limited per link: the fourth try of one token is refused, another link still works.
    const guesses: number[] = [];
    for (let i = 0; i < 4; i += 1)
      guesses.push(
        (
          await c.post('/api/auth/password-reset/confirm', {
            token: `guessed-token-${'x'.repeat(40)}`,
            password: 'a-brand-new-secret',
          })
        ).status,
      );
    expect(guesses.slice(0, 3).every((s) => s >= 400 && s < 429)).toBe(true);
    expect(guesses[3]).toBe(429);
    const other = await c.post('/api/auth/password-reset/confirm', {
      token: `another-token-${'y'.repeat(40)}`,
      password: 'a-brand-new-secret',
    });
    expect(other.status).toBe(410);
  });
});

describe('password hashing cost', () => {
  it('is at least 12 in the production configuration, and production refuses less', () => {
    expect(loadEnv({ ...SECRETS, NODE_ENV: 'production' }).BCRYPT_COST).toBeGreaterThanOrEqual(12);
    expect(prod.env.BCRYPT_COST).toBeGreaterThanOrEqual(12);
    expect(() => loadEnv({ ...SECRETS, NODE_ENV: 'production', BCRYPT_COST: '10' })).toThrow(
      /at least 12/,
    );
  });

  it('the hash stored at sign-up under the production configuration uses that cost', async () => {
    const me = await request(prod.app).get('/api/auth/me').set('X-Forwarded-Proto', 'https');
    const res = await request(prod.app)
      .post('/api/auth/signup')
      .set('X-Forwarded-Proto', 'https')
      .set('Cookie', cookieHeader(me))
      .set('X-CSRF-Token', (me.body as { data: { csrfToken: string } }).data.csrfToken)
      .send({
        email: 'cost-check@test.example',
        password: 'long-enough-pw',
        displayName: 'Cost Check',
      });
    expect(res.status).toBe(201);
    const user = await User.findOne({ where: { email: 'cost-check@test.example' } });
    expect(bcrypt.getRounds(user?.passwordHash ?? '')).toBeGreaterThanOrEqual(12);
  });
});
