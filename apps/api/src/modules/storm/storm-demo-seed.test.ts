import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD, seedDemo } from '../../../seeders/demo';
import { resetPostIndex } from '../posts/post-index';
import { client, createTestApp, resetDb } from '../../testing/test-app';

const built = createTestApp();
afterAll(() => built.close());
beforeAll(async () => {
  await resetDb();
  resetPostIndex();
  expect(await seedDemo(built.sequelize, 4)).toBe(true);
});

describe('storm watch demo data', () => {
  it('holds one closed watch with lessons and one open watch whose seeded plans the board checks', async () => {
    const mod = await client(built.app);
    expect((await mod.signIn('moderator@larkspit.example', DEMO_PASSWORD)).status).toBe(200);
    const watches = (await mod.get('/api/storm-watches')).body.data as Array<{
      id: number;
      status: string;
      lessons: string | null;
    }>;
    expect(watches.map((w) => w.status)).toEqual(['open', 'closed']);
    expect(watches[1]?.lessons).toMatch(/snubber/);
    const board = await mod.get(`/api/storm-watches/${watches[0]?.id ?? 0}/board`);
    expect(board.status).toBe(200);
    const rows = board.body.data.rows as Array<{
      status: string;
      details: { check: { loadN: number; cautions: string[] } | null } | null;
    }>;
    expect(new Set(rows.map((r) => r.status))).toEqual(
      new Set(['in-progress', 'ready', 'help-wanted', 'not-started']),
    );
    const checked = rows.filter((r) => r.details?.check);
    expect(checked.length).toBeGreaterThanOrEqual(1);
    for (const r of checked) {
      expect(r.details?.check?.loadN).toBeGreaterThan(0);
      expect(r.details?.check?.cautions.join(' ')).toMatch(/harbour master/);
    }

    // A member of the club sees the other boats by name and status only.
    const bram = await client(built.app);
    await bram.signIn('bram@larkspit.example', DEMO_PASSWORD);
    const asBram = (await bram.get(`/api/storm-watches/${watches[0]?.id ?? 0}/board`)).body.data
      .rows as Array<{ mine: boolean; details: unknown }>;
    expect(asBram.filter((r) => !r.mine).every((r) => r.details === null)).toBe(true);
  });
});
