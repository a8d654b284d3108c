import { appendFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { paths } from '../../apps/web/src/config/paths';
import { ARTIFACTS, audit, baseUrl, launch, newCspViolations, signIn } from './browser';
import { PEOPLE as ALL_PEOPLE, demoUrls, settle, type PathKey } from './demo-urls';

let browser: Browser;

/** Progress lines in tests/artifacts/accessibility.log (vitest holds console output until a test ends). */
function log(line: string) {
  mkdirSync(ARTIFACTS, { recursive: true });
  appendFileSync(join(ARTIFACTS, 'accessibility.log'), `${line}\n`);
}

/** One account per role: the seller has the member role only, so axe has seen those screens already. */
const PEOPLE = ALL_PEOPLE.filter((p) => p.who !== 'seller');

/** One concrete URL per route in config/paths.ts, ids taken from the member's own seeded rows. */
let urls: Record<PathKey, string>;

beforeAll(async () => {
  browser = await launch();
  urls = await demoUrls(browser);
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
