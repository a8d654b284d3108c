import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { audit, baseUrl, launch, screenshot, signIn, waitForMail } from './browser';

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser.close();
});

// Demo data (apps/api/seeders/knowledge.ts): Bram and Maren have unread notices; Maren gets the daily digest.
const BRAM = 'bram@larkspit.example';
const MAREN = 'maren@larkspit.example';

describe('notices and the daily digest in Chromium', () => {
  it('a member sees the unread count in the navigation, reads the notices and marks them read', async () => {
    const page = await browser.newPage({ viewport: { width: 390, height: 900 } });
    await signIn(page, BRAM);
    const res = await page.request.get(`${baseUrl()}/api/notifications/unread`);
    const unread = ((await res.json()) as { data: { unread: number } }).data.unread;
    expect(unread).toBeGreaterThan(0);
    await page.getByRole('button', { name: 'Menu' }).click();
    await page.getByRole('link', { name: `Notices, ${unread} unread` }).click();
    await page.getByRole('heading', { level: 1, name: 'Notices' }).waitFor();
    await expect
      .poll(() => page.getByText('New', { exact: true }).count(), { timeout: 10000 })
      .toBe(unread);
    await audit(page, 'notices (member, 390 px)');
    await screenshot(page, 'notices-390');
    await page.getByRole('button', { name: `Mark all ${unread} as read` }).click();
    // While the request runs the button reads "Marking…"; once the list is fresh no notice is new.
    await expect
      .poll(() => page.getByText('New', { exact: true }).count(), { timeout: 10000 })
      .toBe(0);
    expect(await page.getByRole('button', { name: /^Mark all|^Marking/ }).count()).toBe(0);
    await page.getByRole('button', { name: 'Menu' }).click();
    await page.getByRole('link', { name: 'Notices', exact: true }).waitFor();
    await page.close();
  });

  it('the digest e-mail arrives, its stop link turns it off signed out, and the account page turns it on again', async () => {
    // The API's digest job runs shortly after start; the seeded member's unread notices are in it.
    const mail = await waitForMail(MAREN, 'unread notice', 60_000);
    expect(mail.text).toContain('/knowledge/');
    const stop = /https?:\/\/\S+\/notices\/stop-digest\?token=\S+/.exec(mail.text)?.[0];
    expect(stop, 'a stop link in the digest').toBeDefined();
    const link = new URL(stop ?? '');

    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await page.goto(`${baseUrl()}${link.pathname}${link.search}`);
    await page.getByRole('heading', { level: 1, name: 'Stop the daily digest' }).waitFor();
    await audit(page, 'stop digest (visitor)');
    await page.getByRole('button', { name: 'Stop the digest' }).click();
    await page.getByText('The daily digest is off').waitFor();

    await signIn(page, MAREN);
    await page.goto(`${baseUrl()}/account`);
    const box = page.getByRole('checkbox', { name: /daily digest of unread notices/ });
    await box.waitFor();
    expect(await box.isChecked()).toBe(false);
    // The box keeps its place while the web font swaps in (flex-shrink: 0 in the base styles); wait for the
    // font anyway so the click lands where a person would tap.
    await page.evaluate(async () => {
      await document.fonts.ready;
    });
    await box.check();
    await page.getByText('The daily digest is on.').waitFor();
    await page.reload();
    await page.getByRole('checkbox', { name: /daily digest of unread notices/ }).waitFor();
    expect(
      await page.getByRole('checkbox', { name: /daily digest of unread notices/ }).isChecked(),
    ).toBe(true);
    await page.close();
  }, 120_000);
});
