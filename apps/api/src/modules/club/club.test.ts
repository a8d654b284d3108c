import { afterAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { DEFAULT_CLUB_LOCALE, displayLocale, formatMoney, setDisplayLocale } from '@app/shared';
import { AuditEvent, Harbor, User } from '../../models';
import { buildUser } from '../../testing/builders';
import { client, createTestApp, resetDb } from '../../testing/test-app';
import { setSetting } from './club.service';

const built = createTestApp();
afterAll(() => built.close());
beforeEach(async () => {
  await resetDb();
  vi.restoreAllMocks();
});

describe('GET /api/club', () => {
  it('answers the club name and harbours in name order', async () => {
    await setSetting('clubName', 'Test Cove Sailing Circle');
    await Harbor.create({ name: 'West Pool', slug: 'west-pool' });
    await Harbor.create({ name: 'East Pool', slug: 'east-pool' });
    const res = await (await client(built.app)).get('/api/club');
    expect(res.status).toBe(200);
    expect(res.body.data.name).toBe('Test Cove Sailing Circle');
    expect(res.body.data.harbors.map((h: { slug: string }) => h.slug)).toEqual([
      'east-pool',
      'west-pool',
    ]);
  });

  it('reads MariaDB once for repeated requests', async () => {
    const visitor = await client(built.app);
    const findAll = vi.spyOn(Harbor, 'findAll');
    await visitor.get('/api/club');
    await visitor.get('/api/club');
    await visitor.get('/api/club');
    expect(findAll).toHaveBeenCalledTimes(1);
  });

  it('shows a renamed club and a new harbour at once', async () => {
    const visitor = await client(built.app);
    expect((await visitor.get('/api/club')).body.data.harbors).toEqual([]);
    await setSetting('clubName', 'Renamed Reach Club');
    await Harbor.create({ name: 'North Pool', slug: 'north-pool' });
    const res = await visitor.get('/api/club');
    expect(res.body.data.name).toBe('Renamed Reach Club');
    expect(res.body.data.harbors.map((h: { slug: string }) => h.slug)).toEqual(['north-pool']);
  });
});

describe('PUT /api/club/locale', () => {
  const admin = async () => {
    const user = await buildUser({ roles: ['member', 'admin'] });
    const c = await client(built.app);
    await c.signIn(user.email);
    return { user, c };
  };
  afterAll(() => setDisplayLocale(DEFAULT_CLUB_LOCALE.region));

  it('starts from the default and lets an admin set region, currency and units, audited', async () => {
    const visitor = await client(built.app);
    expect((await visitor.get('/api/club')).body.data.locale).toEqual(DEFAULT_CLUB_LOCALE);
    const { user, c } = await admin();
    const res = await c.put('/api/club/locale', {
      region: 'de-DE',
      currency: 'chf',
      unitSystem: 'imperial',
    });
    expect(res.status).toBe(200);
    const want = { region: 'de-DE', currency: 'CHF', unitSystem: 'imperial' };
    expect(res.body.data.locale).toEqual(want);
    expect((await visitor.get('/api/club')).body.data.locale).toEqual(want);
    // Mails and messages written by this process now use the club's region.
    expect(displayLocale()).toBe('de-DE');
    expect(formatMoney(12050, 'EUR')).toBe('120,50\u00a0€');
    const audit = await AuditEvent.findOne({ where: { action: 'club.locale' } });
    expect(audit?.actorId).toBe(user.id);
    expect(audit?.details).toMatchObject({ before: DEFAULT_CLUB_LOCALE, after: want });
  });

  it('names each bad field and changes nothing', async () => {
    const { c } = await admin();
    const res = await c.put('/api/club/locale', {
      region: 'xx-YY',
      currency: 'QQQ',
      unitSystem: 'cubits',
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(
      expect.arrayContaining(['region', 'currency', 'unitSystem']),
    );
    expect((await c.get('/api/club')).body.data.locale).toEqual(DEFAULT_CLUB_LOCALE);
  });

  it('refuses members who are not admins', async () => {
    const user = await buildUser();
    const c = await client(built.app);
    await c.signIn(user.email);
    const res = await c.put('/api/club/locale', { ...DEFAULT_CLUB_LOCALE, region: 'en-US' });
    expect(res.status).toBe(403);
  });

  it('gives a new member the club’s units', async () => {
    const { c } = await admin();
    await c.put('/api/club/locale', { ...DEFAULT_CLUB_LOCALE, unitSystem: 'imperial' });
    const visitor = await client(built.app);
    const signup = await visitor.post('/api/auth/signup', {
      email: 'new.sailor@example.test',
      displayName: 'New Sailor',
      password: 'a long enough passphrase',
    });
    expect(signup.status).toBeLessThan(300);
    expect((await User.findOne({ where: { email: 'new.sailor@example.test' } }))?.unitSystem).toBe(
      'imperial',
    );
  });
});
