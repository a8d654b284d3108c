import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD, baseUrl, launch, screenshot } from './browser';

// Both main paths driven with page.keyboard alone: no clicks, no fill(), no selectOption().
let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser.close();
});

interface Focus {
  tag: string;
  id: string;
  name: string;
  /** A focus outline drawn around it (or around the label of a visually hidden control). */
  ring: boolean;
  /** Inside the viewport (the page scrolled it into view). */
  onScreen: boolean;
}

/** What has focus, its accessible-ish name, and whether a focus indicator is drawn. */
const focused = (page: Page): Promise<Focus> =>
  page.evaluate(() => {
    const el = document.activeElement as HTMLElement | null;
    if (!el || el === document.body)
      return { tag: 'body', id: '', name: '', ring: false, onScreen: false };
    const labels = (el as HTMLInputElement).labels;
    const name =
      el.getAttribute('aria-label') ??
      (labels && labels.length > 0 ? labels[0]?.textContent : null) ??
      el.textContent ??
      '';
    // A visually hidden control (a radio styled as a switch) shows its focus on the label around it.
    const box = el.getBoundingClientRect();
    const shown = box.width <= 1 || box.height <= 1 ? (el.closest('label') ?? el) : el;
    const r = shown.getBoundingClientRect();
    const scs = getComputedStyle(shown);
    // Rodewise draws focus as an outline (index.css :focus-visible); a resting box-shadow is no indicator.
    const shownRing = scs.outlineStyle !== 'none' && parseFloat(scs.outlineWidth) > 0;
    return {
      tag: el.tagName.toLowerCase(),
      id: el.id,
      name: name.replace(/\s+/g, ' ').trim(),
      ring: shownRing,
      onScreen: r.width > 1 && r.height > 1 && r.bottom > 0 && r.top < window.innerHeight,
    };
  });

/** Presses `key` and checks the element that now has focus shows a focus indicator on screen. */
async function press(page: Page, key: string): Promise<Focus> {
  await page.keyboard.press(key);
  const f = await focused(page);
  if (f.tag !== 'body') {
    expect(f.ring, `no visible focus on <${f.tag}> "${f.name}" after ${key}`).toBe(true);
    expect(f.onScreen, `<${f.tag}> "${f.name}" has focus but is off screen`).toBe(true);
  }
  return f;
}

/** Tabs (or Shift+Tabs) until an element whose name matches has focus, checking focus at every stop. */
async function tabTo(page: Page, name: RegExp, { back = false, max = 60 } = {}): Promise<Focus> {
  const seen: string[] = [];
  for (let i = 0; i < max; i += 1) {
    const f = await press(page, back ? 'Shift+Tab' : 'Tab');
    if (name.test(f.name)) return f;
    seen.push(`${f.tag}:${f.name.slice(0, 30)}`);
  }
  throw new Error(`${name} not reached in ${max} presses; stops were: ${seen.join(' | ')}`);
}

/** Replaces a focused field's text by typing. */
async function typeOver(page: Page, text: string) {
  await page.keyboard.press('ControlOrMeta+A');
  await page.keyboard.press('Backspace');
  await page.keyboard.type(text);
}

/** The skip link is the first stop, shows when focused, and moves focus into <main>. */
async function skipToMain(page: Page) {
  const first = await press(page, 'Tab');
  expect(first.name).toBe('Skip to content');
  expect(first.onScreen).toBe(true);
  await page.keyboard.press('Enter');
  expect((await focused(page)).id).toBe('main');
}

async function signInByKeyboard(page: Page, email: string) {
  await page.goto(`${baseUrl()}/sign-in`);
  await page.getByRole('heading', { name: 'Sign in' }).waitFor();
  await skipToMain(page);
  // The first stop in <main> is the first field: nothing hidden or out of order before it.
  expect((await press(page, 'Tab')).name).toMatch(/^E-mail/);
  await page.keyboard.type(email);
  await tabTo(page, /^Password/, { max: 3 });
  await page.keyboard.type(DEMO_PASSWORD);
  await page.keyboard.press('Enter');
  await page.waitForFunction(() => !location.pathname.startsWith('/sign-in'), undefined, {
    timeout: 15000,
  });
}

/**
 * Goes to a main-navigation item from wherever focus is, walking back with Shift+Tab; on a phone the
 * items sit behind the Menu button, which opens with Enter. On a wide screen an item of a group (the
 * Account or Desks menu) sits behind the group's button, which opens with Enter too.
 */
async function navTo(page: Page, label: RegExp, group?: string) {
  if ((page.viewportSize()?.width ?? 1280) < 768) {
    await tabTo(page, /^Menu$/, { back: true, max: 120 });
    await page.keyboard.press('Enter');
    await tabTo(page, label, { max: 20 });
  } else if (group) {
    await tabTo(page, new RegExp(`^${group}`), { back: true, max: 120 });
    await page.keyboard.press('Enter');
    await tabTo(page, label, { max: 10 });
  } else {
    await tabTo(page, label, { back: true, max: 120 });
  }
  await page.keyboard.press('Enter');
}

describe('keyboard only', () => {
  it('a member signs in, sizes tackle, opens a boat’s recommendation and reaches the dues checkout', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signInByKeyboard(page, 'saoirse@larkspit.example');

    await navTo(page, /^Calculators$/);
    await page.waitForURL(/\/calculators$/);
    await page.getByRole('heading', { name: 'Ground-tackle calculators' }).waitFor();
    // The calculators below the boat block arrive in their own chunks, a moment after the page.
    await page
      .getByLabel(/^Horizontal load/)
      .first()
      .waitFor();
    await tabTo(page, /^Horizontal load/);
    await typeOver(page, '2000 lbf');
    await expect
      .poll(() => page.getByText(/Reads as .*8\.90 kN/).count(), { timeout: 5000 })
      .toBeGreaterThan(0);
    // Shift+Tab walks back the way it came.
    const ahead = await press(page, 'Tab');
    const back = await press(page, 'Shift+Tab');
    expect(back.name).toMatch(/^Horizontal load/);
    expect(ahead.name).not.toBe(back.name);

    await navTo(page, /^My boats$/, 'Account');
    await page.waitForURL(/\/boats$/);
    await page.getByRole('heading', { level: 1 }).waitFor();
    await tabTo(page, /Two Gulls/);
    await page.keyboard.press('Enter');
    await page.waitForURL(/\/boats\/\d+$/, { timeout: 15000 });
    const everyday = page.getByRole('region', { name: 'Everyday: 30 kn' });
    await expect
      .poll(() => everyday.getByText('Design load', { exact: true }).count(), { timeout: 15000 })
      .toBe(1);
    // The recommendation's own controls are reachable too.
    await tabTo(page, /^Save as plan$/);

    await navTo(page, /^Dues$/, 'Account');
    await page.waitForURL(/\/dues$/);
    await tabTo(page, /Pay by card/);
    await page.keyboard.press('Enter');
    await page.waitForURL(/\/pay\/cs_/, { timeout: 15000 });
    await page.getByLabel('Card number').waitFor();
    await tabTo(page, /^Card number/);
    await screenshot(page, 'keyboard-member-checkout');
    await page.close();
  });

  it('a seller creates a chain listing with specs and a price and publishes it', async () => {
    const page = await browser.newPage({ viewport: { width: 390, height: 900 } });
    await signInByKeyboard(page, 'idris@larkspit.example');
    const title = `Keyboard-listed chain ${Date.now()}`;

    await navTo(page, /^Exchange$/);
    await page.waitForURL(/\/exchange$/);
    await page.getByRole('heading', { level: 1 }).waitFor();
    await tabTo(page, /^(List gear|New listing|Sell gear)/i);
    await page.keyboard.press('Enter');
    await page.waitForURL(/\/exchange\/new$/);
    await page.getByLabel('Category').waitFor();

    await tabTo(page, /^Category/);
    await page.keyboard.type('Chain'); // a closed <select> picks by typed prefix
    await expect.poll(() => page.getByLabel('Category').inputValue()).toBe('chain');
    await press(page, 'Tab');
    expect((await focused(page)).name).toMatch(/^Title/);
    await page.keyboard.type(title);
    await tabTo(page, /^Description/, { max: 2 });
    await page.keyboard.type('Galvanised chain, end marked every 10 m, kept rinsed.');
    await tabTo(page, /^Chain grade/);
    await page.keyboard.press('ArrowDown'); // from the blank choice to the first grade
    expect(await page.getByLabel('Chain grade').inputValue()).not.toBe('');
    await tabTo(page, /^Trade size/);
    await page.keyboard.type('0.3125');
    await tabTo(page, /^Length \(m\)/);
    await page.keyboard.type('40');
    await tabTo(page, /^Galvanising/);
    await page.keyboard.type('good');
    await expect.poll(() => page.getByLabel('Galvanising').inputValue()).toBe('good');
    await tabTo(page, /^Price/);
    await typeOver(page, '150');
    await tabTo(page, /^Harbour/);
    await page.keyboard.type('Larkspit Harbour');
    await expect.poll(() => page.getByLabel('Harbour').inputValue()).not.toBe('');
    await tabTo(page, /^Save draft/);
    await page.keyboard.press('Enter');
    await page
      .waitForURL(/\/exchange\/listings\/\d+\/edit$/, { timeout: 15000 })
      .catch(async (err: unknown) => {
        await screenshot(page, 'keyboard-seller-not-saved');
        throw err;
      });

    // The address changes first; the new-listing form stays on view until the editor's code has loaded.
    await page.getByRole('heading', { name: `Edit: ${title}` }).waitFor();
    await page.getByRole('button', { name: 'Publish' }).waitFor();
    await tabTo(page, /^Publish$/, { max: 80 });
    await page.keyboard.press('Space');
    await expect
      .poll(() => page.getByText(/Shows in search until/).count(), { timeout: 15000 })
      .toBe(1);
    const listingUrl = page.url().replace(/\/edit$/, '');
    const res = await page.request.get(
      `${baseUrl()}/api/listings/${listingUrl.split('/').pop() ?? ''}`,
    );
    const listing = ((await res.json()) as { data: { title: string; status: string } }).data;
    expect(listing).toMatchObject({ title, status: 'active' });
    await screenshot(page, 'keyboard-seller-published');
    await page.close();
  });
});

describe('the focus check itself', () => {
  it('fails when a page hides the focus indicator', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await page.goto(`${baseUrl()}/sign-in`);
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    await page.addStyleTag({ content: '*:focus-visible { outline: none !important; }' });
    await expect(press(page, 'Tab')).rejects.toThrow(/no visible focus/);
    await page.close();
  });
});
