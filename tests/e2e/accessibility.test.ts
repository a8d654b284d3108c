import { appendFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { paths } from '../../apps/web/src/config/paths';
import { ARTIFACTS, audit, baseUrl, launch, newCspViolations, signIn } from './browser';

let browser: Browser;

/** Progress lines in tests/artifacts/accessibility.log (vitest holds console output until a test ends). */
function log(line: string) {
  mkdirSync(ARTIFACTS, { recursive: true });
  appendFileSync(join(ARTIFACTS, 'accessibility.log'), `${line}\n`);
}

/** The demo accounts (apps/api/seeders/demo.ts), one per role. */
const PEOPLE = [
  { who: 'visitor', email: null },
  { who: 'member', email: 'maren@larkspit.example' },
  { who: 'moderator', email: 'moderator@larkspit.example' },
  { who: 'treasurer', email: 'treasurer@larkspit.example' },
  { who: 'admin', email: 'admin@larkspit.example' },
] as const;

type PathKey = keyof typeof paths;
/** One concrete URL per route in config/paths.ts, ids taken from the member's own seeded rows. */
let urls: Record<PathKey, string>;

async function data<T>(page: Page, url: string): Promise<T> {
  const res = await page.request.get(`${baseUrl()}${url}`);
  expect(res.status(), url).toBe(200);
  return ((await res.json()) as { data: T }).data;
}

/** Waits until the screen has a heading (or an error message) and nothing in <main> is still spinning. */
async function settle(page: Page) {
  await page
    .waitForFunction(
      () =>
        document.querySelector('main h1, main h2, main [role=alert]') !== null &&
        document.querySelector('main .animate-spin') === null,
      undefined,
      { timeout: 8000 },
    )
    .catch(() => undefined);
}

beforeAll(async () => {
  browser = await launch();
  const page = await browser.newPage();
  await signIn(page, 'maren@larkspit.example');
  const boats = await data<Array<{ id: number }>>(page, '/api/boats');
  const boatId = boats[0]?.id;
  expect(boatId, 'the member has a seeded boat').toBeDefined();
  let plans = await data<Array<{ id: number }>>(page, '/api/tackle-plans');
  if (plans.length === 0) {
    await page.goto(`${baseUrl()}/boats/${boatId}`);
    await page
      .getByRole('region', { name: 'Everyday: 30 kn' })
      .getByRole('button', { name: 'Save as plan' })
      .click();
    await page.waitForURL(/\/plans\/\d+$/, { timeout: 15000 });
    plans = await data<Array<{ id: number }>>(page, '/api/tackle-plans');
  }
  const myPosts = await data<Array<{ id: number; status: string }>>(page, '/api/posts/mine');
  const posts = await data<Array<{ id: number }>>(page, '/api/posts');
  const myListings = await data<Array<{ id: number; status: string }>>(page, '/api/listings/mine');
  const listings = await data<Array<{ id: number }>>(page, '/api/listings');
  const threads = await data<Array<{ id: number }>>(page, '/api/threads');
  const watches = await data<Array<{ id: number; status: string }>>(page, '/api/storm-watches');
  const watchId = (watches.find((w) => w.status === 'open') ?? watches[0])?.id;
  await page.close();
  const need = (label: string, id: number | undefined) => {
    expect(id, `seeded ${label}`).toBeDefined();
    return id as number;
  };
  urls = {
    home: paths.home.href(),
    signIn: paths.signIn.href(),
    signUp: paths.signUp.href(),
    verifyEmail: `${paths.verifyEmail.href()}?token=not-a-real-token`,
    resetPassword: paths.resetPassword.href(),
    account: paths.account.href(),
    notifications: paths.notifications.href(),
    stopDigest: paths.stopDigest.href('1.not-a-real-stop-token'),
    adminUsers: paths.adminUsers.href(),
    adminTopics: paths.adminTopics.href(),
    adminClub: paths.adminClub.href(),
    knowledge: paths.knowledge.href(),
    postNew: paths.postNew.href(),
    post: paths.post.href(need('post', posts[0]?.id)),
    postEdit: paths.postEdit.href(need('own post', myPosts[0]?.id)),
    moderation: paths.moderation.href(),
    moderationLog: paths.moderationLog.href(),
    calculators: paths.calculators.href(),
    boats: paths.boats.href(),
    boat: paths.boat.href(need('boat', boatId)),
    plan: paths.plan.href(need('plan', plans[0]?.id)),
    dues: paths.dues.href(),
    duesPaid: paths.duesPaid.href(),
    treasury: paths.treasury.href(),
    treasuryRoster: paths.treasuryRoster.href(),
    treasuryPlans: paths.treasuryPlans.href(),
    exchange: paths.exchange.href(),
    exchangeMine: paths.exchangeMine.href(),
    listingNew: paths.listingNew.href(),
    listing: paths.listing.href(need('listing', listings[0]?.id)),
    listingEdit: paths.listingEdit.href(
      need('own listing', (myListings.find((l) => l.status === 'active') ?? myListings[0])?.id),
    ),
    messages: paths.messages.href(),
    thread: paths.thread.href(need('thread', threads[0]?.id)),
    storm: paths.storm.href(),
    stormNew: paths.stormNew.href(),
    stormChecklist: paths.stormChecklist.href(),
    stormWatch: paths.stormWatch.href(need('storm watch', watchId)),
    stormBoard: paths.stormBoard.href(need('storm watch', watchId)),
    stormBoat: paths.stormBoat.href(need('storm watch', watchId), need('boat', boatId)),
  };
});
afterAll(async () => {
  await browser.close();
});

describe('axe on every screen, for every role, at desktop and phone widths', () => {
  it('has a URL for every route the client declares', () => {
    expect(Object.keys(urls).sort()).toEqual(Object.keys(paths).sort());
  });

  it.each(PEOPLE)(
    '$who: no serious or critical violations on any screen',
    async ({ who, email }) => {
      const failures: string[] = [];
      for (const width of [1280, 390]) {
        const page = await browser.newPage({ viewport: { width, height: 900 } });
        if (email) await signIn(page, email);
        for (const [key, url] of Object.entries(urls)) {
          const t0 = Date.now();
          await page.goto(`${baseUrl()}${url}`);
          await settle(page);
          const t1 = Date.now();
          try {
            await audit(page, `${key} as ${who} at ${width} px`);
          } catch (err) {
            failures.push((err as Error).message);
          }
          log(`${who} ${width} ${key}: load ${t1 - t0} ms, axe ${Date.now() - t1} ms`);
        }
        // The 404 screen too.
        await page.goto(`${baseUrl()}/no-such-screen`);
        await settle(page);
        await audit(page, `not found as ${who} at ${width} px`).catch((err: unknown) =>
          failures.push((err as Error).message),
        );
        await page.close();
      }
      failures.forEach((f) => log(f));
      expect(failures, failures.join('\n\n')).toEqual([]);
    },
    600_000,
  );
});

describe('the checks themselves', () => {
  it('axe fails a page with an unlabelled field and an empty button', async () => {
    const page = await browser.newPage();
    await page.goto(`${baseUrl()}/calculators`);
    await settle(page);
    await page.evaluate(() => {
      const main = document.querySelector('main');
      main?.insertAdjacentHTML('beforeend', '<input type="text"><button></button>');
    });
    await expect(audit(page, 'planted faults')).rejects.toThrow(/label|button-name/);
    await page.close();
  });

  it('a refused inline script is caught by the page listener and by the report endpoint', async () => {
    const found: ReturnType<typeof newCspViolations> = [];
    const page = await browser.newPage();
    await page.goto(`${baseUrl()}/`);
    await settle(page);
    await page.evaluate(() => {
      const s = document.createElement('script');
      s.textContent = 'window.planted = 1';
      document.body.append(s);
    });
    await expect
      .poll(
        () => {
          found.push(...newCspViolations());
          return [...new Set(found.map((v) => v.via))].sort();
        },
        { timeout: 10000 },
      )
      .toEqual(['console', 'event', 'report']);
    expect(found.every((v) => /script-src/.test(v.detail))).toBe(true);
    expect(await page.evaluate(() => (window as unknown as { planted?: number }).planted)).toBe(
      undefined,
    );
    await page.close();
  });
});
