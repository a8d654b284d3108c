import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { audit, baseUrl, launch, screenshot, signIn } from './browser';

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser.close();
});

const WIDE = [1024, 1280] as const;

/** The demo accounts with the most navigation: an admin, a treasurer, a moderator and a plain member. */
const PEOPLE = [
  { who: 'admin', email: 'admin@larkspit.example', desk: null },
  { who: 'treasurer', email: 'treasurer@larkspit.example', desk: "Treasurer's desk" },
  { who: 'moderator', email: 'moderator@larkspit.example', desk: 'Moderation desk' },
  { who: 'member', email: 'maren@larkspit.example', desk: null },
] as const;

/** The top of every item the bar shows (not the folded menus): one row means one common top. */
async function barRows(page: Page): Promise<number> {
  return page.evaluate(() => {
    const nav = document.querySelector('nav[aria-label="Main"] > ul');
    if (!nav) return 0;
    const tops = new Set<number>();
    for (const li of Array.from(nav.children)) {
      const box = li.getBoundingClientRect();
      if (box.width > 0 && box.height > 0) tops.add(Math.round(box.top));
    }
    return tops.size;
  });
}

async function openHome(page: Page, email: string) {
  await signIn(page, email);
  await page.goto(`${baseUrl()}/`);
  await page.getByRole('heading', { level: 1, name: /^Welcome back/ }).waitFor({ timeout: 15000 });
  await page.getByRole('region', { name: 'My boats' }).waitFor({ timeout: 15000 });
}

describe('the grouped navigation and the member home in Chromium', () => {
  for (const width of WIDE) {
    it.each(PEOPLE)(
      `$who: the bar fits on one line at ${width} px and its menus open`,
      async ({ who, email, desk }) => {
        const page = await browser.newPage({ viewport: { width, height: 900 } });
        await openHome(page, email);
        const nav = page.getByRole('navigation', { name: 'Main' });
        await nav.getByRole('button', { name: /^Account/ }).waitFor({ timeout: 10000 });
        expect(await barRows(page), `${who} at ${width} px`).toBe(1);
        // The bar is one line of text tall (44 px targets plus padding), never two.
        const header = await page.locator('header').first().boundingBox();
        expect(header?.height ?? 0).toBeLessThan(90);
        if (desk) {
          const card = page.getByRole('region', { name: desk });
          await expect
            .poll(
              async () =>
                (await card.innerText()).match(/\d+ (members?|payments?|posts?)/)?.length ?? 0,
              {
                timeout: 10000,
              },
            )
            .toBeGreaterThan(0);
        }
        await audit(page, `home as ${who} at ${width} px`);
        await screenshot(page, `home-${who}-${width}`);

        const account = nav.getByRole('button', { name: /^Account/ });
        await account.click();
        expect(await account.getAttribute('aria-expanded')).toBe('true');
        const menu = nav.getByRole('list', { name: 'Account' });
        await menu.getByRole('link', { name: 'Dues' }).waitFor();
        expect(await menu.getByRole('button', { name: 'Sign out' }).isVisible()).toBe(true);
        await audit(page, `account menu as ${who} at ${width} px`);
        await screenshot(page, `nav-account-${who}-${width}`);
        await page.keyboard.press('Escape');
        expect(await account.getAttribute('aria-expanded')).toBe('false');
        expect(await menu.getByRole('link', { name: 'Dues' }).isVisible()).toBe(false);

        const desks = nav.getByRole('button', { name: /^Desks/ });
        if (who === 'member') {
          expect(await desks.count()).toBe(0);
        } else {
          await desks.click();
          const list = nav.getByRole('list', { name: 'Desks' });
          expect(await list.getByRole('link').first().isVisible()).toBe(true);
          await screenshot(page, `nav-desks-${who}-${width}`);
          // A click outside closes it.
          await page.getByRole('heading', { level: 1 }).click();
          await expect.poll(() => desks.getAttribute('aria-expanded')).toBe('false');
        }
        await page.close();
      },
    );
  }

  it('a treasurer goes from the home to the treasury through the Desks menu', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await openHome(page, 'treasurer@larkspit.example');
    const nav = page.getByRole('navigation', { name: 'Main' });
    await nav.getByRole('button', { name: /^Desks/ }).click();
    await nav.getByRole('link', { name: 'Treasury' }).click();
    await page.waitForURL(/\/treasury$/);
    await page.close();
  });

  it.each(PEOPLE)(
    '$who: the phone menu lists every item under its group at 390 px',
    async ({ who, email }) => {
      const page = await browser.newPage({ viewport: { width: 390, height: 844 } });
      await openHome(page, email);
      await audit(page, `home as ${who} at 390 px`);
      await screenshot(page, `home-${who}-390`);
      await page.getByRole('button', { name: 'Menu' }).click();
      const nav = page.getByRole('navigation', { name: 'Main' });
      for (const name of ['Home', 'Exchange', 'Dues', 'My boats', 'Settings']) {
        expect(await nav.getByRole('link', { name, exact: true }).isVisible(), name).toBe(true);
      }
      expect(await nav.getByRole('button', { name: 'Sign out' }).isVisible()).toBe(true);
      // No group button on a phone: the group's items are listed outright.
      expect(await nav.getByRole('button', { name: /^Account/ }).isVisible()).toBe(false);
      if (who !== 'member') {
        expect(
          await nav.getByRole('list', { name: 'Desks' }).getByRole('link').first().isVisible(),
        ).toBe(true);
      }
      await audit(page, `phone menu as ${who}`);
      await screenshot(page, `nav-phone-${who}-390`);
      await nav.getByRole('link', { name: 'My boats', exact: true }).click();
      await page.waitForURL(/\/boats$/);
      await page.close();
    },
  );

  it('a visitor gets the welcome with recent posts and listings', async () => {
    for (const width of [390, 1024, 1280]) {
      const page = await browser.newPage({ viewport: { width, height: 900 } });
      await page.goto(`${baseUrl()}/`);
      await page.getByRole('heading', { level: 1, name: 'Welcome aboard' }).waitFor();
      const posts = page.getByRole('region', { name: 'Recent posts' });
      await posts.getByRole('link').first().waitFor({ timeout: 10000 });
      await page
        .getByRole('region', { name: 'Recent listings' })
        .getByRole('link')
        .first()
        .waitFor({ timeout: 10000 });
      // A visitor sees nothing of a member's own things.
      expect(await page.getByRole('region', { name: 'My dues' }).count()).toBe(0);
      if (width > 390) expect(await barRows(page)).toBe(1);
      await audit(page, `visitor home at ${width} px`);
      await screenshot(page, `home-visitor-${width}`);
      await page.close();
    }
  });
});
