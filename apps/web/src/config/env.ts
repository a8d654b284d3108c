// The entry chunk carries no schema library. Zod reads its global config from `globalThis.__zod_globalConfig`
// (created once, shared by every copy), so setting it here, before any zod module loads, makes every later parse run without
// JIT: zod would otherwise probe `new Function`, which our Content-Security-Policy (script-src 'self') forbids
// and reports. env.test.ts checks that zod sees the setting.
const zodHolder = globalThis as { __zod_globalConfig?: Record<string, unknown> };
(zodHolder.__zod_globalConfig ??= {}).jitless = true;

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
