import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { inject } from 'vitest';
import { ROOT } from '../../scripts/lib/mariadb.mjs';

export const ARTIFACTS = join(ROOT, 'tests', 'artifacts');
export const DEMO_PASSWORD = 'harbour-demo-2026';

/** Debian's Chromium, headless, with the flags this machine's closed network needs. */
export function launch(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
      '--disable-quic',
    ],
  });
}

export const baseUrl = () => inject('baseUrl');
export const mailUrl = () => inject('mailUrl');

/** Saves a full-page PNG under tests/artifacts (git-ignored). */
export async function screenshot(page: Page, name: string) {
  mkdirSync(ARTIFACTS, { recursive: true });
  await page.screenshot({ path: join(ARTIFACTS, `${name}.png`), fullPage: true });
}

/** Signs in through the real form. */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto(`${baseUrl()}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel(/^Password\b/).fill(password);
  await page.getByRole('button', { name: /sign in/i }).click();
  await page.waitForFunction(() => !location.pathname.startsWith('/sign-in'), undefined, {
    timeout: 15000,
  });
}

interface MailDto {
  id: string;
  to: string[];
  subject: string;
  text: string;
}

/** Waits for a message to `to` whose subject contains `subject` in the fake inbox. */
export async function waitForMail(
  to: string,
  subject: string,
  timeoutMs = 15000,
): Promise<MailDto> {
  const end = Date.now() + timeoutMs;
  while (Date.now() < end) {
    const url = new URL('/api/messages', mailUrl());
    url.searchParams.set('to', to);
    url.searchParams.set('subject', subject);
    const { data } = (await (await fetch(url)).json()) as { data: MailDto[] };
    if (data[0]) return data[0];
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`no mail "${subject}" for ${to}`);
}
