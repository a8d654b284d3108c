// Imported first by every web test: jest-dom matchers, DOM cleanup, fresh fetch and CSRF state.
import '@testing-library/jest-dom/vitest';
import { cleanup, configure } from '@testing-library/react';
import { afterEach, vi } from 'vitest';
import { setCsrfToken } from '@/lib/api-client';

// findBy… and waitFor wait up to 5 s (default 1 s): on a loaded 2-core machine a lazy screen can take longer to render.
configure({ asyncUtilTimeout: 5000 });

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  vi.useRealTimers();
  setCsrfToken(null);
});
