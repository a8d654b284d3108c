import type { Browser, Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { audit, baseUrl, launch, screenshot, signIn, waitForMail } from './browser';

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
  await page.getByLabel(/^Security code/).fill('123');
  await page.getByRole('button', { name: /^Pay / }).click();
}

describe('dues in Chromium', () => {
  it('a member with dues owing is declined once, then pays and sees the paid-through date', async () => {
    const page = await browser.newPage({ viewport: { width: 390, height: 900 } });
    await signIn(page, MEMBER);
    await page.goto(`${baseUrl()}/dues`);
    await expect
      .poll(() => page.getByTestId('paid-through').innerText(), { timeout: 15000 })
      .toMatch(/\d{4}$/);
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
      .toMatch(/^Paid through (?!\d{4}-)\S.*\d{4}$/);
    expect(await page.getByTestId('paid-through').innerText()).not.toContain(before);
    const after = await page.getByTestId('paid-through').locator('time').getAttribute('datetime');
    await screenshot(page, 'dues-paid');
    const receipt = await waitForMail(MEMBER, 'Receipt for your club dues');
    expect(after).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    // The receipt gives the date as people read it, the one the page shows, never the ISO form.
    const shown = await page.getByTestId('paid-through').locator('time').innerText();
    expect(receipt.text).toContain(shown);
    expect(receipt.text).not.toContain(after ?? 'no date');
    // The label is said once ("Paid through 31 Mar 2027"), never "Paid through: Paid through …".
    expect(await page.getByText(/paid through/i).count()).toBe(1);
    expect(
      (await page.getByTestId('paid-through').innerText()).match(/paid through/gi),
    ).toHaveLength(1);
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
  it('the treasurer adds a plan that a member who has not paid yet can join, and previews the calendar', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 1000 } });
    await signIn(page, TREASURER);
    await page.goto(`${baseUrl()}/treasury`);
    await page.getByRole('link', { name: 'Membership plans and fiscal calendar' }).click();
    await page.waitForURL(/\/treasury\/membership-plans/);
    const plans = page.getByRole('list', { name: 'Membership plans' });
    await expect.poll(() => plans.getByRole('listitem').count(), { timeout: 15000 }).toBe(3);

    await page.getByRole('button', { name: 'Add a plan' }).click();
    const form = page.getByRole('form', { name: 'New plan' });
    await form.getByLabel(/^Plan name/).fill('Harbour crew');
    await form.getByLabel(/^Code/).fill('harbour-crew');
    await form.getByLabel('Who it is for').selectOption('associate');
    await form.getByLabel(/^Annual amount/).fill('-60');
    await form.getByLabel('By remaining days').check();
    await form.getByRole('button', { name: 'Create plan' }).click();
    await expect.poll(() => form.getByText(/no minus sign/).count(), { timeout: 5000 }).toBe(1);
    await form.getByLabel(/^Annual amount/).fill('60.00');
    await form.getByRole('button', { name: 'Create plan' }).click();
    await expect
      .poll(() => page.getByRole('status').filter({ hasText: 'Membership plan created' }).count(), {
        timeout: 10000,
      })
      .toBe(1);
    const card = plans.getByRole('listitem', { name: /Harbour crew/ });
    await expect.poll(() => card.innerText()).toMatch(/€60\.00[\s\S]*By remaining days/);

    // A proposed start on 15 July is previewed, not saved.
    const calendar = page.getByRole('form', { name: 'Dues calendar' });
    await calendar.getByLabel('Fiscal year starts in').selectOption('7');
    await calendar.getByLabel(/^on day/).fill('15');
    await expect
      .poll(() => page.getByTestId('fy-start').locator('time').getAttribute('datetime'), {
        timeout: 10000,
      })
      .toMatch(/^\d{4}-07-15$/);
    expect(await page.getByTestId('fy-start').innerText()).toMatch(/^15 Jul \d{4}$/);
    await expect(page.getByRole('heading', { name: /not saved yet/ }).count()).resolves.toBe(1);
    expect(await page.getByRole('row', { name: /Harbour crew/ }).count()).toBe(1);
    await screenshot(page, 'treasury-plans');
    await audit(page, 'treasury plans');
    await page.setViewportSize({ width: 390, height: 900 });
    const overflow = await page.evaluate(
      () => document.documentElement.scrollWidth - document.documentElement.clientWidth,
    );
    expect(overflow).toBeLessThanOrEqual(0);
    await screenshot(page, 'treasury-plans-phone');
    await audit(page, 'treasury plans on a phone');

    const member = await browser.newPage({ viewport: { width: 390, height: 900 } });
    await signIn(member, 'bram@larkspit.example'); // joined 45 days ago, never paid
    await member.goto(`${baseUrl()}/dues`);
    const offer = member.getByRole('region', { name: 'Harbour crew dues' });
    await expect.poll(() => offer.count(), { timeout: 15000 }).toBe(1);
    await expect
      .poll(() => offer.getByRole('button', { name: /Join as Harbour crew · €/ }).count())
      .toBe(1);
    await member.close();
    await page.close();
  });

  it('a seeded card payment the provider has no record of is not refunded, and the dialog says why', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 1000 } });
    await signIn(page, TREASURER);
    await page.goto(`${baseUrl()}/treasury`);
    const refund = page.getByRole('button', { name: /^Refund Idris.*€180\.00$/ });
    await expect.poll(() => refund.count(), { timeout: 15000 }).toBe(1);
    await refund.click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel(/^Amount to refund/).fill('20');
    await dialog.getByLabel(/^Reason/).fill('Part refund for a missed month');
    await dialog.getByRole('button', { name: 'Refund' }).click();
    await expect
      .poll(() => dialog.getByRole('alert').innerText(), { timeout: 10000 })
      .toMatch(/no record of this card payment/);
    await screenshot(page, 'treasury-refund-refused');
    await page.keyboard.press('Escape');
    await expect.poll(() => page.getByRole('dialog').count()).toBe(0);
    await page.close();
  });
});

/** True when the element's box lies inside the page's viewport width (no sideways scrolling to reach it). */
async function insideViewport(page: Page, el: Locator) {
  const box = await el.boundingBox();
  const width = page.viewportSize()?.width ?? 0;
  return !!box && box.x >= 0 && box.x + box.width <= width + 0.5;
}

// Runs after the tests above (they look at the seeded held payment before it is returned here).
describe('the treasurer’s day, from the home page', () => {
  for (const width of [1280, 1024, 390]) {
    it(`at ${width} px: queue → held payment → tiles → reminders${width === 390 ? ' → money returned' : ''}`, async () => {
      const page = await browser.newPage({ viewport: { width, height: 900 } });
      await signIn(page, TREASURER);
      await page.goto(`${baseUrl()}/`);
      const queue = page.getByRole('region', { name: "Treasurer's desk" });
      const heldLine = queue.getByRole('listitem').filter({ hasText: /held for a check/ });
      await expect.poll(() => heldLine.innerText(), { timeout: 15000 }).toMatch(/^1 payment held/);
      await expect
        .poll(() =>
          queue
            .getByRole('listitem')
            .filter({ hasText: /overdue/ })
            .innerText(),
        )
        .toMatch(/^\d+ members? overdue/);
      await audit(page, `home treasurer ${width}`);
      await screenshot(page, `treasurer-day-home-${width}`);

      await heldLine.getByRole('link').click();
      await page.waitForURL(/\/treasury$/);
      const heldSection = page.locator('section', {
        has: page.getByRole('heading', { name: 'Held for the treasurer' }),
      });
      const first =
        width < 768
          ? heldSection.getByTestId('payment-cards').getByRole('listitem').first()
          : heldSection.getByRole('table').locator('tbody tr').first();
      await expect.poll(() => first.innerText(), { timeout: 15000 }).toMatch(/Bram Cleatson/);
      // The reason is in money, never in minor units.
      expect(await first.innerText()).toMatch(/€\d+\.\d{2} paid, €\d+\.\d{2} expected/);
      expect(await first.innerText()).not.toMatch(/\d{4}-\d{2}-\d{2}/);
      const status = width < 768 ? first.getByTestId('payment-status') : first.locator('td').nth(3);
      expect(await status.innerText()).toBe('Held');
      const refund = first.getByRole('button', { name: /^Refund Bram/ });
      for (const el of [status, first.getByRole('button', { name: 'Credit' }), refund])
        expect(await insideViewport(page, el)).toBe(true);

      // The tiles say what is in them, and the reconciliation line ends on the expected figure.
      const expected = await page.getByTestId('summary-expected').innerText();
      expect(await page.getByTestId('summary-collected-note').innerText()).toMatch(
        /for this year[\s\S]*held payments are not counted/,
      );
      expect(await page.getByTestId('summary-outstanding-note').innerText()).toMatch(/late fee/);
      expect(await page.getByTestId('summary-reconcile').innerText()).toContain(
        `= ${expected} expected`,
      );
      await audit(page, `treasury desk ${width}`);
      await screenshot(page, `treasurer-day-desk-${width}`);

      if (width === 390) {
        await refund.click();
        const dialog = page.getByRole('dialog');
        await dialog.getByLabel(/^Reason/).fill('Paid the full year instead of the prorated join');
        await dialog.getByRole('button', { name: 'Refund' }).click();
        await expect
          .poll(() => dialog.getByRole('alert').innerText(), { timeout: 10000 })
          .toMatch(/Nothing was refunded/);
        await dialog.getByRole('button', { name: 'Record money returned' }).click();
        await dialog.getByLabel('Returned by').selectOption('transfer');
        await dialog.getByLabel(/^Note/).fill('Sent back by bank transfer, reference RW-RET-7');
        await audit(page, 'record money returned 390');
        await screenshot(page, 'treasurer-day-returned-dialog-390');
        await dialog.getByRole('button', { name: /^Record €\d+\.\d{2} returned$/ }).click();
        await expect.poll(() => page.getByRole('dialog').count(), { timeout: 10000 }).toBe(0);
        await expect
          .poll(() => page.getByRole('heading', { name: 'Held for the treasurer' }).count(), {
            timeout: 10000,
          })
          .toBe(0);
        await expect
          .poll(() => page.getByTestId('summary-held-for-you').innerText(), { timeout: 10000 })
          .toBe('0');
        const ledgerCard = page
          .getByTestId('payment-cards')
          .getByRole('listitem')
          .filter({ hasText: /Bram Cleatson/ })
          .first();
        await expect.poll(() => ledgerCard.innerText()).toMatch(/returned by transfer/);
        const mail = await waitForMail('bram@larkspit.example', 'returned to you');
        expect(mail.text).toMatch(/€\d+\.\d{2} to you by bank transfer/);
        await screenshot(page, 'treasurer-day-returned-390');
      }

      await page.getByRole('link', { name: /Member roster/ }).click();
      await page.waitForURL(/\/treasury\/roster/);
      const summary = (await (await page.request.get(`${baseUrl()}/api/treasury/summary`)).json())
        .data as { counts: { due: number; overdue: number } };
      const behind = summary.counts.due + summary.counts.overdue;
      // The count is there before Preview is pressed.
      const send = page.getByRole('button', {
        name: /^Send \d+ reminders?$|^No reminders to send$/,
      });
      await expect
        .poll(() => send.innerText(), { timeout: 15000 })
        .toBe(
          behind === 0
            ? 'No reminders to send'
            : `Send ${behind} reminder${behind === 1 ? '' : 's'}`,
        );
      if (width < 768) {
        const card = page
          .getByRole('list', { name: 'Members and their dues' })
          .getByRole('listitem')
          .first();
        expect(await insideViewport(page, card.getByTestId('roster-status'))).toBe(true);
        expect(await insideViewport(page, card.getByRole('checkbox'))).toBe(true);
      }
      await audit(page, `roster ${width}`);
      await screenshot(page, `treasurer-day-roster-${width}`);
      await page.close();
    });
  }
});
