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

// Demo accounts (apps/api/seeders/demo.ts): Maren's 9.1 m sloop Marram and Bram's 7.3 m sloop Greywake, both in
// Larkspit Harbour.
const MODERATOR = 'moderator@larkspit.example';
const MAREN = 'maren@larkspit.example';
const BRAM = 'bram@larkspit.example';
const WATCH = 'Gale Tessary';

// The flagged plan carries a 3/16 in shackle (1/3 short ton WLL in the shackle table): at a 70 kn gust on a 9 m
// boat it is loaded several times past its WLL whatever the exact load model. The passing plan has 5/8 in G70
// chain and a 1 in shackle on a 7 m boat: several times inside every WLL. Wide margins both ways.
const SMALL_SHACKLE = {
  name: 'Gale plan, small shackle',
  components: {
    chain: { grade: 'G43', tradeSizeIn: 0.375, lengthM: 60 },
    snubber: { material: 'nylon', diameterMm: 16, lengthM: 8 },
    connectors: [{ label: 'anchor shackle', kind: 'shackle', nominalIn: 0.1875 }],
  },
};
const HEAVY_GEAR = {
  name: 'Gale plan, heavy gear',
  components: {
    chain: { grade: 'G70', tradeSizeIn: 0.625, lengthM: 70 },
    snubber: { material: 'nylon', diameterMm: 18, lengthM: 10 },
    connectors: [{ label: 'anchor shackle', kind: 'shackle', nominalIn: 1 }],
  },
};

/** Saves a tackle plan for the signed-in member's boat through the API (with the session's CSRF token). */
async function savePlan(page: Page, boatName: string, plan: typeof SMALL_SHACKLE) {
  const me = await page.request.get(`${baseUrl()}/api/auth/me`);
  const token = ((await me.json()) as { data: { csrfToken: string } }).data.csrfToken;
  const boats = (
    (await (await page.request.get(`${baseUrl()}/api/boats`)).json()) as {
      data: Array<{ id: number; name: string }>;
    }
  ).data;
  const boat = boats.find((b) => b.name === boatName);
  expect(boat, `${boatName} is seeded`).toBeDefined();
  const res = await page.request.post(`${baseUrl()}/api/tackle-plans`, {
    headers: { 'X-CSRF-Token': token },
    data: {
      boatId: boat?.id,
      name: plan.name,
      condition: 'storm',
      windKn: 50,
      depthM: 5,
      tideM: 1,
      components: plan.components,
    },
  });
  expect(res.status()).toBe(201);
  return boat?.id ?? 0;
}

/** A member fills in one boat's readiness through the form and returns the boat page. */
async function fillIn(page: Page, watchUrl: string, boatName: string, planName: string) {
  await page.goto(watchUrl);
  await page.getByRole('link', { name: boatName, exact: true }).click();
  await page.getByRole('heading', { level: 1, name: `${boatName}: ${WATCH}` }).waitFor();
  await page.getByLabel('Where the boat will be').selectOption({ label: 'On its own anchor' });
  await page.getByLabel('Tackle plan').selectOption({ label: `${planName} (50 kn)` });
  await page.getByLabel('Depth where the boat will lie (m)').fill('6');
  const boxes = page.getByRole('group', { name: 'Checklist' }).getByRole('checkbox');
  for (let i = 0; i < (await boxes.count()); i += 1) await boxes.nth(i).check();
  await page.getByRole('button', { name: 'Save readiness' }).click();
  await page.getByText('Saved. The board shows it now.').waitFor();
  await page.getByRole('heading', { name: `${planName} at the forecast gust of 70 kn` }).waitFor();
}

describe('storm watch in Chromium', () => {
  it('a moderator opens a watch, two members fill in their boats, a buddy is named, the board prints', async () => {
    // 1. The moderator opens the watch at 55 kn gusting 70 for Larkspit Harbour.
    const mod = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(mod, MODERATOR);
    await mod.goto(`${baseUrl()}/storm`);
    await mod.getByRole('link', { name: 'Open a storm watch' }).click();
    await mod.getByRole('heading', { level: 1, name: 'Open a storm watch' }).waitFor();
    await audit(mod, 'storm watch form (moderator, 1280 px)');
    await mod.getByLabel(/^Storm or watch name/).fill(WATCH);
    await mod.getByLabel(/^Peak sustained wind/).fill('55');
    await mod.getByLabel(/^Gusts/).fill('40');
    await mod.getByLabel(/^Storm surge/).fill('0.5');
    await mod.getByLabel(/^Expected arrival/).fill('2026-12-20T06:00');
    await mod.getByLabel(/^Expected end/).fill('2026-12-21T18:00');
    await mod.getByLabel('Larkspit Harbour').check();
    await mod.getByLabel('Note to members').fill('Double your snubbers; dinghies ashore.');
    await mod.getByRole('button', { name: 'Open the watch and notify members' }).click();
    // Gusts below the sustained wind are refused on the field, and nothing is lost.
    await mod.getByText('Gusts cannot be lower than the sustained wind').waitFor();
    await mod.getByLabel(/^Gusts/).fill('70');
    await mod.getByRole('button', { name: 'Open the watch and notify members' }).click();
    await mod.waitForURL(/\/storm\/\d+$/, { timeout: 15000 });
    await mod.getByRole('heading', { level: 1, name: WATCH }).waitFor();
    await mod.getByText('55 kn sustained, gusting 70 kn').waitFor();
    await mod
      .getByText(/defer|harbour master/i)
      .first()
      .waitFor();
    const watchUrl = mod.url();
    const watchId = Number(/\/storm\/(\d+)$/.exec(watchUrl)?.[1]);

    // 2. Mails reach both members through the outbox.
    const marenMail = await waitForMail(MAREN, `Storm watch: ${WATCH}`, 30_000);
    const bramMail = await waitForMail(BRAM, `Storm watch: ${WATCH}`, 30_000);
    for (const mail of [marenMail, bramMail]) {
      expect(mail.text).toContain('gusting 70 kn');
      expect(mail.text).toContain(`/storm/${watchId}`);
    }

    // 3. Maren, on a phone: her plan has the small shackle, which the check flags below its WLL.
    const maren = await browser.newPage({ viewport: { width: 390, height: 900 } });
    await signIn(maren, MAREN);
    await savePlan(maren, 'Marram', SMALL_SHACKLE);
    await fillIn(maren, watchUrl, 'Marram', SMALL_SHACKLE.name);
    const flagged = maren.locator('[data-band="below-wll"]').first();
    await flagged.waitFor();
    expect(await flagged.innerText()).toMatch(/Below WLL/);
    await maren.getByText(/Weakest link: anchor shackle/).waitFor();
    await maren.getByText(/— below its WLL/).waitFor();
    await audit(maren, 'storm boat readiness (member, 390 px)');
    await screenshot(maren, 'storm-boat-flagged-390');

    // 4. Bram, at a desk: the heavy gear passes.
    const bram = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(bram, BRAM);
    await savePlan(bram, 'Greywake', HEAVY_GEAR);
    await fillIn(bram, watchUrl, 'Greywake', HEAVY_GEAR.name);
    await bram.locator('[data-band="passes"]').first().waitFor();
    expect(await bram.locator('[data-band="below-wll"]').count()).toBe(0);
    await audit(bram, 'storm boat readiness (member, 1280 px)');
    await screenshot(bram, 'storm-boat-passes-1280');

    // 5. The moderator names Bram as Marram's buddy on the board.
    await mod.goto(`${baseUrl()}/storm/${watchId}/board`);
    await mod.getByRole('heading', { level: 1, name: `Board: ${WATCH}` }).waitFor();
    const marramRow = mod.locator('tr[data-boat="Marram"]');
    const greywakeRow = mod.locator('tr[data-boat="Greywake"]');
    await marramRow.locator('[data-band="below-wll"]').waitFor();
    expect(await marramRow.innerText()).toMatch(/Weakest: anchor shackle/);
    expect(await marramRow.innerText()).toMatch(/Flagged: below WLL at the gust/);
    expect(await marramRow.innerText()).toMatch(/In progress/);
    await greywakeRow.locator('[data-band="passes"]').waitFor();
    expect(await greywakeRow.innerText()).toMatch(/Ready/);
    await mod.getByLabel('Buddy for Marram').selectOption({ label: 'Bram Cleatson' });
    await expect
      .poll(async () =>
        mod.getByLabel('Buddy for Marram').evaluate((el) => {
          const s = el as HTMLSelectElement;
          return s.options[s.selectedIndex]?.text ?? '';
        }),
      )
      .toBe('Bram Cleatson');
    await audit(mod, 'storm board (moderator, 1280 px)');
    await screenshot(mod, 'storm-board-1280');

    // The print view: the site's header and the filters go, the list and the buddy's name stay.
    await mod.reload();
    await marramRow.locator('[data-band="below-wll"]').waitFor();
    await mod.emulateMedia({ media: 'print' });
    expect(await mod.locator('#root > div > header').first().isVisible()).toBe(false);
    expect(await mod.getByRole('button', { name: 'Print the list' }).isVisible()).toBe(false);
    expect(await marramRow.isVisible()).toBe(true);
    const printed = await marramRow.innerText();
    expect(printed).toMatch(/Below WLL/);
    expect(printed).toMatch(/Bram Cleatson/);
    await screenshot(mod, 'storm-board-print');
    await mod.emulateMedia({ media: 'screen' });

    // 6. Bram sees Marram among the boats he checks on; Maren's board shows Greywake by name and status only.
    await bram.goto(watchUrl);
    await bram
      .getByRole('list', { name: 'Boats you check on' })
      .getByRole('link', { name: 'Marram' })
      .waitFor();
    await maren.goto(`${baseUrl()}/storm/${watchId}/board`);
    const other = maren.locator('tr[data-boat="Greywake"]');
    await other.waitFor();
    expect(await other.innerText()).toMatch(/Ready/);
    expect(await other.innerText()).toMatch(/Not shared/);
    expect(await other.locator('[data-band]').count()).toBe(0);
    await audit(maren, 'storm board (member, 390 px)');
    await screenshot(maren, 'storm-board-member-390');
    await maren.setViewportSize({ width: 1280, height: 900 });
    await audit(maren, 'storm board (member, 1280 px)');
    await mod.setViewportSize({ width: 390, height: 900 });
    await audit(mod, 'storm board (moderator, 390 px)');

    for (const p of [mod, maren, bram]) await p.close();
  }, 180_000);
});
