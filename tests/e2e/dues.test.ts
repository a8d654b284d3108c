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

const MEMBER = 'maren@larkspit.example'; // seeded as paid through last fiscal year only
const TREASURER = 'treasurer@larkspit.example';

async function payWith(page: Page, card: string) {
  await page.getByLabel('Card number').fill(card);
  await page.getByLabel(/^Expiry/).fill('12 / 40');
  await page.getByLabel(/^CVC/).fill('123');
  await page.getByRole('button', { name: /^Pay / }).click();
}

describe('dues in Chromium', () => {
  it('a member with dues owing is declined once, then pays and sees the paid-through date', async () => {
    const page = await browser.newPage({ viewport: { width: 390, height: 900 } });
    await signIn(page, MEMBER);
    await page.goto(`${baseUrl()}/dues`);
    await expect
      .poll(() => page.getByTestId('paid-through').innerText(), { timeout: 15000 })
      .toMatch(/Paid through/);
    const before = await page.getByTestId('paid-through').innerText();
    await screenshot(page, 'dues-member-owing');
    await page.getByRole('button', { name: /Pay by card/ }).click();
    await page.waitForURL(/\/pay\/cs_/, { timeout: 15000 });

    await payWith(page, '4000 0000 0000 0002');
    await expect
      .poll(() => page.getByRole('alert').innerText(), { timeout: 10000 })
      .toMatch(/declined/i);
    await screenshot(page, 'dues-card-declined');

    await payWith(page, '4242 4242 4242 4242');
    await page.waitForURL(/\/dues\/paid\?session_id=/, { timeout: 15000 });
    await expect
      .poll(() => page.getByTestId('paid-through').innerText(), { timeout: 15000 })
      .toMatch(/^Paid through \d{4}-\d{2}-\d{2}$/);
    const after = await page.getByTestId('paid-through').innerText();
    expect(after).not.toBe(before);
    await screenshot(page, 'dues-paid');
    const receipt = await waitForMail(MEMBER, 'Receipt for your club dues');
    expect(receipt.text).toContain(after.replace('Paid through ', ''));
    await page.close();
  });

  it('the treasurer sees the payment in the roster and the summary', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 1000 } });
    await signIn(page, TREASURER);
    await page.goto(`${baseUrl()}/treasury`);
    await expect
      .poll(() => page.getByTestId('summary-collected').innerText(), { timeout: 15000 })
      .toMatch(/€/);
    await expect(page.getByRole('img', { name: /Collected vs expected/ }).count()).resolves.toBe(1);
    await expect(
      page.getByRole('heading', { name: 'Held for the treasurer' }).count(),
    ).resolves.toBe(1);
    const ledger = page.getByRole('table', { name: /Recent entries/ });
    await expect
      .poll(() => ledger.locator('tbody tr').first().innerText(), { timeout: 10000 })
      .toMatch(/Maren Tiller[\s\S]*Card/);
    await screenshot(page, 'treasury-desk');

    await page.getByRole('link', { name: /Member roster/ }).click();
    await page.waitForURL(/\/treasury\/roster/);
    const row = page.getByRole('row', { name: /Maren Tiller/ });
    await expect.poll(() => row.innerText(), { timeout: 10000 }).toMatch(/Current|Due/);
    await page.getByLabel('Status').selectOption('lapsed');
    await expect.poll(() => page.getByRole('row', { name: /Saoirse Gunwale/ }).count()).toBe(1);
    expect(await page.getByRole('row', { name: /Maren Tiller/ }).count()).toBe(0);
    await page.getByLabel('Status').selectOption('');
    await page.getByRole('button', { name: /Select everyone due or overdue/ }).click();
    await page.getByRole('button', { name: 'Preview reminders' }).click();
    await expect.poll(() => page.getByText(/Will receive/).count(), { timeout: 10000 }).toBe(1);
    await screenshot(page, 'treasury-roster');
    await page.close();
  });
});
