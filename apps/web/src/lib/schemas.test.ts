import { describe, expect, it } from 'vitest';
import { globalConfig } from 'zod/v4/core';

describe('lazily loaded schemas', () => {
  // script-src 'self' forbids new Function: zod must never try its JIT in the browser.
  it('turn zod’s JIT off before any schema is built or parses (no `new Function` probe)', async () => {
    const original = globalThis.Function;
    let probes = 0;
    // What script-src 'self' does to `new Function`: refuse it. Count every attempt.
    globalThis.Function = new Proxy(original, {
      construct() {
        probes += 1;
        throw new EvalError('refused by the Content-Security-Policy');
      },
    });
    try {
      const { loadSchemas } = await import('./lazy-schema');
      const { loginSchema, listingInputSchema } = await loadSchemas();
      expect(loginSchema.safeParse({ email: 'x', password: '' }).success).toBe(false);
      expect(listingInputSchema.safeParse({}).success).toBe(false);
    } finally {
      globalThis.Function = original;
    }
    expect(globalConfig.jitless).toBe(true);
    expect(probes).toBe(0);
  });

  it('check a form with the loaded schema and give field messages', async () => {
    const { lazyZodResolver, loadSchemas } = await import('./lazy-schema');
    const resolver = lazyZodResolver(() => loadSchemas().then((m) => m.loginSchema));
    const result = await resolver(
      { email: 'not-an-address', password: 'long enough pw' },
      undefined,
      {
        fields: {},
        shouldUseNativeValidation: false,
      },
    );
    expect(result.errors.email?.message).toBe('Enter a valid e-mail address');
    expect(result.errors.password).toBeUndefined();
  });
});
