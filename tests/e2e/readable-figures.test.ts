import { appendFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { currencyDigits } from '../../packages/shared/src/locale-format';
import { ARTIFACTS, baseUrl, launch, signIn } from './browser';
import { data, demoUrls, PEOPLE, settle, type PathKey } from './demo-urls';
import { findUnreadable, visibleText } from './readable';

let browser: Browser;
let urls: Record<PathKey, string>;
let digits: number;
/** A few more listing pages than the one demoUrls names, so several kinds of gear are read. */
let listingUrls: string[];

function log(line: string) {
  mkdirSync(ARTIFACTS, { recursive: true });
  appendFileSync(join(ARTIFACTS, 'readable-figures.log'), `${line}\n`);
}

beforeAll(async () => {
  browser = await launch();
  urls = await demoUrls(browser);
  const page = await browser.newPage();
  const club = await data<{ locale: { currency: string } }>(page, '/api/club');
  digits = currencyDigits(club.locale.currency);
  const listings = await data<Array<{ id: number }>>(page, '/api/listings');
  listingUrls = listings.slice(0, 6).map((l) => `/exchange/${l.id}`);
  await page.close();
});
afterAll(async () => {
  await browser.close();
});

describe('no ISO dates or minor units where a person reads', () => {
  it.each(PEOPLE.filter((p) => p.email !== null))(
    '$who: every screen reads in words and formatted figures',
    async ({ who, email }) => {
      const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
      if (email) await signIn(page, email);
      const failures: string[] = [];
      for (const url of [...Object.values(urls), ...listingUrls]) {
        await page.goto(`${baseUrl()}${url}`);
        await settle(page);
        for (const f of findUnreadable(await visibleText(page), digits))
          failures.push(`${url} (${f.kind}): …${f.text}…`);
      }
      await page.close();
      failures.forEach((f) => log(`${who}: ${f}`));
      expect(failures, failures.join('\n')).toEqual([]);
    },
    300_000,
  );
});

describe('the check itself', () => {
  it('finds ISO dates, minor units and a doubled grade in crafted text, and passes formatted text', () => {
    const bad = [
      'Paid through 2027-03-31',
      'Held: amount 6000 does not match the 12000 expected',
      'Total €12000',
      'Refund 4500 EUR',
      'Chain: grade Grade 43 high test',
    ].join('\n');
    expect(findUnreadable(bad, 2).map((f) => f.kind)).toEqual([
      'iso-date',
      'minor-units',
      'minor-units',
      'minor-units',
      'minor-units',
      'repeated-grade',
    ]);
    const good =
      'Paid through 31 Mar 2027 · Total €1,200.00 · 1.234,50 € · €60.00 · 2 kN · in 2026 · Grade 43 high test · 40 m · covers to 31 Mar 2026 €120.00';
    expect(findUnreadable(good, 2)).toEqual([]);
    // A zero-decimal currency is written without decimals: only dates are checked then.
    expect(findUnreadable('Total ¥5000', 0)).toEqual([]);
  });

  it('reads what the page shows, not what sits in a field or is hidden', async () => {
    const page = await browser.newPage();
    await page.goto(`${baseUrl()}/sign-in`);
    await settle(page);
    await page.evaluate(() => {
      document.body.innerHTML =
        '<main><h1>Crafted</h1><input value="2026-01-02"><p hidden>€9000</p><p>Amount 6000 due on 2026-05-01</p></main>';
    });
    const found = findUnreadable(await visibleText(page), 2);
    expect(found.map((f) => f.kind).sort()).toEqual(['iso-date', 'minor-units']);
    expect(found.every((f) => !f.text.includes('9000') && !f.text.includes('2026-01-02'))).toBe(
      true,
    );
    await page.close();
  });
});
