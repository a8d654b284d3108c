import { describe, expect, it, vi } from 'vitest';

describe('lazy form schemas', () => {
  it('checks with the shared schema once it has loaded: field messages on failure, parsed values on success', async () => {
    const { lazyResolver } = await import('./lazy-schema');
    const resolver = lazyResolver((schemas) => schemas.loginSchema);
    const options = { fields: {}, shouldUseNativeValidation: false } as const;
    const bad = await resolver({ email: 'not an address', password: '' }, undefined, options);
    expect(bad.errors.email?.message).toBe('Enter a valid e-mail address');
    const good = await resolver(
      { email: ' Skipper@Example.org ', password: 'x' },
      undefined,
      options,
    );
    expect(good.errors).toEqual({});
    expect(good.values).toEqual({ email: 'skipper@example.org', password: 'x' });
  });

  it('tries the download again on the next check after a failed one', async () => {
    vi.resetModules();
    vi.doMock('./form-schemas', () => {
      throw new Error('offline');
    });
    const { loadFormSchemas } = await import('./lazy-schema');
    await expect(loadFormSchemas()).rejects.toThrow();
    vi.doUnmock('./form-schemas');
    const schemas = await loadFormSchemas();
    expect(typeof schemas.zodResolver).toBe('function');
    expect(await loadFormSchemas()).toBe(schemas);
  });
});
