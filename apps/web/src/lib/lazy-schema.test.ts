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

  it('preloads only once the page has loaded and settled, when the browser is idle', async () => {
    vi.resetModules();
    vi.useFakeTimers();
    let imported = 0;
    vi.doMock('./form-schemas', () => {
      imported += 1;
      return {};
    });
    const readyState = vi.spyOn(document, 'readyState', 'get').mockReturnValue('loading');
    try {
      const { preloadFormSchemas } = await import('./lazy-schema');
      preloadFormSchemas();
      await vi.advanceTimersByTimeAsync(10_000);
      expect(imported).toBe(0); // no load event yet
      window.dispatchEvent(new Event('load'));
      await vi.advanceTimersByTimeAsync(1_000);
      expect(imported).toBe(0); // loaded, not yet settled
      await vi.advanceTimersByTimeAsync(6_000);
      await vi.waitFor(() => expect(imported).toBe(1));
    } finally {
      readyState.mockRestore();
      vi.doUnmock('./form-schemas');
      vi.useRealTimers();
    }
  });
});
