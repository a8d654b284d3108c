import sharp from 'sharp';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { audit, baseUrl, launch, screenshot, signIn, waitForMail } from './browser';

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
  await page.getByRole('button', { name: /^Account/ }).click();
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page
    .getByRole('navigation', { name: 'Main' })
    .getByRole('link', { name: 'Sign in' })
    .waitFor({ timeout: 15000 });
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
    await tool('Link').click();
    const linkDialog = page.getByRole('dialog', { name: 'Add a link' });
    await linkDialog.getByLabel('Link address').fill('javascript:alert(1)');
    await linkDialog.getByRole('button', { name: 'Save link' }).click();
    await linkDialog.getByText(/web address/).waitFor();
    await linkDialog.getByLabel('Link address').fill(LINK);
    await linkDialog.getByRole('button', { name: 'Save link' }).click();
    await linkDialog.waitFor({ state: 'hidden' });
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

    await audit(page, 'post editor with setup block');
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
    const desks = nav.getByRole('button', { name: /^Desks, \d+ waiting$/ });
    await desks.waitFor({ timeout: 15000 });
    await desks.click();
    const item = nav.getByRole('link', { name: /^Moderation, \d+ waiting$/ });
    await item.waitFor({ timeout: 15000 });
    const before = Number((await item.getAttribute('aria-label'))?.match(/\d+/)?.[0]);
    expect(before).toBeGreaterThan(0);
    await item.click();
    await page.getByRole('button', { name: `Publish “${TITLE}”` }).waitFor({ timeout: 15000 });
    await audit(page, 'moderation queue');
    await page.getByRole('button', { name: `Publish “${TITLE}”` }).click();
    await expect
      .poll(() => page.getByRole('button', { name: `Publish “${TITLE}”` }).count(), {
        timeout: 15000,
      })
      .toBe(0);
    await expect
      .poll(
        () =>
          // The Desks menu has closed; its button carries the same count.
          nav
            .getByRole('button', {
              name: before - 1 > 0 ? `Desks, ${before - 1} waiting` : 'Desks',
              exact: true,
            })
            .count(),
        { timeout: 15000 },
      )
      .toBe(1);
    const mail = await waitForMail(AUTHOR, 'Your post is published', 15000, TITLE);
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
    await audit(page, 'published post with setup card');
    await screenshot(page, 'knowledge-post-1280');
    await page.setViewportSize({ width: 390, height: 900 });
    await expect
      .poll(() => page.evaluate(() => document.documentElement.scrollWidth))
      .toBeLessThanOrEqual(390);
    await screenshot(page, 'knowledge-post-390');
    await page.close();
  });

  let reportedTitle = '';

  it('a member reports a listing from the exchange', async () => {
    const page = await newPage(390);
    await signIn(page, AUTHOR);
    await page.goto(`${baseUrl()}/exchange`);
    const links = page.locator('main a[href^="/exchange/listings/"]');
    await links.first().waitFor({ timeout: 15000 });
    const hrefs = await links.evaluateAll((els) => els.map((a) => a.getAttribute('href') ?? ''));
    for (const href of [...new Set(hrefs)].slice(0, 8)) {
      await page.goto(`${baseUrl()}${href}`);
      await page.getByRole('heading', { level: 1 }).waitFor({ timeout: 15000 });
      if ((await page.getByText('Report this listing').count()) === 0) continue;
      reportedTitle = (await page.getByRole('heading', { level: 1 }).innerText()).trim();
      await page.getByText('Report this listing').click();
      await page.getByLabel('What is wrong?').fill('The photos show a different anchor type');
      await page.getByRole('button', { name: 'Send report' }).click();
      await page.getByText(/the moderators will look at it/).waitFor({ timeout: 15000 });
      break;
    }
    expect(reportedTitle).not.toBe('');
    await page.close();
  });

  it('a moderator hides the reported listing from the queue, and the log says why', async () => {
    const page = await newPage(390);
    await signIn(page, MODERATOR);
    await page.goto(`${baseUrl()}/moderation`);
    const section = page.getByRole('region', { name: /^Listings reported/ });
    await section.getByText('The photos show a different anchor type').waitFor({ timeout: 15000 });
    await expect.poll(() => section.getByText(/Maren Tiller reported a listing/).count()).toBe(1);
    await section.getByRole('button', { name: `Hide listing “${reportedTitle}”` }).click();
    const dialog = page.getByRole('dialog', { name: `Hide “${reportedTitle}”?` });
    await dialog.getByLabel('Reason').fill('Misdescribed: the photos are of another anchor');
    await audit(page, 'hide listing dialog');
    await dialog.getByRole('button', { name: 'Hide listing' }).click();
    await expect
      .poll(
        () => section.getByRole('button', { name: `Hide listing “${reportedTitle}”` }).count(),
        {
          timeout: 15000,
        },
      )
      .toBe(0);
    await page.goto(`${baseUrl()}/moderation/log`);
    await page
      .getByText('Misdescribed: the photos are of another anchor')
      // The log is a table at desktop and cards on a phone; only one of them shows.
      .filter({ visible: true })
      .waitFor({ timeout: 15000 });
    await page.close();
  });

  it('an admin adds a topic on the topics screen and it is offered in the editor', async () => {
    const page = await newPage(390);
    await signIn(page, 'admin@larkspit.example');
    await page.goto(`${baseUrl()}/admin/users`);
    await page
      .getByRole('navigation', { name: 'Admin sections' })
      .getByRole('link', { name: 'Topics' })
      .click();
    const add = page.getByRole('region', { name: 'Add a topic' });
    await add.getByLabel(/Topic name/).fill('Kedging and warping');
    await add.getByRole('button', { name: 'Add topic' }).click();
    await page.getByText('Added “Kedging and warping”.').waitFor({ timeout: 15000 });
    await audit(page, 'admin topics');
    await page.getByRole('button', { name: 'Move “Kedging and warping” up' }).click();
    await expect
      .poll(() => page.getByRole('button', { name: 'Move “Kedging and warping” up' }).isEnabled(), {
        timeout: 15000,
      })
      .toBe(true);
    await page.goto(`${baseUrl()}/knowledge/new`);
    await expect
      .poll(
        () =>
          page.getByLabel('Topic').locator('option', { hasText: 'Kedging and warping' }).count(),
        {
          timeout: 15000,
        },
      )
      .toBe(1);
    await page.close();
  });
});
