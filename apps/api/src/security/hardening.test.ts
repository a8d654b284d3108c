import bcrypt from 'bcryptjs';
import request from 'supertest';
import { afterAll, afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { loadEnv } from '../config/env';
import { settleBackground } from '../lib/background';
import { EmailToken, OutboxEmail, Session, User } from '../models';
import { passwords } from '../modules/auth/password-hash';
import { REDACTED_BODY } from '../modules/mail/outbox.service';
import { buildUser } from '../testing/builders';
import {
  client,
  createTestApp,
  flushOutbox,
  inbox,
  linkIn,
  resetDb,
  TEST_PASSWORD,
} from '../testing/test-app';

// Tight limits for the rate-limit tests (each keys on its own account, link or member); roomy ones elsewhere.
const tight = createTestApp({
  LOGIN_RATE_LIMIT: '3',
  RESET_RATE_LIMIT: '3',
  SIGNUP_RATE_LIMIT: '3',
  PASSWORD_CHANGE_RATE_LIMIT: '3',
  MESSAGE_RATE_LIMIT: '3',
});
const built = createTestApp({
  LOGIN_RATE_LIMIT: '1000',
  RESET_RATE_LIMIT: '1000',
  SIGNUP_RATE_LIMIT: '1000',
  PASSWORD_CHANGE_RATE_LIMIT: '1000',
  MESSAGE_RATE_LIMIT: '1000',
});
const { app } = built;
afterAll(() => {
  tight.close();
  built.close();
});
beforeEach(resetDb);
afterEach(() => vi.restoreAllMocks());

const SECRETS = {
  SESSION_SECRET: 'a-random-production-session-secret-of-40-chars',
  STRIPE_WEBHOOK_SECRET: 'whsec_a-random-production-webhook-secret-0123',
};

describe('1. default secrets in production', () => {
  it('production refuses to start with the built-in SESSION_SECRET or STRIPE_WEBHOOK_SECRET', () => {
    expect(() => loadEnv({ NODE_ENV: 'production' })).toThrow(
      /SESSION_SECRET and STRIPE_WEBHOOK_SECRET must be set/,
    );
    expect(() =>
      loadEnv({ NODE_ENV: 'production', SESSION_SECRET: SECRETS.SESSION_SECRET }),
    ).toThrow(/STRIPE_WEBHOOK_SECRET must be set/);
    expect(() =>
      loadEnv({ NODE_ENV: 'production', STRIPE_WEBHOOK_SECRET: SECRETS.STRIPE_WEBHOOK_SECRET }),
    ).toThrow(/SESSION_SECRET must be set/);
  });

  it('production refuses a short secret, accepts long random ones; development keeps the defaults', () => {
    expect(() =>
      loadEnv({ ...SECRETS, NODE_ENV: 'production', SESSION_SECRET: 'only-20-characters!!' }),
    ).toThrow(/at least 32 characters/);
    expect(() =>
      loadEnv({ ...SECRETS, NODE_ENV: 'production', STRIPE_WEBHOOK_SECRET: 'whsec_short' }),
    ).toThrow(/at least 32 characters/);
    expect(loadEnv({ ...SECRETS, NODE_ENV: 'production' }).SESSION_SECRET).toBe(
      SECRETS.SESSION_SECRET,
    );
    expect(loadEnv({ NODE_ENV: 'development' }).SESSION_SECRET.length).toBeGreaterThan(16);
  });
});

describe('2. rate limits', () => {
  it('sign-in: padding the e-mail with spaces or capitals does not buy fresh attempts', async () => {
    const user = await buildUser();
    const c = await client(tight.app);
    const variants = [user.email, `  ${user.email}`, user.email.toUpperCase(), `${user.email} `];
    const codes: number[] = [];
    for (const email of variants) codes.push((await c.signIn(email, 'wrong-password')).status);
    expect(codes).toEqual([401, 401, 401, 429]);
  });

  it('sign-in: X-Forwarded-For from a client reaching the API directly does not pick a fresh key', async () => {
    const user = await buildUser();
    const c = await client(tight.app);
    const codes: number[] = [];
    for (let i = 0; i < 4; i += 1)
      codes.push(
        (
          await c.agent
            .post('/api/auth/login')
            .set('X-CSRF-Token', c.token)
            .set('X-Forwarded-For', `203.0.113.${i + 1}`)
            .send({ email: user.email, password: 'wrong-password' })
        ).status,
      );
    expect(codes).toEqual([401, 401, 401, 429]);
    expect(tight.env.TRUST_PROXY).toBe(false);
    expect(loadEnv({ TRUST_PROXY: 'loopback' }).TRUST_PROXY).toBe('loopback');
    expect(loadEnv({ TRUST_PROXY: '1' }).TRUST_PROXY).toBe(1);
  });

  it('sign-in: one member failing at the clubhouse address does not lock out the treasurer there', async () => {
    const member = await buildUser();
    const treasurer = await buildUser({ roles: ['member', 'treasurer'] });
    const m = await client(tight.app);
    for (let i = 0; i < 5; i += 1) await m.signIn(member.email, 'wrong-password');
    expect((await m.signIn(member.email, 'wrong-password')).status).toBe(429);
    const t = await client(tight.app);
    expect((await t.signIn(treasurer.email)).status).toBe(200);
  });

  it('sign-in: successful sign-ins are not counted against the account', async () => {
    const user = await buildUser();
    for (let i = 0; i < 5; i += 1) {
      const c = await client(tight.app);
      expect((await c.signIn(user.email)).status).toBe(200);
    }
  });

  it('sign-up is limited per address', async () => {
    const c = await client(tight.app);
    const codes: number[] = [];
    for (let i = 0; i < 4; i += 1)
      codes.push(
        (
          await c.post('/api/auth/signup', {
            email: `flood-${i}@test.example`,
            password: 'long-enough-pw',
            displayName: 'Flood Test',
          })
        ).status,
      );
    expect(codes).toEqual([201, 201, 201, 429]);
    expect(await User.count()).toBe(3);
  });

  it('password change: wrong current passwords are limited per member', async () => {
    const user = await buildUser();
    const c = await client(tight.app);
    await c.signIn(user.email);
    const codes: number[] = [];
    for (let i = 0; i < 4; i += 1)
      codes.push(
        (
          await c.post('/api/account/password', {
            currentPassword: `guess-${i}`,
            newPassword: 'a-brand-new-secret',
          })
        ).status,
      );
    expect(codes).toEqual([400, 400, 400, 429]);
    const limited = await c.post('/api/account/password', {
      currentPassword: TEST_PASSWORD,
      newPassword: 'a-brand-new-secret',
    });
    expect(limited.status).toBe(429);
    expect(limited.body.error.code).toBe('RATE_LIMITED');
  });

  it('buyer messages are limited per member', async () => {
    const buyer = await buildUser();
    const c = await client(tight.app);
    await c.signIn(buyer.email);
    // The limit runs before the thread is looked up, so unknown threads still use up the budget.
    const codes: number[] = [];
    for (let i = 0; i < 4; i += 1)
      codes.push((await c.post('/api/threads/999999/messages', { body: `hello ${i}` })).status);
    expect(codes.slice(0, 3).every((s) => s !== 429)).toBe(true);
    expect(codes[3]).toBe(429);
    expect((await c.post('/api/threads', { listingId: 999999, body: 'hi' })).status).toBe(429);
  });

  it('reset confirmation is limited per link, not per address', async () => {
    const c = await client(tight.app);
    const tryToken = async (token: string) =>
      (await c.post('/api/auth/password-reset/confirm', { token, password: 'a-brand-new-secret' }))
        .status;
    const codes: number[] = [];
    for (let i = 0; i < 4; i += 1) codes.push(await tryToken(`expired-link-${'a'.repeat(40)}`));
    expect(codes).toEqual([410, 410, 410, 429]);
    // Another member's link from the same clubhouse address still goes through.
    const user = await buildUser();
    await c.post('/api/auth/password-reset', { email: user.email });
    await flushOutbox();
    const [mail] = await inbox(user.email, 'Reset your Rodewise password');
    expect(mail).toBeDefined();
    const link = mail ? linkIn(mail, 'http://rodewise.test/reset-password?token=') : '';
    const token = new URL(link).searchParams.get('token') ?? '';
    expect(await tryToken(token)).toBe(200);
  });
});

describe('6. sign-up timing', () => {
  it('a registered and a new address both cost exactly one password hash', async () => {
    const existing = await buildUser();
    const c = await client(app);
    const hash = vi.spyOn(passwords, 'hash');
    const fresh = await c.post('/api/auth/signup', {
      email: 'brand-new@test.example',
      password: 'long-enough-pw',
      displayName: 'New Member',
    });
    expect(fresh.status).toBe(201);
    expect(hash).toHaveBeenCalledTimes(1);
    hash.mockClear();
    const again = await c.post('/api/auth/signup', {
      email: existing.email,
      password: 'long-enough-pw',
      displayName: 'Someone Else',
    });
    expect(again.status).toBe(201);
    expect(hash).toHaveBeenCalledTimes(1);
    expect(again.body).toEqual({ data: { email: existing.email } });
  });
});

describe('7. bcrypt off the main thread', () => {
  it('sign-up and sign-in never run bcrypt on the event loop thread', async () => {
    const onMain = [
      vi.spyOn(bcrypt, 'hash'),
      vi.spyOn(bcrypt, 'hashSync'),
      vi.spyOn(bcrypt, 'compare'),
      vi.spyOn(bcrypt, 'compareSync'),
    ];
    const c = await client(app);
    const signup = await c.post('/api/auth/signup', {
      email: 'threads@test.example',
      password: 'long-enough-pw',
      displayName: 'Thread Test',
    });
    expect(signup.status).toBe(201);
    const stored = await User.findOne({ where: { email: 'threads@test.example' } });
    await stored?.update({ emailVerifiedAt: new Date() });
    expect((await c.signIn('threads@test.example', 'long-enough-pw')).status).toBe(200);
    expect((await c.signIn('unknown@test.example', 'long-enough-pw')).status).toBe(401);
    for (const spy of onMain) expect(spy).not.toHaveBeenCalled();
    // The worker's hash is a real bcrypt hash at the configured cost.
    expect(bcrypt.getRounds(stored?.passwordHash ?? '')).toBe(built.env.BCRYPT_COST);
  });

  it('the event loop keeps turning while production-cost hashes run', async () => {
    let ticks = 0;
    let longest = 0;
    let last = performance.now();
    const timer = setInterval(() => {
      const now = performance.now();
      longest = Math.max(longest, now - last);
      last = now;
      ticks += 1;
    }, 5);
    const started = performance.now();
    const hashes = await Promise.all([1, 2, 3].map(() => passwords.hash('long-enough-pw', 12)));
    const took = performance.now() - started;
    clearInterval(timer);
    expect(hashes.every((h) => bcrypt.getRounds(h) === 12)).toBe(true);
    // Generous: on the main thread the timer could not fire at all during a synchronous hash.
    expect(ticks).toBeGreaterThan(3);
    expect(longest).toBeLessThan(took / 2);
  });
});

describe('9. password change', () => {
  it('ends the other sessions, keeps this one, and mails the member', async () => {
    const user = await buildUser();
    const here = await client(app);
    const elsewhere = await client(app);
    await here.signIn(user.email);
    await elsewhere.signIn(user.email);
    expect(await Session.count({ where: { userId: user.id } })).toBe(2);

    const res = await here.post('/api/account/password', {
      currentPassword: TEST_PASSWORD,
      newPassword: 'a-brand-new-secret',
    });
    expect(res.status).toBe(200);
    expect(await Session.count({ where: { userId: user.id } })).toBe(1);
    expect(
      ((await here.get('/api/auth/me')).body as { data: { user: unknown } }).data.user,
    ).not.toBeNull();
    expect(
      ((await elsewhere.get('/api/auth/me')).body as { data: { user: unknown } }).data.user,
    ).toBeNull();

    await flushOutbox();
    const [mail] = await inbox(user.email, 'Your Rodewise password was changed');
    expect(mail?.text).toMatch(/other device was signed out/i);
  });
});

describe('10. tokens in the outbox', () => {
  it('verification and reset mails keep no link in clear once sent; other mail is kept', async () => {
    const c = await client(app);
    await c.post('/api/auth/signup', {
      email: 'tokens@test.example',
      password: 'long-enough-pw',
      displayName: 'Token Test',
    });
    const user = await buildUser();
    await c.post('/api/auth/password-reset', { email: user.email });
    await settleBackground();
    const queued = await OutboxEmail.findAll({
      where: { kind: ['verify-email', 'password-reset'] },
    });
    expect(queued).toHaveLength(2);
    expect(queued.every((m) => m.textBody.includes('token='))).toBe(true);

    await flushOutbox();
    // The member still got the link.
    const [reset] = await inbox(user.email, 'Reset your Rodewise password');
    expect(reset?.text).toContain('token=');
    const sent = await OutboxEmail.findAll({ where: { kind: ['verify-email', 'password-reset'] } });
    expect(sent.map((m) => m.status)).toEqual(['sent', 'sent']);
    for (const m of sent) {
      expect(m.textBody).toBe(REDACTED_BODY);
      expect(m.htmlBody).toBeNull();
      expect(`${m.textBody}${m.htmlBody ?? ''}`).not.toContain('token=');
    }
  });
});

describe('14. cookieless GET /api/auth/me', () => {
  it('writes no session row, and the token it gives still works for signing in', async () => {
    for (let i = 0; i < 5; i += 1) {
      const res = await request(app).get('/api/auth/me');
      expect(res.status).toBe(200);
    }
    expect(await Session.count()).toBe(0);

    const user = await buildUser();
    const c = await client(app);
    expect(await Session.count()).toBe(0);
    expect((await c.signIn(user.email)).status).toBe(200);
    expect(await Session.count()).toBe(1);
  });

  it('a visitor token without its cookie, or a forged one, is refused', async () => {
    const me = await request(app).get('/api/auth/me');
    const token = (me.body as { data: { csrfToken: string } }).data.csrfToken;
    const noCookie = await request(app)
      .post('/api/auth/password-reset')
      .set('X-CSRF-Token', token)
      .send({ email: 'x@test.example' });
    expect(noCookie.status).toBe(403);
    const cookie = ([] as string[]).concat(me.headers['set-cookie'] ?? [])[0]?.split(';')[0] ?? '';
    const forged = await request(app)
      .post('/api/auth/password-reset')
      .set('Cookie', cookie)
      .set('X-CSRF-Token', `v.${'A'.repeat(43)}`)
      .send({ email: 'x@test.example' });
    expect(forged.status).toBe(403);
    const good = await request(app)
      .post('/api/auth/password-reset')
      .set('Cookie', cookie)
      .set('X-CSRF-Token', token)
      .send({ email: 'x@test.example' });
    expect(good.status).toBe(202);
  });
});

describe('15. passwords longer than 72 bytes', () => {
  it('are refused with a field message at sign-up, reset and change', async () => {
    const c = await client(app);
    const long = `${'é'.repeat(36)}x`; // 37 characters, 73 bytes
    const signup = await c.post('/api/auth/signup', {
      email: 'long@test.example',
      password: long,
      displayName: 'Long Password',
    });
    expect(signup.status).toBe(400);
    expect(signup.body.error.fields.password).toMatch(/at most 72/);
    expect(await User.count()).toBe(0);

    const user = await buildUser();
    await c.signIn(user.email);
    const change = await c.post('/api/account/password', {
      currentPassword: TEST_PASSWORD,
      newPassword: 'a'.repeat(73),
    });
    expect(change.status).toBe(400);
    expect(change.body.error.fields.newPassword).toMatch(/at most 72/);
  });

  it('a 72-byte password plus extra characters does not sign in', async () => {
    const exact = 'p'.repeat(72);
    const user = await buildUser();
    await user.update({ passwordHash: await passwords.hash(exact, 4) });
    const c = await client(app);
    expect((await c.signIn(user.email, `${exact}-anything`)).status).toBe(401);
    expect((await c.signIn(user.email, exact)).status).toBe(200);
  });
});

describe('16. reset-request timing', () => {
  it('known and unknown addresses answer without waiting for the lookup or the mail, which run afterwards', async () => {
    const user = await buildUser();
    const c = await client(app);
    let release = () => undefined as void;
    const gate = new Promise<void>((resolve) => (release = resolve));
    const findOne = User.findOne.bind(User);
    // Every account lookup is held until both answers are in: an answer that waited on it would never arrive.
    const lookups = vi
      .spyOn(User, 'findOne')
      .mockImplementation(async (...args: Parameters<typeof findOne>) => {
        await gate;
        return findOne(...args);
      });
    const tokens = vi.spyOn(EmailToken, 'create');

    for (const email of [user.email, 'nobody@test.example']) {
      const res = await c.post('/api/auth/password-reset', { email });
      expect(res.status).toBe(202);
      expect(res.body).toEqual({ data: { ok: true } });
    }
    expect(tokens).not.toHaveBeenCalled();
    release();
    await settleBackground();
    // Both addresses were looked up the same way; only the known one got a token and a mail.
    expect(lookups).toHaveBeenCalledTimes(2);
    expect(tokens).toHaveBeenCalledTimes(1);
    await flushOutbox();
    expect(await inbox(user.email, 'Reset your Rodewise password')).toHaveLength(1);
  });
});

describe('19. Cache-Control on personal data', () => {
  it('API answers send no-store, signed in and out', async () => {
    const user = await buildUser();
    const c = await client(app);
    expect((await c.get('/api/auth/me')).headers['cache-control']).toBe('no-store');
    await c.signIn(user.email);
    for (const url of ['/api/auth/me', '/api/threads', '/api/notifications', '/api/boats']) {
      const res = await c.get(url);
      expect(res.status, url).toBe(200);
      expect(res.headers['cache-control'], url).toBe('no-store');
    }
    const login = await c.signIn(user.email);
    expect(login.headers['cache-control']).toBe('no-store');
  });
});
