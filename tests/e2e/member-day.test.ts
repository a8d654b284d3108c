import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { audit, baseUrl, launch, screenshot, signIn } from './browser';
import { settle } from './demo-urls';
import { findUnreadable, visibleText } from './readable';

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser.close();
});

// Seeded for this path alone (apps/api/seeders): paid through last fiscal year, boat Saltcress with an
// everyday plan saved from its recommendation, two unread notices. No other test pays her dues.
const MEMBER = 'oriel@larkspit.example';
const BOAT = 'Saltcress';
const CLUB = 'Larkspit Sound Cruising Club';

/** Nothing sticks out to the right: the page never scrolls sideways. */
async function expectNoSideways(page: Page, label: string) {
  const overflow = await page.evaluate(
    () => document.documentElement.scrollWidth - document.documentElement.clientWidth,
  );
  expect(overflow, `${label} scrolls sideways by ${overflow} px`).toBeLessThanOrEqual(0);
}

/** Home: boat with the saved plan's headline figures, dues with the next due date, notices, gear that fits. */
async function home(page: Page, width: number, paid: boolean) {
  await page.goto(`${baseUrl()}/`);
  const boats = page.getByRole('region', { name: 'My boats' });
  await expect
    .poll(() => boats.getByRole('link', { name: 'Everyday, 30 kn' }).count(), { timeout: 15000 })
    .toBe(1);
  const boatsText = await boats.innerText();
  expect(boatsText).toContain(BOAT);
  expect(boatsText).toMatch(/Anchor: plow, \d+(\.\d)? (kg|lb)/);
  expect(boatsText).toMatch(/Chain: 5\/16 in grade 43, \d+(\.\d)? (m|ft)/);

  const dues = page.getByRole('region', { name: 'My dues' });
  await expect.poll(() => dues.getByTestId('next-due').count(), { timeout: 15000 }).toBe(1);
  const next = await dues.getByTestId('next-due').innerText();
  if (paid) {
    expect(next).toMatch(/^Next due on \d{1,2} [A-Z][a-z]{2} \d{4}\.$/);
    expect(await dues.getByRole('link', { name: /^Pay / }).count()).toBe(0);
  } else {
    expect(next).toMatch(/^Due from \d{1,2} [A-Z][a-z]{2} \d{4}\.$/);
    expect(await dues.getByRole('link', { name: /^Pay €\d+\.\d{2}$/ }).count()).toBe(1);
  }
  expect(await dues.getByText(/^(Current|Due|Overdue|Lapsed|In grace)/).count()).toBeGreaterThan(0);

  const notices = page.getByRole('region', { name: 'Notices' });
  await expect
    .poll(() => notices.innerText(), { timeout: 15000 })
    .toMatch(/\d+ unread notices?[\s\S]*spring lift-in list/);

  const gear = page.getByRole('region', { name: `Gear that fits ${BOAT}` });
  await expect
    .poll(() => gear.innerText(), { timeout: 15000 })
    .not.toMatch(/Looking through the exchange/);
  expect(findUnreadable(await visibleText(page), 2)).toEqual([]);
  await expectNoSideways(page, `home at ${width}`);
  await screenshot(page, `member-day-${width}-home${paid ? '-paid' : ''}`);
  await audit(page, `home at ${width} px${paid ? ' after paying' : ''}`);
}

/** Boat card → the boat's recommendation, then the calculators fed by one boat-and-conditions block. */
async function recommendationAndCalculators(page: Page, width: number) {
  await page
    .getByRole('region', { name: 'My boats' })
    .getByRole('link', { name: `See the recommendation for ${BOAT}` })
    .click();
  await page.waitForURL(/\/boats\/\d+$/, { timeout: 15000 });
  const everyday = page.getByRole('region', { name: 'Everyday: 30 kn' });
  await expect
    .poll(() => everyday.getByText('Design load', { exact: true }).count(), { timeout: 15000 })
    .toBe(1);
  expect(await everyday.innerText()).toMatch(/If chain and rope[\s\S]*nylon three-strand/);
  await expectNoSideways(page, `recommendation at ${width}`);
  await screenshot(page, `member-day-${width}-recommendation`);
  await audit(page, `recommendation at ${width} px`);

  await page.goto(`${baseUrl()}/calculators`);
  const block = page.getByRole('region', { name: 'Your boat and conditions' });
  await block.getByLabel('Start from one of your boats').selectOption({ label: BOAT });
  await block.getByLabel('Design wind').fill('45 kn');
  for (const card of ['Anchor suggestion', 'Weakest-link check']) {
    const region = page.getByRole('region', { name: card }).first();
    await expect
      .poll(() => region.getByText(/^Using the .+ at the top of the page\.$/).count(), {
        timeout: 5000,
      })
      .toBe(1);
  }
  const anchor = page.getByRole('region', { name: 'Anchor suggestion' });
  await expect
    .poll(() => anchor.getByLabel('Design wind').inputValue(), { timeout: 5000 })
    .toBe('45 kn');

  // Every figure of each weakest-link part is on screen, at 390 px too (cards below md).
  const parts = page.getByTestId('weakest-link-part');
  await expect.poll(() => parts.count(), { timeout: 5000 }).toBeGreaterThan(0);
  for (let i = 0; i < (await parts.count()); i += 1) {
    const part = parts.nth(i);
    await part.scrollIntoViewIfNeeded();
    for (const cell of await part.locator('td').all()) {
      const box = await cell.boundingBox();
      expect(box, 'a weakest-link figure is laid out').not.toBeNull();
      expect((box?.x ?? 0) + (box?.width ?? 0)).toBeLessThanOrEqual(width);
      expect(box?.x ?? -1).toBeGreaterThanOrEqual(0);
    }
    expect(await part.innerText()).toMatch(/\d\.\d{2} ×[\s\S]*\d\.\d{2} ×/);
  }
  await expectNoSideways(page, `calculators at ${width}`);
  await screenshot(page, `member-day-${width}-calculators`);
  await audit(page, `calculators at ${width} px`);
}

describe('a member’s day from the home page', () => {
  it.each([1024, 1280])(
    'at %i px: home → recommendation → calculators → dues, with the pay button',
    async (width) => {
      const page = await browser.newPage({ viewport: { width, height: 900 } });
      await signIn(page, MEMBER);
      await home(page, width, false);
      await recommendationAndCalculators(page, width);
      await page.goto(`${baseUrl()}/dues`);
      await expect
        .poll(() => page.getByRole('button', { name: /Pay by card/ }).count(), { timeout: 15000 })
        .toBe(1);
      await expectNoSideways(page, `dues at ${width}`);
      await screenshot(page, `member-day-${width}-dues`);
      await audit(page, `dues at ${width} px`);
      await page.close();
    },
  );

  it('at 390 px: the same path, then pays through the practice payment page and comes back paid', async () => {
    const width = 390;
    const page = await browser.newPage({ viewport: { width, height: 900 } });
    await signIn(page, MEMBER);
    await home(page, width, false);
    await recommendationAndCalculators(page, width);

    await page.goto(`${baseUrl()}/`);
    const pay = page.getByRole('region', { name: 'My dues' }).getByRole('link', { name: /^Pay / });
    await pay.waitFor({ timeout: 15000 });
    const amount = (await pay.innerText()).replace(/^Pay /, '');
    await pay.click();
    await page.waitForURL(/\/dues$/);
    await settle(page);
    await screenshot(page, `member-day-${width}-dues`);
    await audit(page, `dues at ${width} px`);
    await page.getByRole('button', { name: /Pay by card/ }).click();
    await page.waitForURL(/\/pay\/cs_/, { timeout: 15000 });

    // The practice page: our title, the club, the amount as the club writes it.
    expect(await page.title()).toMatch(/^Practice payment — no money moves/);
    expect(await page.getByText(CLUB, { exact: true }).count()).toBe(1);
    expect(await page.getByRole('heading', { level: 1 }).innerText()).toBe(
      `Practice payment of ${amount}`,
    );
    expect(findUnreadable(await visibleText(page), 2)).toEqual([]);
    await expectNoSideways(page, 'practice payment page');
    await screenshot(page, `member-day-${width}-practice-payment`);
    await audit(page, `practice payment page at ${width} px`);

    // One press on the card that goes through.
    await page.getByRole('button', { name: /^Use the practice card that goes through/ }).click();
    await page.waitForURL(/\/dues\/paid\?session_id=/, { timeout: 15000 });
    await expect
      .poll(() => page.getByTestId('paid-through').innerText(), { timeout: 15000 })
      .toMatch(/^Paid through \d{1,2} [A-Z][a-z]{2} \d{4}$/);
    await screenshot(page, `member-day-${width}-paid`);
    await audit(page, `paid at ${width} px`);

    await home(page, width, true);
    await page.close();
  });
});
