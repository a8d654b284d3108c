// The entry chunk carries no schema library: only zod's core config, so that every later zod parse runs
// without JIT (zod would otherwise probe `new Function`, which our Content-Security-Policy, script-src 'self',
// forbids). The full zod loads with the screens that need forms.
import { config } from 'zod/v4/core';

config({ jitless: true });

const API_BASE = /^(\/|https?:\/\/)/;

/** Reads the client configuration from `import.meta.env`; throws with a clear message when it is bad. */
export function readEnv(source: Record<string, unknown>): { apiBaseUrl: string } {
  const raw = source.VITE_API_BASE_URL ?? '/api';
  if (typeof raw !== 'string' || !API_BASE.test(raw)) {
    throw new Error(
      'Bad client configuration:\n- VITE_API_BASE_URL must be a path starting with / or an http(s) URL',
    );
  }
  return { apiBaseUrl: raw.replace(/\/$/, '') };
}

/** Client configuration, parsed once from `import.meta.env`. */
export const env = readEnv(import.meta.env);
