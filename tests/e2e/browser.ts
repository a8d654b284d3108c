import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { AxeBuilder } from '@axe-core/playwright';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { inject } from 'vitest';
import { ROOT } from '@app/devkit/mariadb';

export const ARTIFACTS = join(ROOT, 'tests', 'artifacts');
export const DEMO_PASSWORD = 'harbour-demo-2026';

/**
 * Debian's Chromium, headless, with the flags this machine's closed network needs. Every context it opens
 * (browser.newPage() opens one too) records Content-Security-Policy violations: see `watchCsp`.
 */
export async function launch(): Promise<Browser> {
  const browser = await chromium.launch({
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
  const newContext = browser.newContext.bind(browser);
  browser.newContext = async (options) => {
    const context = await newContext(options);
    await watchCsp(context);
    return context;
  };
  return browser;
}

/** One refused load, script, style or eval, as the browser or the API's report endpoint saw it. */
export interface CspViolation {
  via: 'event' | 'console' | 'report';
  page: string;
  detail: string;
}

/** Violations seen in this test file's browsers (vitest loads this module once per file). */
export const cspViolations: CspViolation[] = [];

declare global {
  interface Window {
    __cspViolations?: string[];
    __reportCspViolation?: (detail: string) => void;
  }
}

/**
 * Records every CSP violation in `context`: a `securitypolicyviolation` listener installed before any page
 * script runs (kept on `window.__cspViolations` and sent to the test through a binding that survives
 * navigation), and Chromium's "Content Security Policy" console messages.
 */
export async function watchCsp(context: BrowserContext) {
  await context.exposeBinding('__reportCspViolation', ({ page }, detail: string) => {
    cspViolations.push({ via: 'event', page: page.url(), detail });
  });
  await context.addInitScript(() => {
    window.__cspViolations = [];
    document.addEventListener(
      'securitypolicyviolation',
      (e) => {
        const detail = `${e.effectiveDirective} blocked ${e.blockedURI || '(inline)'} at ${e.sourceFile || '?'}:${e.lineNumber} ${e.sample}`;
        window.__cspViolations?.push(detail);
        window.__reportCspViolation?.(detail);
      },
      true,
    );
  });
  const watchPage = (page: Page) =>
    page.on('console', (msg) => {
      if (/Content[- ]Security[- ]Policy/i.test(msg.text()))
        cspViolations.push({ via: 'console', page: page.url(), detail: msg.text() });
    });
  context.pages().forEach(watchPage);
  context.on('page', watchPage);
}

/** Reports the API received at /api/csp-report during this run (global-setup points CSP_REPORT_FILE here). */
export function cspReports(): CspViolation[] {
  const file = inject('cspReportFile');
  if (!existsSync(file)) return [];
  return readFileSync(file, 'utf8')
    .split('\n')
    .filter(Boolean)
    .map((line) => {
      const { report } = JSON.parse(line) as { report: { 'csp-report'?: Record<string, string> } };
      const r = report['csp-report'] ?? {};
      return {
        via: 'report' as const,
        page: r['document-uri'] ?? '?',
        detail: `${r['violated-directive'] ?? r['effective-directive'] ?? '?'} blocked ${r['blocked-uri'] ?? '?'} (${line.slice(0, 300)})`,
      };
    });
}

let eventsSeen = 0;
let reportsSeen = 0;

/** Starts this file's count after the reports earlier files left in the shared report file. */
export function startCspWatch() {
  eventsSeen = cspViolations.length;
  reportsSeen = cspReports().length;
}

/** The violations recorded since the last call (each is handed out once). */
export function newCspViolations(): CspViolation[] {
  const reports = cspReports();
  const added = [...cspViolations.slice(eventsSeen), ...reports.slice(reportsSeen)];
  eventsSeen = cspViolations.length;
  reportsSeen = reports.length;
  return added;
}

/** Readable lines for a failure message. */
export const describeCsp = (list: CspViolation[]) =>
  list.map((v) => `  [${v.via}] ${v.page}: ${v.detail}`).join('\n');

/**
 * Runs axe-core on the page as it stands and fails on any serious or critical violation, listing each rule,
 * its help page and the offending nodes. Returns the full results (minor/moderate findings included).
 */
export async function audit(page: Page, label: string) {
  await page.evaluate(() => document.fonts.ready.then(() => undefined));
  // Legacy mode runs axe inside this page; the default mode opens a second page, which a context made by
  // browser.newPage() does not allow. Rodewise has no cross-origin frames, so nothing is lost.
  const results = await new AxeBuilder({ page }).setLegacyMode(true).analyze();
  const bad = results.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
  if (bad.length > 0) {
    const lines = bad.map(
      (v) =>
        `- [${v.impact}] ${v.id}: ${v.help} (${v.helpUrl})\n` +
        v.nodes
          .slice(0, 6)
          .map(
            (n) =>
              `    ${n.target.join(' > ')}\n      ${(n.failureSummary ?? '').replace(/\n/g, '\n      ')}`,
          )
          .join('\n'),
    );
    throw new Error(
      `axe: ${bad.length} serious/critical rule(s) fail on ${label} (${page.url()})\n${lines.join('\n')}`,
    );
  }
  return results;
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
  /** Only a mail whose text holds this (another file's run may have sent the same subject to the same person). */
  containing?: string,
): Promise<MailDto> {
  const end = Date.now() + timeoutMs;
  while (Date.now() < end) {
    const url = new URL('/api/messages', mailUrl());
    url.searchParams.set('to', to);
    url.searchParams.set('subject', subject);
    const { data } = (await (await fetch(url)).json()) as { data: MailDto[] };
    const found = containing ? data.find((m) => m.text.includes(containing)) : data[0];
    if (found) return found;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`no mail "${subject}" for ${to}`);
}
