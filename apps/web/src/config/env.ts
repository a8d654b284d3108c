// The entry chunk carries no schema library: zod loads with the first form check (lib/schemas.ts). Its JIT must
// be off before the first schema is built (zod probes `new Function`, which our Content-Security-Policy,
// script-src 'self', forbids), and the bundler may place the schema chunk's own config call after the schemas,
// so the entry seeds zod's global config object, which every copy of zod reads (zod/v4/core/core.js).
const zodGlobal = globalThis as { __zod_globalConfig?: { jitless?: boolean } };
zodGlobal.__zod_globalConfig = { ...zodGlobal.__zod_globalConfig, jitless: true };

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
