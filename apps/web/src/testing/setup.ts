// Imported first by every web test: jest-dom matchers, DOM cleanup, fresh fetch and CSRF state.
import '@testing-library/jest-dom/vitest';
import { cleanup } from '@testing-library/react';
import { afterEach, vi } from 'vitest';
import { setCsrfToken } from '../lib/api-client';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  vi.useRealTimers();
  setCsrfToken(null);
});
