import sharp from 'sharp';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launch, screenshot, signIn, waitForMail } from './browser';

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser.close();
});

// Demo data (apps/api/seeders): Maren is a plain member, the moderator account holds the moderator role.
const AUTHOR = 'maren@larkspit.example';
const MODERATOR = 'moderator@larkspit.example';
const TITLE = 'A kellet halfway down the rode for a crowded anchorage';
const LINK = 'https://example.org/kellet-notes';

const picture = () =>
  sharp({ create: { width: 640, height: 400, channels: 3, background: '#3b6e8f' } })
    .png()
    .toBuffer();

async function newPage(width = 1280): Promise<Page> {
  return browser.newPage({ viewport: { width, height: 1000 } });
}

/** Signs out through the navigation's own button. */
async function signOut(page: Page) {
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.getByRole('link', { name: 'Sign in' }).waitFor({ timeout: 15000 });
}

describe('shared knowledge in Chromium', () => {
  let postUrl = '';

  it('a member writes a formatted post with an image and a setup block, then signs out', async () => {
    const page = await newPage();
    await signIn(page, AUTHOR);
    await page.goto(`${baseUrl()}/knowledge/new`);
    await page.getByLabel('Title').fill(TITLE);
    await page.getByLabel('Topic').selectOption({ label: 'Anchoring' });

    const body = page.getByRole('textbox', { name: 'Post' });
    await body.click();
    const tool = (name: string) =>
      page.getByRole('toolbar', { name: 'Formatting' }).getByRole('button', { name, exact: true });
    await tool('Heading').click();
    await page.keyboard.type('Why a kellet');
    await page.keyboard.press('Enter');
    await page.keyboard.type('A ');
    await tool('Bold').click();
    await page.keyboard.type('kellet');
    await tool('Bold').click();
    await page.keyboard.type(' lowers the angle of pull and shortens the swing.');
    await page.keyboard.press('Enter');
    await tool('Bulleted list').click();
    await page.keyboard.type('Shackle moused with monel wire');
    await page.keyboard.press('Enter');
    await page.keyboard.type('Chafe gear where the rode meets the roller');
    await page.keyboard.press('Enter');
    await page.keyboard.press('Enter');
    await page.keyboard.type('More in the notes');
    for (let i = 0; i < 'notes'.length; i++) await page.keyboard.press('Shift+ArrowLeft');
    page.once('dialog', (d) => void d.accept(LINK));
    await tool('Link').click();
    await expect.poll(() => body.locator(`a[href="${LINK}"]`).count()).toBe(1);
    await page.keyboard.press('End');
    await page.keyboard.press('Enter');
    await page
      .getByLabel('Image file')
      .setInputFiles({ name: 'kellet-rig.png', mimeType: 'image/png', buffer: await picture() });
    await expect.poll(() => body.locator('img').count(), { timeout: 15000 }).toBe(1);

    await page.getByLabel(/Add a tackle setup block/).check();
    await page.getByLabel('Boat name or type').fill('10 m cruising sloop');
    await page.getByLabel('Length overall (m)').fill('10');
    await page.getByLabel('Beam (m)').fill('3.4');
    await page.getByLabel('Anchor mass (kg)').fill('16');
    await page.getByLabel('Chain trade size (in)').fill('0.3125');
    await page.getByLabel('Chain length (m)').fill('50');
    await page.getByLabel('Nylon snubber diameter (mm)').fill('16');
    await page.getByLabel('Snubber length (m)').fill('6');
    await page.getByLabel('Anchor shackle size (in)').fill('0.375');

    await page.getByRole('button', { name: 'Send to the moderators' }).click();
    await page.waitForURL(/\/knowledge\/\d+$/, { timeout: 15000 });
    postUrl = page.url();
    await page.getByRole('heading', { name: TITLE }).waitFor({ timeout: 15000 });
    await expect.poll(() => page.getByText('Waiting for a moderator').count()).toBe(1);
    await signOut(page);

    // Signed out, the pending post is not for others to read.
    await page.goto(postUrl);
    await page.getByText(/Couldn't open this post/).waitFor({ timeout: 15000 });
    await page.close();
  });

  it('a moderator sees it waiting, approves it from the queue, and the author is told', async () => {
    const page = await newPage();
    await signIn(page, MODERATOR);
    const nav = page.getByRole('navigation', { name: 'Main' });
    const item = nav.getByRole('link', { name: /^Moderation, \d+ waiting$/ });
    await item.waitFor({ timeout: 15000 });
    const before = Number((await item.getAttribute('aria-label'))?.match(/\d+/)?.[0]);
    expect(before).toBeGreaterThan(0);
    await item.click();
    await page.getByRole('button', { name: `Approve “${TITLE}”` }).click();
    await expect
      .poll(() => page.getByRole('button', { name: `Approve “${TITLE}”` }).count(), {
        timeout: 15000,
      })
      .toBe(0);
    await expect
      .poll(() => nav.getByRole('link', { name: `Moderation, ${before - 1} waiting` }).count(), {
        timeout: 15000,
      })
      .toBe(1);
    const mail = await waitForMail(AUTHOR, 'Your post is published');
    expect(mail.text).toContain(TITLE);
    await page.close();
  });

  it('a visitor finds the post by a misspelt word and reads it, formatting, image and setup intact', async () => {
    const page = await newPage();
    await page.goto(`${baseUrl()}/knowledge`);
    await page.getByLabel('Search posts').fill('kelet');
    await page.getByRole('button', { name: 'Search', exact: true }).click();
    const link = page.getByRole('link', { name: TITLE });
    await link.waitFor({ timeout: 15000 });
    expect(page.url()).toMatch(/q=kelet/);
    await expect.poll(() => page.locator('mark').count()).toBeGreaterThan(0);
    await link.click();
    await page.getByRole('heading', { name: TITLE, level: 1 }).waitFor({ timeout: 15000 });
    const article = page.locator('article');
    await expect.poll(() => article.locator('h2', { hasText: 'Why a kellet' }).count()).toBe(1);
    await expect.poll(() => article.locator('strong', { hasText: 'kellet' }).count()).toBe(1);
    await expect.poll(() => article.locator('ul > li').count()).toBe(2);
    await expect.poll(() => article.locator(`a[href="${LINK}"]`).count()).toBe(1);
    const img = article.locator('img');
    await expect.poll(() => img.count()).toBe(1);
    await expect
      .poll(() => img.evaluate((el) => (el as HTMLImageElement).naturalWidth), { timeout: 15000 })
      .toBeGreaterThan(0);
    await page.getByRole('heading', { name: /Tackle setup/i }).waitFor();
    const card = page.getByRole('region', { name: /Tackle setup/ });
    await expect.poll(() => card.getByText('Weakest link', { exact: true }).count()).toBe(1);
    await expect.poll(() => card.getByText('Design load', { exact: true }).count()).toBe(1);
    await expect.poll(() => card.getByText(/manufacturer|maker/i).count()).toBeGreaterThan(0);
    await screenshot(page, 'knowledge-post-1280');
    await page.setViewportSize({ width: 390, height: 900 });
    await expect
      .poll(() => page.evaluate(() => document.documentElement.scrollWidth))
      .toBeLessThanOrEqual(390);
    await screenshot(page, 'knowledge-post-390');
    await page.close();
  });
});
