import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '@app/shared';
import { navEntries, navFor } from '../../apps/web/src/config/nav';
import { audit, baseUrl, launch, screenshot, signIn, waitForMail } from './browser';

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser.close();
});

/** The demo accounts (apps/api/seeders/demo.ts) and their roles. */
const ROLES: Array<{ who: string; email: string | null; roles: Role[] }> = [
  { who: 'visitor', email: null, roles: [] },
  { who: 'member', email: 'maren@larkspit.example', roles: ['member'] },
  { who: 'moderator', email: 'moderator@larkspit.example', roles: ['member', 'moderator'] },
  { who: 'treasurer', email: 'treasurer@larkspit.example', roles: ['member', 'treasurer'] },
  { who: 'admin', email: 'admin@larkspit.example', roles: ['member', 'admin'] },
];

describe('role-aware navigation in Chromium', () => {
  it.each(ROLES)(
    '$who sees exactly the navigation for their roles',
    async ({ who, email, roles }) => {
      const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
      if (email) await signIn(page, email);
      await page.goto(`${baseUrl()}/`);
      const nav = page.getByRole('navigation', { name: 'Main' });
      // In the order the bar shows them: each group's items where the group sits.
      const visible = navFor(email ? { roles } : null);
      const expected = (['primary', 'account'] as const)
        .flatMap((section) => navEntries(visible, section))
        .flatMap((e) => (e.kind === 'item' ? [e.item] : e.items))
        .map((i) => i.label);
      // Items only (a group's own button carries aria-controls); textContent, as grouped items are folded away.
      const items = nav.locator('li > a, li > button:not([aria-controls])');
      await expect.poll(async () => items.count(), { timeout: 10000 }).toBe(expected.length);
      const shown = (await items.allTextContents()).map((t) => t.trim());
      // Each item starts with its label (an item may add a count after it).
      expect(shown.length).toBe(expected.length);
      expected.forEach((label, i) =>
        expect(shown[i]?.startsWith(label), `${who}: "${shown[i]}" vs "${label}"`).toBe(true),
      );
      if (!roles.includes('admin')) expect(shown).not.toContain('Admin');
      await audit(page, `home as ${who}`);
      await page.close();
    },
  );

  it('an admin grants and revokes a role on the admin page', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(page, 'admin@larkspit.example');
    await page.goto(`${baseUrl()}/admin/users`);
    const box = page.getByRole('checkbox', { name: /^Moderator role for Bram Cleatson$/i });
    await expect.poll(() => box.count(), { timeout: 10000 }).toBe(1);
    await audit(page, 'admin users');
    await box.click();
    await expect.poll(() => box.isChecked(), { timeout: 10000 }).toBe(true);
    await expect
      .poll(() => page.getByRole('button', { name: 'Undo' }).count(), { timeout: 10000 })
      .toBe(1);
    await waitForMail('bram@larkspit.example', 'roles changed');
    const res = await page.request.get(`${baseUrl()}/api/admin/users?q=bram`);
    const users = ((await res.json()) as { data: Array<{ email: string; roles: string[] }> }).data;
    expect(users.find((u) => u.email === 'bram@larkspit.example')?.roles).toContain('moderator');

    // Revoking asks first.
    await box.click();
    const dialog = page.getByRole('dialog');
    await expect.poll(() => dialog.isVisible(), { timeout: 10000 }).toBe(true);
    await audit(page, 'revoke confirmation dialog');
    await dialog.getByRole('button', { name: /revoke|remove/i }).click();
    await expect.poll(() => box.isChecked(), { timeout: 10000 }).toBe(false);
    await page.close();
  });
});

describe('home page', () => {
  it('renders for a visitor at 1280 px and at a 390 px phone width without sideways scrolling', async () => {
    for (const [name, width] of [
      ['home-1280', 1280],
      ['home-390', 390],
    ] as const) {
      const page = await browser.newPage({ viewport: { width, height: 900 } });
      await page.goto(`${baseUrl()}/`);
      await expect.poll(() => page.getByRole('heading', { level: 1 }).count()).toBeGreaterThan(0);
      const overflow = await page.evaluate(
        () => document.documentElement.scrollWidth - window.innerWidth,
      );
      expect(overflow).toBeLessThanOrEqual(0);
      await expect
        .poll(() => page.getByText('Larkspit Sound Cruising Club').count())
        .toBeGreaterThan(0);
      await screenshot(page, name);
      await audit(page, name);
      await page.close();
    }
  });
});

describe('the first paint', () => {
  it('preloads the upright faces and paints the header bar before any script has run', async () => {
    const html = await (await fetch(`${baseUrl()}/`)).text();
    const fonts = [...html.matchAll(/<link rel="preload" as="font"[^>]* href="([^"]+)"/g)].map(
      (m) => m[1] ?? '',
    );
    expect(fonts).toHaveLength(2);
    expect(fonts.join(' ')).toMatch(/400-normal.*700-normal/);
    for (const href of fonts) expect((await fetch(`${baseUrl()}${href}`)).status).toBe(200);
    // With scripts off, what the browser paints from the HTML alone: the wordmark in the ink-blue bar.
    const context = await browser.newContext({ javaScriptEnabled: false });
    const page = await context.newPage();
    await page.goto(`${baseUrl()}/`);
    await expect.poll(() => page.locator('header').innerText()).toBe('Rodewise');
    expect(
      await page.locator('header').evaluate((el) => getComputedStyle(el).backgroundColor),
    ).not.toBe('rgba(0, 0, 0, 0)');
    await context.close();
  });
});

describe('joining the club', () => {
  it('signs up, confirms the address from the fake inbox, signs in and out', async () => {
    const page = await browser.newPage({ viewport: { width: 390, height: 844 } });
    const email = `newcomer-${Date.now()}@larkspit.example`;
    await page.goto(`${baseUrl()}/join`);
    await page.getByLabel(/^Your name/).waitFor();
    await audit(page, 'join form');
    await page.getByLabel(/^Your name/).fill('Ada Newcomer');
    await page.getByLabel(/^E-mail/).fill(email);
    await page.getByLabel(/^Password/).fill('a-long-enough-secret');
    await page.getByRole('button', { name: 'Create account' }).click();
    await expect
      .poll(() => page.getByText('Check your inbox').count(), { timeout: 10000 })
      .toBeGreaterThan(0);
    await audit(page, 'join: check your inbox');

    const mail = await waitForMail(email, 'Confirm your e-mail');
    const link = /https?:\/\/\S+verify-email\?token=\S+/.exec(mail.text)?.[0];
    expect(link).toBeDefined();
    await page.goto(link ?? '');
    await expect
      .poll(() => page.getByText(/confirmed|verified/i).count(), { timeout: 10000 })
      .toBeGreaterThan(0);
    await audit(page, 'e-mail confirmed');

    await signIn(page, email, 'a-long-enough-secret');
    await page.getByRole('button', { name: 'Menu' }).click();
    await audit(page, 'phone menu open');
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('button', { name: 'Menu' }).click();
    await expect
      .poll(() => page.getByRole('link', { name: 'Sign in' }).count(), { timeout: 10000 })
      .toBeGreaterThan(0);
    await page.close();
  });
});
