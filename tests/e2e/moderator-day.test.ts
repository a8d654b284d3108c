import type { APIRequestContext, Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD, audit, baseUrl, launch, screenshot, signIn } from './browser';

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser.close();
});

// Demo accounts (apps/api/seeders/demo.ts): Maren writes the posts; each width has its own reporter, since a
// member reports a listing once.
const AUTHOR = 'maren@larkspit.example';
const MODERATOR = 'moderator@larkspit.example';
const REPORTER: Record<number, string> = {
  390: 'saoirse@larkspit.example',
  1024: 'bram@larkspit.example',
  1280: 'idris@larkspit.example',
};

/** An API session for a demo member, through the same sign-in and CSRF token the client uses. */
async function apiAs(email: string): Promise<{ api: APIRequestContext; token: string }> {
  const ctx = await browser.newContext();
  const api = ctx.request;
  const me = await api.get(`${baseUrl()}/api/auth/me`);
  const first = ((await me.json()) as { data: { csrfToken: string } }).data.csrfToken;
  const login = await api.post(`${baseUrl()}/api/auth/login`, {
    data: { email, password: DEMO_PASSWORD },
    headers: { 'X-CSRF-Token': first },
  });
  expect(login.status()).toBe(200);
  const again = await api.get(`${baseUrl()}/api/auth/me`);
  return {
    api,
    token: ((await again.json()) as { data: { csrfToken: string } }).data.csrfToken,
  };
}

const doc = (heading: string, text: string) => ({
  type: 'doc',
  content: [
    { type: 'heading', attrs: { level: 2 }, content: [{ type: 'text', text: heading }] },
    { type: 'paragraph', content: [{ type: 'text', text }] },
  ],
});

/** Two posts waiting for a moderator and one open listing report, made for this width. */
async function seed(width: number) {
  const author = await apiAs(AUTHOR);
  const topics = (await (await author.api.get(`${baseUrl()}/api/topics`)).json()) as {
    data: Array<{ id: number }>;
  };
  const titles = [
    `Bridle legs for a catamaran, tried at ${width}`,
    `Night anchor watch on a rota, tried at ${width}`,
  ];
  for (const title of titles) {
    const res = await author.api.post(`${baseUrl()}/api/posts`, {
      data: {
        kind: 'article',
        title,
        topicId: topics.data[0]?.id,
        body: doc('What changed', 'Seven metres more scope held through the squall.'),
        submit: true,
      },
      headers: { 'X-CSRF-Token': author.token },
    });
    expect(res.status()).toBe(201);
  }
  const reporter = await apiAs(REPORTER[width] ?? '');
  const listings = (await (await reporter.api.get(`${baseUrl()}/api/listings`)).json()) as {
    data: Array<{ id: number; title: string }>;
  };
  let reported = '';
  for (const l of listings.data) {
    const res = await reporter.api.post(`${baseUrl()}/api/listings/${l.id}/reports`, {
      data: { reason: `Photo shows another anchor type (${width})` },
      headers: { 'X-CSRF-Token': reporter.token },
    });
    if (res.status() === 201) {
      reported = l.title;
      break;
    }
  }
  expect(reported).not.toBe('');
  return { titles, reported };
}

const box = async (page: Page, name: string) => {
  const b = await page.getByRole('button', { name, exact: true }).boundingBox();
  if (!b) throw new Error(`no box for ${name}`);
  return b;
};

describe('a moderator’s day from the home page', () => {
  for (const width of [390, 1024, 1280]) {
    it(`publishes, undoes, sends back and handles a listing report at ${width} px`, async () => {
      const { titles, reported } = await seed(width);
      const [first = '', second = ''] = titles;
      const page = await browser.newPage({ viewport: { width, height: 900 } });
      await signIn(page, MODERATOR);
      await page.goto(`${baseUrl()}/`);

      // The home page's desk counts what waits.
      const desk = page.getByRole('region', { name: 'Moderation desk' });
      await desk.getByText(/^\d+ posts? waiting$/).waitFor({ timeout: 15000 });
      const waiting = Number((await desk.getByText(/posts? waiting$/).innerText()).split(' ')[0]);
      expect(waiting).toBeGreaterThanOrEqual(2);
      await expect.poll(() => desk.getByText(/^\d+ open reports?$/).count()).toBe(1);
      await audit(page, `home with the moderation desk (${width} px)`);
      await screenshot(page, `moderator-day-home-${width}`);
      await desk.getByRole('link', { name: 'Go to moderation' }).click();

      const publishFirst = `Publish “${first}”`;
      const publishSecond = `Publish “${second}”`;
      await page.getByRole('button', { name: publishFirst }).waitFor({ timeout: 15000 });
      await page.getByRole('button', { name: publishFirst }).scrollIntoViewIfNeeded();
      await audit(page, `moderation queue (${width} px)`);
      await screenshot(page, `moderator-day-queue-${width}`);

      // Publish the first: its card stays, the next post's Publish button does not slide under the pointer.
      const before = await box(page, publishFirst);
      const nextBefore = await box(page, publishSecond);
      await page.getByRole('button', { name: publishFirst }).click();
      const undo = page.getByRole('button', { name: `Undo: published “${first}”` });
      await undo.waitFor({ timeout: 15000 });
      const nextAfter = await box(page, publishSecond);
      expect(nextAfter.y).toBeCloseTo(nextBefore.y, 0);
      const overlaps =
        nextAfter.y < before.y + before.height && before.y < nextAfter.y + nextAfter.height;
      expect(overlaps).toBe(false);
      // Where the Publish button was there is no button now (a second click lands on text).
      const under = await page.evaluate(
        ([x, y]) => document.elementFromPoint(x ?? 0, y ?? 0)?.closest('button')?.textContent ?? '',
        [before.x + before.width / 2, before.y + before.height / 2],
      );
      expect(under).toBe('');
      await audit(page, `decided card with Undo (${width} px)`);
      await screenshot(page, `moderator-day-published-${width}`);

      await undo.click();
      await page.getByRole('button', { name: publishFirst }).waitFor({ timeout: 15000 });
      await page.getByText(`Undone: “${first}” is waiting again.`).waitFor({ timeout: 15000 });

      // Send the second back with a note.
      await page.getByRole('button', { name: `Send back “${second}”` }).click();
      const dialog = page.getByRole('dialog', { name: `Send “${second}” back to the author?` });
      await dialog.getByLabel('Note to the author').fill('Say which bridle length you used.');
      await audit(page, `send back dialog (${width} px)`);
      await dialog.getByRole('button', { name: 'Send back' }).click();
      await page.getByText('Sent back to the author', { exact: true }).waitFor({ timeout: 15000 });

      // The listing report: dismissed with a note for the log.
      const section = page.getByRole('region', { name: /^Listings reported/ });
      await section.getByText(`Photo shows another anchor type (${width})`).waitFor();
      await section.getByRole('button', { name: `Dismiss the report on “${reported}”` }).click();
      const note = page.getByRole('dialog', { name: `Dismiss the report on “${reported}”?` });
      await note.getByLabel(/Note for the log/).fill(`Same anchor, other angle (${width})`);
      await note.getByRole('button', { name: 'Dismiss report' }).click();
      await section.getByText('Report dismissed', { exact: true }).waitFor({ timeout: 15000 });
      // Status and buttons fit the width: nothing scrolls sideways.
      const { overflow, widest } = await page.evaluate(() => {
        const edge = document.documentElement.clientWidth;
        // The outermost element that reaches past the right edge, to say what pushes the page wider.
        const past = [...document.body.querySelectorAll<HTMLElement>('*')].find(
          (el) => el.getBoundingClientRect().right > edge + 0.5,
        );
        return {
          overflow: document.documentElement.scrollWidth - edge,
          widest: past ? `${past.tagName.toLowerCase()}.${past.className}`.slice(0, 160) : '',
        };
      });
      expect(overflow, `sideways scroll at ${width} px from ${widest}`).toBeLessThanOrEqual(0);
      await audit(page, `queue after decisions (${width} px)`);
      await screenshot(page, `moderator-day-decided-${width}`);

      // Published for good this time, so the demo queue is left as it was.
      await page.getByRole('button', { name: publishFirst }).click();
      await page.getByRole('button', { name: `Undo: published “${first}”` }).waitFor();

      await page.goto(`${baseUrl()}/moderation/log`);
      await page
        .getByText(`Same anchor, other angle (${width})`)
        .filter({ visible: true })
        .first()
        .waitFor({ timeout: 15000 });
      await expect
        .poll(() =>
          page
            .getByText(/undid: published a post/)
            .filter({ visible: true })
            .count(),
        )
        .toBeGreaterThan(0);
      const logOverflow = await page.evaluate(
        () => document.documentElement.scrollWidth - document.documentElement.clientWidth,
      );
      expect(logOverflow).toBeLessThanOrEqual(0);
      await audit(page, `moderation log (${width} px)`);
      await screenshot(page, `moderator-day-log-${width}`);
      await page.close();
    });
  }
});
