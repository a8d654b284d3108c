import { describe, expect, it } from 'vitest';
import { globalConfig } from 'zod/v4/core';

describe('lazily loaded schemas', () => {
  // script-src 'self' forbids new Function: zod must never try its JIT in the browser.
  it('turn zod’s JIT off before any form parses', async () => {
    const before = globalConfig.jitless;
    const { loadSchemas } = await import('./lazy-schema');
    const { loginSchema } = await loadSchemas();
    expect(before).toBeUndefined();
    expect(globalConfig.jitless).toBe(true);
    expect(loginSchema.safeParse({ email: 'x', password: '' }).success).toBe(false);
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
