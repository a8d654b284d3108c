// zod/mini keeps the entry chunk small; the full zod loads only with the screens that need forms.
import * as z from 'zod/mini';

// No JIT: zod would otherwise probe `new Function`, which our Content-Security-Policy (script-src 'self') forbids.
z.config({ jitless: true });

const envSchema = z.object({
  VITE_API_BASE_URL: z._default(
    z
      .string()
      .check(
        z.regex(
          /^(\/|https?:\/\/)/,
          'VITE_API_BASE_URL must be a path starting with / or an http(s) URL',
        ),
      ),
    '/api',
  ),
});

const parsed = envSchema.safeParse(import.meta.env);
if (!parsed.success) {
  throw new Error(
    `Bad client configuration:\n${parsed.error.issues.map((issue) => `- ${issue.message}`).join('\n')}`,
  );
}

/** Client configuration, parsed once from `import.meta.env`. */
export const env = {
  apiBaseUrl: parsed.data.VITE_API_BASE_URL.replace(/\/$/, ''),
} as const;
