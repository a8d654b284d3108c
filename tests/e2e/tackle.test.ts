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

const chainPath = (page: Page) =>
  page.getByTestId('catenary-drawing').first().locator('[data-part="chain"]').getAttribute('d');

const overflowX = (page: Page) =>
  page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);

describe('ground-tackle calculators for a visitor', () => {
  it('redraws the rode as a load is typed, at desktop and phone widths', async () => {
    for (const [name, width] of [
      ['calculators', 1280],
      ['calculators-390', 390],
    ] as const) {
      const page = await browser.newPage({ viewport: { width, height: 900 } });
      await page.goto(`${baseUrl()}/calculators`);
      await expect
        .poll(() => page.getByRole('heading', { name: 'Ground-tackle calculators' }).count(), {
          timeout: 15000,
        })
        .toBe(1);
      const before = await chainPath(page);
      expect(before).toMatch(/^M/);
      await audit(page, name);
      const load = page.getByLabel('Horizontal load');
      await load.fill('9 kN');
      await expect.poll(() => chainPath(page), { timeout: 5000 }).not.toBe(before);
      await load.fill('2000 lbf');
      await expect.poll(() => page.getByText(/Reads as .*8\.90 kN/).count()).toBeGreaterThan(0);

      // A value the engineering rejects shows its message by the field, and the page survives.
      const depth = page.getByLabel('Depth at the anchor');
      await depth.fill('-4 m');
      await expect
        .poll(() => page.getByText(/depthM must be at least 0/).count())
        .toBeGreaterThan(0);
      await audit(page, `${name} with a field error`);
      await depth.fill('20 ft');

      // The design load calculator answers too.
      await page.getByLabel('Length overall (LOA)').first().fill("34'");
      await expect
        .poll(() =>
          page
            .getByRole('definition')
            .filter({ hasText: /kN|lbf/ })
            .count(),
        )
        .toBeGreaterThan(0);
      expect(await overflowX(page)).toBeLessThanOrEqual(0);
      await screenshot(page, name);
      await page.close();
    }
  });
});

describe('a member sizes, checks, saves and prints a plan', () => {
  it('creates a boat, sees 30 and 60 kn recommendations, adds a shackle and prints the card', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(page, 'maren@larkspit.example');
    await page.goto(`${baseUrl()}/boats`);
    await page.getByLabel(/^Boat name/).waitFor();
    await audit(page, 'my boats');
    const boatName = `Tern Wake ${Date.now()}`;
    await page.getByLabel(/^Boat name/).fill(boatName);
    await page.getByLabel('Hull').selectOption('sail');
    await page.getByLabel(/^Length overall/).fill("34'");
    await page.getByLabel(/^Beam/).fill('11 ft');
    await page.getByLabel(/^Displacement/).fill('6500 kg');
    await page.getByLabel(/^Bow-roller height/).fill('1.2 m');
    await page.getByRole('button', { name: 'Add boat' }).click();
    await page.waitForURL(/\/boats\/\d+$/, { timeout: 15000 });

    const everyday = page.getByRole('region', { name: 'Everyday: 30 kn' });
    const storm = page.getByRole('region', { name: 'Storm: 60 kn' });
    await expect
      .poll(() => everyday.getByText('Design load', { exact: true }).count(), { timeout: 15000 })
      .toBe(1);
    for (const column of [everyday, storm]) {
      for (const part of ['Anchor', 'Chain', 'Snubber', 'Shackle', 'Scope']) {
        expect(await column.getByText(part, { exact: true }).count()).toBe(1);
      }
      expect(await column.getByText(/the load it is sized for/).count()).toBe(1);
      // The reasoning names the table row (entered by beam for this beamy boat) and the holding curve.
      await column.getByText('How we worked it out').click();
      expect(await column.getByText(/entered by beam, which gives a larger load/).count()).toBe(1);
      expect(await column.getByText(/UFC 4-159-03 eq\. 26/).count()).toBe(1);
    }
    // Everyday: all chain, with the rope size for a chain-and-rope rode; storm: chain plus nylon.
    expect(await everyday.getByText('If chain and rope', { exact: true }).count()).toBe(1);
    expect(await storm.getByText('Nylon rode', { exact: true }).count()).toBe(1);
    expect(await storm.getByText(/rig two, or a bridle/).count()).toBe(1);
    expect(await page.getByText(/qualified rigger or marine surveyor/).count()).toBeGreaterThan(0);
    await screenshot(page, 'boat-recommendation');
    await audit(page, 'boat recommendation');

    await storm.getByRole('button', { name: 'Save as plan' }).click();
    await page.waitForURL(/\/tackle-plans\/\d+$/, { timeout: 15000 });
    await expect
      .poll(() => page.getByRole('article', { name: 'Plan card' }).count(), { timeout: 15000 })
      .toBe(1);

    // Weakest-link check of the actual gear: add the anchor shackle.
    await page.getByLabel('Fitting', { exact: true }).selectOption('shackle');
    // The saved storm plan already carries the recommended anchor shackle and the chain-to-rope splice.
    const card = page.getByRole('article', { name: 'Plan card' });
    expect(await card.getByText(/anchor shackle/).count()).toBe(1);
    expect(await card.getByText(/Rope rode/).count()).toBe(1);
    expect(await page.getByRole('region', { name: /Recommendation at 60 kn/ }).count()).toBe(1);
    await page.getByLabel('Fitting name').fill('bow shackle');
    await page.getByLabel('Shackle size').selectOption(String(1 / 2));
    await page.getByRole('button', { name: 'Add fitting' }).click();
    const table = page.getByRole('table');
    await expect
      .poll(() => table.getByRole('row', { name: /bow shackle/ }).count(), { timeout: 15000 })
      .toBe(1);
    expect(await table.locator('tr[aria-current="true"]').count()).toBe(1);
    expect(await table.getByText('Weakest link', { exact: true }).count()).toBe(1);
    await audit(page, 'plan with a fitting');
    // The drawing loads after the rest of the page.
    await expect.poll(() => page.getByTestId('catenary-drawing').count()).toBe(1);

    // Print: the button calls window.print, and print media shows only the card.
    await page.evaluate(() => {
      (window as unknown as { printed: number }).printed = 0;
      window.print = () => {
        (window as unknown as { printed: number }).printed += 1;
      };
    });
    await page.getByRole('button', { name: 'Print card' }).click();
    expect(await page.evaluate(() => (window as unknown as { printed: number }).printed)).toBe(1);
    await page.emulateMedia({ media: 'print' });
    expect(await page.locator('#root > div > header').isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: 'Print card' }).isVisible()).toBe(false);
    expect(await page.getByRole('article', { name: 'Plan card' }).isVisible()).toBe(true);
    expect(await page.getByRole('article', { name: 'Plan card' }).getByText(boatName).count()).toBe(
      1,
    );
    await screenshot(page, 'plan-card');

    // Deleting the plan asks first, then returns to the boat, whose saved plans no longer list it.
    await page.emulateMedia({ media: 'screen' });
    const planName = (await page.getByRole('heading', { level: 1 }).textContent()) ?? '';
    await page.getByRole('button', { name: 'Delete this plan' }).click();
    const dialog = page.getByRole('dialog', { name: `Delete ${planName}?` });
    await dialog.getByRole('button', { name: 'Delete plan' }).click();
    await page.waitForURL(/\/boats\/\d+$/, { timeout: 15000 });
    // The boat had only this plan: the list loads to its empty state, with no link to the deleted plan.
    await expect
      .poll(() => page.getByText('No saved plans yet.').count(), { timeout: 15000 })
      .toBe(1);
    expect(await page.getByRole('link', { name: planName, exact: true }).count()).toBe(0);

    // The calculators start from the saved boat: pick it once at the top and every card follows.
    await page.emulateMedia({ media: 'screen' });
    await page.goto(`${baseUrl()}/calculators`);
    const block = page.getByRole('region', { name: 'Your boat and conditions' });
    await block.getByLabel('Start from one of your boats').selectOption({ label: boatName });
    await block.getByLabel('Design wind').fill('60 kn');
    const anchor = page.getByRole('region', { name: 'Anchor suggestion' });
    await expect
      .poll(() => anchor.getByLabel('Length overall (LOA)').inputValue(), { timeout: 5000 })
      .toMatch(/^(34 ft|10\.36? m)$/);
    expect(await anchor.getByLabel('Design wind').inputValue()).toMatch(/^60 kn$/);
    expect(
      await anchor.getByText('Using the boat and conditions at the top of the page.').count(),
    ).toBe(1);
    await audit(page, 'calculators from a saved boat');
    await screenshot(page, 'calculators-from-boat');
    await page.close();
  });
});
