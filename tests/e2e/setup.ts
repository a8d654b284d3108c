import { afterAll, afterEach, beforeAll, expect } from 'vitest';
import { describeCsp, newCspViolations, startCspWatch } from './browser';

// Every e2e file: no Content-Security-Policy violation may happen, in the browser or at /api/csp-report.
// The report file is shared by the whole run, so each file answers only for the lines added while it ran.
beforeAll(() => startCspWatch());

afterEach(() => {
  const added = newCspViolations();
  expect(added, `CSP violations:\n${describeCsp(added)}`).toEqual([]);
});

afterAll(async () => {
  // Reports reach the API a moment after the violation.
  await new Promise((r) => setTimeout(r, 750));
  const added = newCspViolations();
  expect(added, `CSP violations:\n${describeCsp(added)}`).toEqual([]);
});
