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

// Demo data: Idris is paid up (may list); Maren's boat "Marram" (9.1 m sloop) has a 5/16 in G43 gypsy, but
// she may browse whatever her dues (the dues e2e may have paid them by now); Bram has never paid, so under the
// demo club's paid-up policy he may browse and not write; Oona is paid up.
const SELLER = 'idris@larkspit.example';
const BROWSER = 'maren@larkspit.example';
const UNPAID = 'bram@larkspit.example';
const BUYER = 'moderator@larkspit.example';
const BUYER_NAME = 'Oona Brightwater';
const TITLE = 'Grade 43 chain 5/16 inch, 40 m, spare from a refit';

const photo = (colour: string) =>
  sharp({ create: { width: 800, height: 600, channels: 3, background: colour } })
    .jpeg()
    .toBuffer();

async function newPage(width = 1280): Promise<Page> {
  return browser.newPage({ viewport: { width, height: 1000 } });
}

/** Screenshots of the current screen at a phone, a small laptop and a desktop width, back at `width` after. */
async function screenshotWidths(page: Page, name: string, width: number) {
  for (const w of [390, 1024, 1280]) {
    await page.setViewportSize({ width: w, height: 1000 });
    await screenshot(page, `${name}-${w}`);
  }
  await page.setViewportSize({ width, height: 1000 });
}

describe('gear exchange in Chromium', () => {
  let listingUrl = '';

  it('a paid-up seller lists chain with two photos on the new-listing form and publishes it in one step', async () => {
    const page = await newPage(390);
    await signIn(page, SELLER);
    // The seller starts from the home page: their side of the exchange, with the way to list more.
    await page.goto(`${baseUrl()}/`);
    const mine = page.getByRole('region', { name: 'Your gear on the exchange' });
    await mine.getByRole('link', { name: 'List gear you no longer need' }).click();
    await page.getByRole('heading', { level: 1 }).waitFor();
    await page.getByLabel('Category').selectOption('chain');
    await audit(page, 'new chain listing form');
    await page.getByLabel('Title').fill(TITLE);
    await page.getByLabel('Description').fill('Galvanised high-test chain, end marked every 10 m.');
    await page.getByLabel('Chain grade').selectOption('G43');
    await page.getByLabel('Trade size (in)').fill('5/16');
    await page.getByLabel('Length (m)').fill('40');
    await page.getByLabel('Galvanising').selectOption('good');
    await page.getByLabel('Price').fill('150');
    await page.getByLabel('Harbour').selectOption({ label: 'Larkspit Harbour' });
    // Photos are picked on the same form: no draft to save first.
    await page.locator('input[type=file][name=photos]').setInputFiles([
      { name: 'first.jpg', mimeType: 'image/jpeg', buffer: await photo('#2a6f97') },
      { name: 'second.jpg', mimeType: 'image/jpeg', buffer: await photo('#a44a3f') },
    ]);
    await expect
      .poll(() => page.getByRole('list', { name: 'Photos to upload' }).getByRole('img').count())
      .toBe(2);
    await audit(page, 'new listing form with photos');
    await screenshotWidths(page, 'exchange-new-with-photos', 390);
    await page.getByRole('button', { name: 'Publish', exact: true }).click();
    await page.waitForURL(/\/exchange\/listings\/\d+$/, { timeout: 20000 });
    listingUrl = page.url();
    await page.getByRole('heading', { name: TITLE }).waitFor({ timeout: 15000 });
    await expect.poll(() => page.getByText(/Shows in search until/).count()).toBe(1);
    await expect.poll(() => page.getByRole('button', { name: /^Show photo/ }).count()).toBe(2);
    // The trade size reads as a fraction, each spec once.
    await expect.poll(() => page.getByText('5/16 in', { exact: true }).count()).toBe(1);
    await page.close();
  });

  it('a member finds it with a misspelt query and filters “fits my boat”; a member who has never paid is asked to pay before writing', async () => {
    const page = await newPage();
    await signIn(page, BROWSER);
    await page.goto(`${baseUrl()}/exchange`);
    // Filters apply as they change: no Search button press.
    await page.getByLabel('Boat').selectOption({ label: 'Marram' });
    await page.getByLabel('Only what fits').check();
    await page.getByLabel('Search gear').fill('galvanised chian');
    const link = page.getByRole('link', { name: TITLE });
    await link.waitFor({ timeout: 15000 });
    await expect.poll(() => page.url()).toMatch(/q=galvanised\+chian/);
    expect(page.url()).toMatch(/fitsOnly=true/);
    await expect.poll(() => page.getByText('Fits your boat').count()).toBeGreaterThan(0);
    await expect.poll(() => page.getByText(/Checked against Marram/).count()).toBe(1);
    // Sizes, grades and lengths as people write them; a length is a minimum (this chain is 40 m).
    await page.getByLabel('Search gear').fill('5/16 g43 chain 30m');
    await expect.poll(() => page.url()).toMatch(/q=5%2F16\+g43\+chain\+30m/);
    await link.waitFor({ timeout: 15000 });
    await page.getByLabel('Search gear').fill('5/16 g43 chain 50 m');
    await expect.poll(() => link.count(), { timeout: 15000 }).toBe(0);
    await page.getByLabel('Search gear').fill('galvanised chian');
    await page.getByLabel('Smallest size').fill('5/16');
    await expect.poll(() => page.url()).toMatch(/sizeMinMm=7\.9375/);
    await link.waitFor({ timeout: 15000 });
    await screenshot(page, 'exchange-search');
    await audit(page, 'exchange search with fits-my-boat');
    // On a phone the filters fold behind a button that counts them (boat, only-what-fits, size).
    await page.setViewportSize({ width: 390, height: 844 });
    const toggle = page.getByRole('button', { name: 'Filters, 3 in use' });
    await toggle.waitFor();
    expect(await page.getByLabel('Category').isVisible()).toBe(false);
    const searchBox = await page.getByRole('search').boundingBox();
    expect(searchBox?.height ?? 1000).toBeLessThan(844);
    await screenshot(page, 'exchange-search-390-folded');
    await toggle.click();
    await page.getByLabel('Category').waitFor({ state: 'visible' });
    await audit(page, 'exchange filters opened on a phone');
    await page.setViewportSize({ width: 1280, height: 1000 });

    await link.click();
    await page.getByRole('heading', { name: TITLE }).waitFor({ timeout: 15000 });
    await expect.poll(() => page.getByText('Paid-up member').count()).toBe(1);
    await expect.poll(() => page.getByText('Fits your boat').count()).toBe(1);
    await screenshot(page, 'exchange-listing');
    await audit(page, 'listing page');
    await page.close();

    // Bram has never paid (the dues e2e only looks at his page), so the gate holds whatever order the files run in.
    const unpaid = await newPage();
    await signIn(unpaid, UNPAID);
    await unpaid.goto(listingUrl);
    await unpaid.getByRole('heading', { name: TITLE }).waitFor({ timeout: 15000 });
    await unpaid.getByLabel('Your message').fill('Is this still for sale?');
    await unpaid.getByRole('button', { name: 'Send message' }).click();
    await expect
      .poll(
        () =>
          unpaid
            .getByRole('alert')
            .filter({ hasText: /paid-up membership/ })
            .count(),
        {
          timeout: 15000,
        },
      )
      .toBe(1);
    expect(unpaid.url()).not.toMatch(/\/messages\//);
    await screenshot(unpaid, 'exchange-paid-up-needed');
    await unpaid.close();
  });

  it('a paid-up member writes to the seller from the listing page', async () => {
    const page = await newPage();
    await signIn(page, BUYER);
    await page.goto(listingUrl);
    await page.getByRole('heading', { name: TITLE }).waitFor({ timeout: 15000 });
    await page
      .getByLabel('Your message')
      .fill('Is this still for sale? I could collect on Saturday.');
    await page.getByRole('button', { name: 'Send message' }).click();
    await page.waitForURL(/\/messages\/\d+$/, { timeout: 15000 });
    await expect.poll(() => page.getByText(/collect on Saturday/).count()).toBe(1);
    await audit(page, 'message thread');
    await page.close();
  });

  it('the seller gets the message by e-mail, confirms who bought it, and the buyer sees the notice', async () => {
    const mail = await waitForMail(SELLER, 'New message about');
    expect(mail.text).toContain('collect on Saturday');
    const page = await newPage(390);
    await signIn(page, SELLER);
    await page.goto(listingUrl);
    await page.getByRole('button', { name: 'Close as sold…' }).click();
    const dialog = page.getByRole('dialog', { name: /sold\?$/ });
    await dialog.waitFor();
    await dialog.getByLabel(BUYER_NAME).check();
    await audit(page, 'mark sold dialog');
    await screenshotWidths(page, 'exchange-mark-sold-dialog', 390);
    await dialog.getByRole('button', { name: `Went to ${BUYER_NAME}` }).click();
    await page.getByRole('button', { name: 'Relist for 60 days' }).waitFor({ timeout: 15000 });
    await expect
      .poll(() => page.getByText(new RegExp(`Marked sold to ${BUYER_NAME}`)).count())
      .toBe(1);
    const sold = await waitForMail(BUYER, 'Sold to you');
    expect(sold.subject).toContain(TITLE);
    await page.goto(`${baseUrl()}/messages`);
    await expect
      .poll(() => page.getByText(`Sold to ${BUYER_NAME}`).count(), { timeout: 15000 })
      .toBe(1);
    await audit(page, 'inbox');
    await page.close();

    const buyer = await newPage(1280);
    await signIn(buyer, BUYER);
    await buyer.goto(`${baseUrl()}/notices`);
    const notice = buyer.getByRole('link', { name: new RegExp(`as sold to you`) }).first();
    await notice.waitFor({ timeout: 15000 });
    await audit(buyer, 'buyer notices with the sale');
    await screenshotWidths(buyer, 'exchange-buyer-notice', 1280);
    await notice.click();
    await buyer.getByRole('heading', { name: TITLE }).waitFor({ timeout: 15000 });
    await expect.poll(() => buyer.getByText('Sold to you', { exact: true }).count()).toBe(1);
    await audit(buyer, 'listing sold to the buyer');
    await screenshotWidths(buyer, 'exchange-sold-to-you', 1280);
    await buyer.close();
  });
});
